using System.Globalization;
using Fractions;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// Replays a product counterexample in the reference interpreter: each row's inputs (by name) held for its scans, an
/// input the trace does not list keeping its last value (FALSE or 0 at first: such an input is outside the property's
/// cone and cannot matter). Every assumption must hold at every scan, the property before the failing scan, and the
/// property must be FALSE at the failing scan. The trace's power-up values name the product's own memories; those that
/// give a variable's value before the first scan (<c>NAME@last</c>, shown to the user as the latch NAME) must match
/// the reference's start state, and the trace replays when it does so from some such power-up state of the
/// reference (a block's own memory, such as an SR's Q1, is not pinned). Returns null when it replays, else what went
/// wrong.
/// </summary>
internal static class ReferenceReplay
{
    private const string LastScanSuffix = "@last";

    public static string? Check(ReferenceInterpreter interpreter, string propertyName, Counterexample trace)
    {
        var property = interpreter.Properties.ToList().FindIndex(p => string.Equals(p.Name, propertyName, StringComparison.OrdinalIgnoreCase));
        if (property < 0)
        {
            return $"the reference has no property {propertyName}";
        }

        var scans = new List<ReferenceInputs>();
        var bools = new bool[interpreter.Inputs.Count];
        var reals = new Fraction[interpreter.Inputs.Count];
        foreach (var step in trace.Steps)
        {
            foreach (var input in step.Inputs)
            {
                var index = interpreter.InputIndex(input.Name);
                var range = index < 0 ? null : interpreter.Inputs[index].Range;
                switch (input.Value)
                {
                    case BoolTraceValue b when index >= 0:
                        bools[index] = b.Value;
                        break;
                    case RealTraceValue r when index >= 0 && (range is null || (r.Value.CompareTo(range.Low) >= 0 && r.Value.CompareTo(range.High) <= 0)):
                        reals[index] = r.Value.Reduce();
                        break;
                    default:
                        return $"the trace gives {input.Name} the value {input.Value}, which is not a value of an input of the scheme";
                }
            }

            for (var i = 0; i < step.ScanCount; i++)
            {
                scans.Add(new ReferenceInputs([.. bools], [.. reals]));
            }
        }

        if (scans.Count != trace.TotalScans)
        {
            return Text($"the trace has {scans.Count} scans but fails at scan {trace.FailingScan}");
        }

        var pinned = trace.PowerUp
            .Where(v => v.Name.EndsWith(LastScanSuffix, StringComparison.Ordinal) && v.Value is BoolTraceValue)
            .Select(v => (Variable: v.Name[..^LastScanSuffix.Length], ((BoolTraceValue)v.Value).Value))
            .ToList();
        string? problem = null;
        foreach (var start in interpreter.PowerUpStates().Where(s => pinned.All(p => interpreter.LastScanValue(s, p.Variable) is not { } v || v == p.Value)))
        {
            var outcome = Run(interpreter, property, scans, start);
            if (outcome is null)
            {
                return null;
            }

            problem ??= outcome;
        }

        return problem ?? "no power-up state of the reference has the trace's power-up values";
    }

    private static string? Run(ReferenceInterpreter interpreter, int property, List<ReferenceInputs> scans, ReferenceState state)
    {
        var values = new bool[interpreter.Properties.Count];
        for (var scan = 0; scan < scans.Count; scan++)
        {
            if (!interpreter.Step(state, scans[scan], values, out state))
            {
                return Text($"an assumption is FALSE at scan {scan}");
            }

            var last = scan == scans.Count - 1;
            if (values[property] == last)
            {
                return last ? Text($"the property holds at the failing scan {scan}") : Text($"the property already fails at scan {scan}");
            }
        }

        return null;
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
