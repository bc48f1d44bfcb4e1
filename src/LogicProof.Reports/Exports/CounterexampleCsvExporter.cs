using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Traces;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Exports;

/// <summary>
/// A counterexample as an input trace for the simulator (the CSV format documented on
/// <see cref="InputTraceReader"/>, written by <see cref="InputTraceWriter"/>): a header with every input of the
/// model, a row at 0 ms with every value, then a row only where an input changes, holding only the changed
/// values, and an END row when the failing scan ends. Reading it back with the same model gives the trace's
/// inputs at every scan, so <c>simulate FILE --inputs exported.csv</c> replays the counterexample (with the
/// <c>--powerup</c> values the comment names, when the trace starts a latch of unknown power-up). Inputs outside
/// the property's cone are not in the trace and stay FALSE (or their default real). The leading comment lists
/// how long each row holds, the test sequence for a relay test set.
/// </summary>
public static class CounterexampleCsvExporter
{
    public static void Export(ScanModel model, CounterexampleView view, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(view);
        ArgumentNullException.ThrowIfNull(writer);
        var rows = view.Trace.Steps.Select(step => new InputTraceRow(step.StartMilliseconds, InputsOf(model, step))).ToList();
        InputTraceWriter.Write(writer, model, rows, view.EndMilliseconds, Comments(view, rows));
    }

    private static ScanInputs InputsOf(ScanModel model, TraceStep step)
    {
        var inputs = InputTrace.DefaultInputs(model);
        foreach (var input in step.Inputs)
        {
            if ((uint)input.Index >= (uint)model.Cells.Count || model.Cells[input.Index].Kind != CellKind.Input)
            {
                throw new ArgumentException($"'{input.Name}' (cell {input.Index}) is not an input of scheme '{model.Name}': the trace belongs to another model.", nameof(model));
            }

            switch (input.Value)
            {
                case BoolTraceValue b when model.Cells[input.Index].Type == SignalType.Bool:
                    inputs.SetBool(input.Index, b.Value);
                    break;
                case RealTraceValue r when model.Cells[input.Index].Type == SignalType.Real:
                    inputs.SetReal(input.Index, r.Value);
                    break;
                default:
                    throw new ArgumentException($"the trace gives input '{input.Name}' a value of another type.", nameof(model));
            }
        }

        return inputs;
    }

    private static List<string> Comments(CounterexampleView view, List<InputTraceRow> rows)
    {
        var comments = new List<string>
        {
            $"LogicProof counterexample: {view.PropertyName} of scheme {view.SchemeName}, found by {view.Engine}.",
            $"It fails at scan {ReportSentences.Count(view.Trace.FailingScan)} ({Ms(view.FailingMilliseconds)} ms after power-up); the END row stops the run when that scan ends.",
        };
        if (view.PowerUp.Count > 0)
        {
            comments.Add("Replay with --powerup " + string.Join(",", view.PowerUp.Select(ReportSentences.PowerUpSetting))
                + " (latches without a declared power-up value).");
        }

        comments.Add("Each row holds until the next:");
        var start = 0;
        for (var i = 1; i <= rows.Count; i++)
        {
            if (i < rows.Count && rows[i].Inputs.Equals(rows[start].Inputs))
            {
                continue;
            }

            var until = i < rows.Count ? rows[i].TimeMs : view.EndMilliseconds;
            comments.Add($"  from {Ms(rows[start].TimeMs)} ms, hold {Ms(until - rows[start].TimeMs)} ms");
            start = i;
        }

        return comments;
    }

    private static string Ms(Fraction value) => ExactNumberText.FormatForDisplay(value);
}
