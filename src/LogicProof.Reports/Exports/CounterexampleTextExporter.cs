using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Exports;

/// <summary>
/// A counterexample as plain text: the latches started at a chosen power-up value, the table (one row per trace
/// step: scan, or a scan range with its duration for an accelerated row; time in ms; inputs; outputs; the other
/// cone cells; timer counters; the property), a legend, then the justification tree naming each equation by
/// file:line. <c>*</c> marks a value changed since the row above and <c>&gt;</c> the failing scan. Lines end with
/// <c>\n</c>; nothing depends on the culture.
/// </summary>
public static class CounterexampleTextExporter
{
    private const string ChangeMark = "*";

    public static void Export(CounterexampleView view, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(view);
        ArgumentNullException.ThrowIfNull(writer);
        Write(view, writer, string.Empty);
    }

    internal static void Write(CounterexampleView view, TextWriter writer, string indent)
    {
        var grid = new TraceGrid(view);
        foreach (var note in view.PowerUp)
        {
            Line(writer, indent, "power-up: " + ReportSentences.PowerUpStart(note));
        }

        WriteTable(grid, writer, indent);
        var accelerated = grid.Rows.Any(row => row.ScanCount > 1);
        Line(writer, indent, "* changed since the row above; > the failing scan; ~ a rounded value"
            + (grid.Signals.Any(s => s.Role == TraceSignalRole.Timer) ? "; timer counters as at the start of the row" : string.Empty));
        if (accelerated)
        {
            Line(writer, indent, "a..b (d ms): scans a to b under the same inputs, d ms in all; only the timer counters advance in them");
        }

        Line(writer, indent, $"why {view.PropertyName} is FALSE at scan {ReportSentences.Count(view.Trace.FailingScan)}:");
        WriteJustification(view.Trace.Justification.Root, writer, indent + "  ");
    }

    private static void WriteTable(TraceGrid grid, TextWriter writer, string indent)
    {
        var headers = new List<string> { " ", "scan", "time_ms" };
        var groups = new List<int> { -1, -1, -1 };
        foreach (var signal in grid.Signals)
        {
            headers.Add(signal.Name);
            groups.Add((int)signal.Role);
        }

        var table = new TextTable(headers, groups);
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            var step = grid.Rows[row];
            var cells = new List<string>
            {
                row == grid.FailingRow ? ">" : " ",
                ScanText(grid, row, step),
                ExactNumberText.FormatForDisplay(step.StartMilliseconds),
            };
            for (var signal = 0; signal < grid.Signals.Count; signal++)
            {
                cells.Add(TraceValueText.Display(grid.Value(row, signal)) + (grid.Changed(row, signal) ? ChangeMark : string.Empty));
            }

            table.Add(cells);
        }

        table.Write(writer, indent);
    }

    private static string ScanText(TraceGrid grid, int row, TraceStep step) =>
        step.ScanCount == 1
            ? ReportSentences.Count(step.FirstScan)
            : $"{ReportSentences.Count(step.FirstScan)}..{ReportSentences.Count(step.LastScan)} ({ExactNumberText.FormatForDisplay(grid.Duration(row))} ms)";

    private static void WriteJustification(JustificationNode node, TextWriter writer, string indent)
    {
        Line(writer, indent, ReportSentences.Justification(node));
        if (node.Terms.Count > 0)
        {
            Line(writer, indent, "  " + ReportSentences.Because(node));
        }

        foreach (var cause in node.Causes)
        {
            WriteJustification(cause, writer, indent + "  ");
        }
    }

    private static void Line(TextWriter writer, string indent, string text)
    {
        writer.Write(indent);
        writer.Write(text);
        writer.Write('\n');
    }
}
