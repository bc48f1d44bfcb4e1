using System.Globalization;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The oracle's own replay of a counterexample in the simulator (independent of the product's replayer): from the
/// trace's power-up values, each row's inputs held for its scans; every assumption must be TRUE at every scan, the
/// property TRUE before the failing scan and FALSE at it. Returns null when the trace replays, else what went wrong.
/// A trace found on a property's cone lists only the unknown latches and inputs of that cone; the others cannot
/// affect the property, so they start FALSE here.
/// </summary>
internal static class SimulatorReplay
{
    public static string? Check(ScanModel model, ModelProperty property, Counterexample trace)
    {
        var simulator = ScanSimulator.Compile(model);
        var given = new Dictionary<int, bool>();
        foreach (var value in trace.PowerUp)
        {
            if (value.Value is not BoolTraceValue b)
            {
                return $"power-up value of {value.Name} is not a bool";
            }

            given[value.Index] = b.Value;
        }

        ScanState state;
        try
        {
            state = simulator.PowerUpStateDefaultingUnknownToFalse(given).State;
        }
        catch (ArgumentException e)
        {
            return "power-up values do not fit the model: " + e.Message;
        }

        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        long scan = 0;
        foreach (var step in trace.Steps)
        {
            foreach (var input in step.Inputs)
            {
                switch (input.Value)
                {
                    case BoolTraceValue b:
                        inputs.SetBool(input.Index, b.Value);
                        break;
                    case RealTraceValue r when model.Cells[input.Index].Range is not { } range
                        || (r.Value.CompareTo(range.Low) >= 0 && r.Value.CompareTo(range.High) <= 0):
                        inputs.SetReal(input.Index, r.Value);
                        break;
                    default:
                        return $"input {input.Name} has no value of its type within its range: {input.Value}";
                }
            }

            for (var i = 0; i < step.ScanCount; i++, scan++)
            {
                simulator.Step(state, inputs, values);
                if (model.Assumptions.Any(a => !values.GetBool(a.Cell)))
                {
                    return Text($"an assumption is FALSE at scan {scan}");
                }

                var holds = values.GetBool(property.Cell);
                if (scan < trace.FailingScan && !holds)
                {
                    return Text($"the property already fails at scan {scan}, before the failing scan {trace.FailingScan}");
                }

                if (scan == trace.FailingScan)
                {
                    return holds ? Text($"the property holds at the failing scan {scan}") : null;
                }
            }
        }

        return Text($"the trace ends at scan {scan} before its failing scan {trace.FailingScan}");
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
