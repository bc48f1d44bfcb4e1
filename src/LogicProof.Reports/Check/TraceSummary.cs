using System.Text;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Check;

/// <summary>
/// A counterexample in one sentence, for messages that must stay short (SARIF, JUnit): when it fails, then the
/// input changes by time ("at 0 ms LOCKOUT_86=1; at 4 ms CLOSE_CMD=1"), the first row listing only inputs away
/// from FALSE/0, at most <see cref="MaxChanges"/> changes.
/// </summary>
internal static class TraceSummary
{
    public const int MaxChanges = 20;

    public static string Headline(PropertyReport property, CounterexampleView view)
    {
        var trace = view.Trace;
        var failingTime = ExactNumberText.FormatForDisplay(view.FailingMilliseconds);
        return $"{ReportSentences.OriginAtStart(property.Origin)} {property.Name} is violated: it fails at scan {ReportSentences.Count(trace.FailingScan)} "
            + $"({failingTime} ms after power-up), found by {view.Engine}.";
    }

    public static string Describe(PropertyReport property, CounterexampleView view)
    {
        var text = new StringBuilder(Headline(property, view));
        text.Append(" Inputs: ").Append(InputChanges(view)).Append('.');
        if (view.PowerUp.Count > 0)
        {
            text.Append(" Power-up: ")
                .Append(string.Join(", ", view.PowerUp.Select(ReportSentences.PowerUpSetting)))
                .Append('.');
        }

        return text.ToString();
    }

    private static string InputChanges(CounterexampleView view)
    {
        var grid = new TraceGrid(view);
        var moments = new List<string>();
        var shown = 0;
        for (var row = 0; row < grid.Rows.Count && shown < MaxChanges; row++)
        {
            var changes = new List<string>();
            for (var signal = 0; signal < grid.Signals.Count && shown < MaxChanges; signal++)
            {
                if (grid.Signals[signal].Role != TraceSignalRole.Input)
                {
                    continue;
                }

                var value = grid.Value(row, signal);
                if (row == 0 ? !TraceGrid.IsRest(value) : grid.Changed(row, signal))
                {
                    changes.Add(grid.Signals[signal].Name + "=" + TraceValueText.Display(value));
                    shown++;
                }
            }

            if (changes.Count > 0)
            {
                moments.Add($"at {ExactNumberText.FormatForDisplay(grid.Rows[row].StartMilliseconds)} ms " + string.Join(", ", changes));
            }
        }

        if (moments.Count == 0)
        {
            return "all FALSE (or 0) throughout";
        }

        var total = CountChanges(grid);
        return string.Join("; ", moments) + (total > shown ? $"; ... ({ReportSentences.Count(total - shown)} more changes)" : string.Empty);
    }

    private static int CountChanges(TraceGrid grid)
    {
        var count = 0;
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            for (var signal = 0; signal < grid.Signals.Count; signal++)
            {
                if (grid.Signals[signal].Role == TraceSignalRole.Input
                    && (row == 0 ? !TraceGrid.IsRest(grid.Value(row, signal)) : grid.Changed(row, signal)))
                {
                    count++;
                }
            }
        }

        return count;
    }
}
