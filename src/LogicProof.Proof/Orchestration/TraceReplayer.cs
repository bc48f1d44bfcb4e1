using System.Globalization;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Orchestration;

/// <summary>
/// Replays a counterexample in the simulator before anyone sees it: the power-up values chosen for unknown latches
/// are applied, each row is expanded to its scans with its inputs held, and at every scan the simulator must agree
/// with the trace: every memory at the start of each row, every recorded cell value, every assumption TRUE, the
/// property TRUE before the failing scan and FALSE at it. Any disagreement throws
/// <see cref="ReplayMismatchException"/>.
/// </summary>
public static class TraceReplayer
{
    public static void Replay(ScanModel model, ModelProperty property, Counterexample trace, string engine)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(property);
        ArgumentNullException.ThrowIfNull(trace);
        try
        {
            Run(model, property, trace, engine);
        }
        catch (ReplayMismatchException)
        {
            throw;
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or IndexOutOfRangeException)
        {
            throw new ReplayMismatchException(
                $"The counterexample of '{property.Name}' from {engine} could not be replayed: {e.Message}", e)
            {
                Property = property.Name,
                Engine = engine,
            };
        }
    }

    private static void Run(ScanModel model, ModelProperty property, Counterexample trace, string engine)
    {
        var simulator = ScanSimulator.Compile(model);
        var unknown = trace.PowerUp.ToDictionary(
            p => p.Index,
            p => p.Value is BoolTraceValue b ? b.Value : throw Mismatch(property, engine, null, $"power-up value of '{p.Name}' is not a bool"));
        var state = simulator.PowerUpState(unknown);
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        long scan = 0;
        for (var row = 0; row < trace.Steps.Count; row++)
        {
            var step = trace.Steps[row];
            if (step.FirstScan != scan || step.ScanCount < 1)
            {
                throw Mismatch(property, engine, scan, string.Create(CultureInfo.InvariantCulture, $"row {row} starts at scan {step.FirstScan} with {step.ScanCount} scans"));
            }

            if (row == trace.FailingStep && (step.ScanCount != 1 || row != trace.Steps.Count - 1))
            {
                throw Mismatch(property, engine, scan, "the failing row must be the last row and one scan long");
            }

            foreach (var memory in step.Memories)
            {
                if (!SameValue(SlotValue(model, state, memory.Index), memory.Value))
                {
                    throw Mismatch(property, engine, scan, $"memory '{memory.Name}' is {SlotValue(model, state, memory.Index)} in the simulator, {memory.Value} in the trace");
                }
            }

            foreach (var input in step.Inputs)
            {
                switch (input.Value)
                {
                    case BoolTraceValue b:
                        inputs.SetBool(input.Index, b.Value);
                        break;
                    case RealTraceValue r:
                        inputs.SetReal(input.Index, r.Value);
                        break;
                    default:
                        throw Mismatch(property, engine, scan, $"input '{input.Name}' has no bool or real value");
                }
            }

            for (long i = 0; i < step.ScanCount; i++, scan++)
            {
                simulator.Step(state, inputs, values);
                CheckScan(model, property, trace, engine, step, values, scan);
            }
        }

        if (scan != trace.FailingScan + 1)
        {
            throw Mismatch(property, engine, scan, "the trace does not end at its failing scan");
        }
    }

    private static void CheckScan(
        ScanModel model, ModelProperty property, Counterexample trace, string engine, TraceStep step, ScanValues values, long scan)
    {
        foreach (var assumption in model.Assumptions)
        {
            if (!values.GetBool(assumption.Cell))
            {
                throw Mismatch(property, engine, scan, $"assumption '{assumption.Name ?? model.Cells[assumption.Cell].Name}' is FALSE");
            }
        }

        var holds = values.GetBool(property.Cell);
        if (holds == (scan == trace.FailingScan))
        {
            throw Mismatch(property, engine, scan, holds ? "the property holds at the failing scan" : "the property fails before the failing scan");
        }

        foreach (var cell in step.Cells)
        {
            var simulated = model.Cells[cell.Index].Type == SignalType.Bool
                ? TraceValue.Of(values.GetBool(cell.Index))
                : TraceValue.Of(values.GetReal(cell.Index));
            if (!SameValue(simulated, cell.Value))
            {
                throw Mismatch(property, engine, scan, $"cell '{cell.Name}' is {simulated} in the simulator, {cell.Value} in the trace");
            }
        }
    }

    private static TraceValue SlotValue(ScanModel model, ScanState state, int slot)
    {
        var s = model.StateSlots[slot];
        return s.Kind switch
        {
            StateSlotKind.TimerCounter => new CounterTraceValue(state.GetCounter(slot)),
            StateSlotKind.PreviousValue when s.Type == SignalType.Real => TraceValue.Of(state.GetReal(slot)),
            _ => TraceValue.Of(state.GetBool(slot)),
        };
    }

    private static bool SameValue(TraceValue left, TraceValue right) => (left, right) switch
    {
        (BoolTraceValue a, BoolTraceValue b) => a.Value == b.Value,
        (RealTraceValue a, RealTraceValue b) => a.Value.CompareTo(b.Value) == 0,
        (CounterTraceValue a, CounterTraceValue b) => a.Scans == b.Scans,
        _ => false,
    };

    private static ReplayMismatchException Mismatch(ModelProperty property, string engine, long? scan, string detail) =>
        new(string.Create(
            CultureInfo.InvariantCulture,
            $"The counterexample of '{property.Name}' from {engine} does not replay{(scan is { } s ? $" at scan {s}" : string.Empty)}: {detail}."))
        {
            Property = property.Name,
            Engine = engine,
            Scan = scan,
        };
}
