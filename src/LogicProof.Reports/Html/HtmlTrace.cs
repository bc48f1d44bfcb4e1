using System.Text;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Html;

/// <summary>A counterexample's table and justification tree as HTML, matching the text export row for row.</summary>
internal static class HtmlTrace
{
    public static void WriteTable(StringBuilder html, CounterexampleView view)
    {
        var grid = new TraceGrid(view);
        html.Append("<table class=\"trace\">\n<thead><tr><th>scan</th><th>time ms</th><th>lasts ms</th>");
        foreach (var signal in grid.Signals)
        {
            html.Append($"<th title=\"{HtmlText.Escape(signal.Role.ToString().ToLowerInvariant())}\">{HtmlText.Escape(signal.Name)}</th>");
        }

        html.Append("</tr></thead>\n<tbody>\n");
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            var step = grid.Rows[row];
            var scans = step.ScanCount == 1
                ? ReportSentences.Count(step.FirstScan)
                : ReportSentences.Count(step.FirstScan) + ".." + ReportSentences.Count(step.LastScan);
            html.Append(row == grid.FailingRow ? "<tr class=\"failing\">" : "<tr>")
                .Append($"<td>{HtmlText.Escape(scans)}{(row == grid.FailingRow ? " (fails)" : string.Empty)}</td>")
                .Append($"<td>{HtmlText.Escape(ExactNumberText.FormatForDisplay(step.StartMilliseconds))}</td>")
                .Append($"<td>{HtmlText.Escape(ExactNumberText.FormatForDisplay(grid.Duration(row)))}</td>");
            for (var signal = 0; signal < grid.Signals.Count; signal++)
            {
                var text = HtmlText.Escape(TraceValueText.Display(grid.Value(row, signal)));
                html.Append(grid.Changed(row, signal) ? $"<td class=\"changed\">{text}*</td>" : $"<td>{text}</td>");
            }

            html.Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n");
        html.Append("<p class=\"meta\">* changed since the row above; ~ a rounded value; a scan range is an accelerated row: the same inputs for all its scans, in which only timer counters advance (shown as at the row's start).</p>\n");
    }

    public static void WriteJustification(StringBuilder html, JustificationNode root)
    {
        html.Append("<ul class=\"why\">\n");
        WriteNode(html, root);
        html.Append("</ul>\n");
    }

    private static void WriteNode(StringBuilder html, JustificationNode node)
    {
        html.Append("<li>").Append(HtmlText.Escape(ReportSentences.Justification(node)));
        if (node.Terms.Count > 0)
        {
            html.Append("<br />").Append(HtmlText.Escape(ReportSentences.Because(node)));
        }

        if (node.Causes.Count > 0)
        {
            html.Append("\n<ul>\n");
            foreach (var cause in node.Causes)
            {
                WriteNode(html, cause);
            }

            html.Append("</ul>\n");
        }

        html.Append("</li>\n");
    }
}
