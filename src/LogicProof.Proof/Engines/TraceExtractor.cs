using LogicProof.Model.Scan;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tracing;
using Microsoft.Z3;
using Z3Model = Microsoft.Z3.Model;

namespace LogicProof.Proof.Engines;

/// <summary>
/// Reads a counterexample out of a solver model of a power-up path whose last step <paramref name="failingStep"/>
/// falsifies the property. The failing step is reported as one scan: the property is FALSE at its first scan, and
/// the scans after it do not belong to the trace.
/// </summary>
internal static class TraceExtractor
{
    public static Counterexample Extract(Unrolling unrolling, Z3Model solution, int failingStep, ModelProperty property)
    {
        var encoder = unrolling.Encoder;
        var model = encoder.Model;
        var powerUp = model.StateSlots
            .Where(s => s.PowerUp is UnknownPowerUp)
            .Select(s => new NamedValue(s.Index, s.Name, ReadSlot(encoder, solution, unrolling.State(0), s.Index)))
            .ToList();

        var steps = new List<TraceStep>();
        long firstScan = 0;
        for (var k = 0; k <= failingStep; k++)
        {
            var step = unrolling.Step(k);
            var scanCount = k < failingStep ? (long)CounterArithmetic.ReadNumeral(solution.Eval(step.Stride, true)) : 1;
            var inputs = model.Inputs
                .Select(c => new NamedValue(c, model.Cells[c].Name, ReadCell(solution, step.Scan.Cell(c))))
                .ToList();
            var cells = model.Cells
                .Where(c => c.Kind != CellKind.Input && step.Scan.HasCell(c.Index))
                .Select(c => new NamedValue(c.Index, c.Name, ReadCell(solution, step.Scan.Cell(c.Index))))
                .ToList();
            var memories = model.StateSlots
                .Select(s => new NamedValue(s.Index, s.Name, ReadSlot(encoder, solution, unrolling.State(k), s.Index)))
                .ToList();
            steps.Add(new TraceStep(firstScan, scanCount, model.Timing.TimeOfScan(firstScan), inputs, cells, memories));
            firstScan += scanCount;
        }

        var justification = new JustificationBuilder(model, steps).Build(property.Cell, failingStep);
        return new Counterexample(powerUp, steps, failingStep, justification);
    }

    /// <summary>The number of scans before the failing step in a solution (the sum of the earlier strides).</summary>
    public static long ScansBefore(Unrolling unrolling, Z3Model solution, int failingStep)
    {
        long total = 0;
        for (var k = 0; k < failingStep; k++)
        {
            total += (long)CounterArithmetic.ReadNumeral(solution.Eval(unrolling.Step(k).Stride, true));
        }

        return total;
    }

    private static TraceValue ReadSlot(ScanEncoder encoder, Z3Model solution, SymbolicState state, int slot)
    {
        var value = solution.Eval(state[slot], true);
        return encoder.Model.StateSlots[slot].Kind == StateSlotKind.TimerCounter
            ? new CounterTraceValue((long)CounterArithmetic.ReadNumeral(value))
            : ReadValue(value);
    }

    private static TraceValue ReadCell(Z3Model solution, Expr term) => ReadValue(solution.Eval(term, true));

    private static TraceValue ReadValue(Expr value) => value.IsBool
        ? TraceValue.Of(value.IsTrue
            ? true
            : value.IsFalse ? false : throw new InvalidOperationException($"Model value '{value}' is not a bool literal."))
        : TraceValue.Of(RealTerms.Read(value));
}
