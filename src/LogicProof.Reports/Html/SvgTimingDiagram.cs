using System.Globalization;
using System.Text;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Html;

/// <summary>
/// An inline SVG timing diagram of a counterexample: one lane per input, output and the property; bools as
/// high/low waveforms, reals as a bus with the value written in it. The time axis is in ms, labelled at the start of
/// every row of the trace. Each row gets a fixed width, wider for an accelerated row (many scans under the same
/// inputs), which is shaded and carries a break mark on the axis because its width does not show its length.
/// The failing scan is shaded red and marked with a vertical line.
/// </summary>
internal static class SvgTimingDiagram
{
    private const int LaneHeight = 30;
    private const int WaveHigh = 7;
    private const int WaveLow = 23;
    private const int ScanWidth = 56;
    private const int AcceleratedWidth = 112;
    private const int Top = 24;
    private const int AxisHeight = 40;
    private const int CharWidth = 8;

    public static void Write(StringBuilder html, CounterexampleView view)
    {
        var grid = new TraceGrid(view);
        var lanes = Enumerable.Range(0, grid.Signals.Count)
            .Where(s => grid.Signals[s].Role is TraceSignalRole.Input or TraceSignalRole.Output or TraceSignalRole.Property)
            .ToList();
        var left = 24 + (CharWidth * lanes.Select(s => grid.Signals[s].Name.Length).DefaultIfEmpty(4).Max());
        var xs = new List<int> { left };
        foreach (var row in grid.Rows)
        {
            xs.Add(xs[^1] + (row.ScanCount > 1 ? AcceleratedWidth : ScanWidth));
        }

        var width = Math.Max(xs[^1] + 48, xs[grid.FailingRow] + 12 + (CharWidth * FailingLabel(grid).Length));
        var lanesBottom = Top + (lanes.Count * LaneHeight);
        var height = lanesBottom + AxisHeight;
        html.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{N(width)}\" height=\"{N(height)}\" viewBox=\"0 0 {N(width)} {N(height)}\" role=\"img\" ")
            .Append($"aria-label=\"{HtmlText.Escape($"Timing diagram of the counterexample to {view.PropertyName}")}\">\n");
        WriteBands(html, grid, xs, lanesBottom);
        for (var lane = 0; lane < lanes.Count; lane++)
        {
            WriteLane(html, grid, lanes[lane], Top + (lane * LaneHeight), xs);
        }

        WriteAxis(html, grid, xs, lanesBottom);
        html.Append("</svg>\n");
    }

    private static void WriteBands(StringBuilder html, TraceGrid grid, List<int> xs, int lanesBottom)
    {
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            var failing = row == grid.FailingRow;
            if (failing || grid.Rows[row].ScanCount > 1)
            {
                var fill = failing ? "#ffe0e0" : "#ececec";
                html.Append($"<rect x=\"{N(xs[row])}\" y=\"{N(Top - 4)}\" width=\"{N(xs[row + 1] - xs[row])}\" height=\"{N(lanesBottom - Top + 4)}\" fill=\"{fill}\">")
                    .Append($"<title>{HtmlText.Escape(RowTitle(grid, row))}</title></rect>\n");
            }
        }

        var failX = xs[grid.FailingRow];
        html.Append($"<line x1=\"{N(failX)}\" y1=\"{N(Top - 12)}\" x2=\"{N(failX)}\" y2=\"{N(lanesBottom + 6)}\" stroke=\"#c00000\" stroke-width=\"2\" />\n");
        html.Append($"<text x=\"{N(failX + 3)}\" y=\"{N(Top - 8)}\" fill=\"#c00000\">{HtmlText.Escape(FailingLabel(grid))}</text>\n");
    }

    private static void WriteLane(StringBuilder html, TraceGrid grid, int signal, int laneTop, List<int> xs)
    {
        var info = grid.Signals[signal];
        html.Append($"<text x=\"4\" y=\"{N(laneTop + 19)}\">{HtmlText.Escape(info.Name)}</text>\n");
        html.Append($"<line x1=\"{N(xs[0])}\" y1=\"{N(laneTop + LaneHeight)}\" x2=\"{N(xs[^1])}\" y2=\"{N(laneTop + LaneHeight)}\" stroke=\"#e0e0e0\" />\n");
        if (info.Type == TraceSignalType.Bool)
        {
            WriteWave(html, grid, signal, laneTop, xs);
        }
        else
        {
            WriteBus(html, grid, signal, laneTop, xs);
        }
    }

    private static void WriteWave(StringBuilder html, TraceGrid grid, int signal, int laneTop, List<int> xs)
    {
        var path = new StringBuilder();
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            if (grid.Value(row, signal) is not BoolTraceValue value)
            {
                continue;
            }

            var y = laneTop + (value.Value ? WaveHigh : WaveLow);
            path.Append(path.Length == 0 || grid.Value(row - 1, signal) is not BoolTraceValue ? $"M{N(xs[row])} {N(y)}" : $" V{N(y)}");
            path.Append($" H{N(xs[row + 1])}");
        }

        if (path.Length > 0)
        {
            html.Append($"<path d=\"{path}\" fill=\"none\" stroke=\"#1f4e9a\" stroke-width=\"2\" />\n");
        }
    }

    private static void WriteBus(StringBuilder html, TraceGrid grid, int signal, int laneTop, List<int> xs)
    {
        var start = 0;
        for (var row = 1; row <= grid.Rows.Count; row++)
        {
            if (row < grid.Rows.Count && !grid.Changed(row, signal))
            {
                continue;
            }

            if (grid.Value(start, signal) is { } value)
            {
                int x0 = xs[start], x1 = xs[row], mid = laneTop + 15;
                html.Append($"<polygon points=\"{N(x0)},{N(mid)} {N(x0 + 4)},{N(laneTop + WaveHigh)} {N(x1 - 4)},{N(laneTop + WaveHigh)} ")
                    .Append($"{N(x1)},{N(mid)} {N(x1 - 4)},{N(laneTop + WaveLow)} {N(x0 + 4)},{N(laneTop + WaveLow)}\" fill=\"#f4f7ff\" stroke=\"#1f4e9a\" />\n");
                html.Append($"<text x=\"{N(x0 + 7)}\" y=\"{N(mid + 4)}\">{HtmlText.Escape(TraceValueText.Display(value))}</text>\n");
            }

            start = row;
        }
    }

    private static void WriteAxis(StringBuilder html, TraceGrid grid, List<int> xs, int lanesBottom)
    {
        var axisY = lanesBottom + 8;
        html.Append($"<line x1=\"{N(xs[0])}\" y1=\"{N(axisY)}\" x2=\"{N(xs[^1])}\" y2=\"{N(axisY)}\" stroke=\"#333\" />\n");
        for (var row = 0; row <= grid.Rows.Count; row++)
        {
            var time = row < grid.Rows.Count ? grid.Rows[row].StartMilliseconds : grid.View.EndMilliseconds;
            html.Append($"<line x1=\"{N(xs[row])}\" y1=\"{N(axisY - 4)}\" x2=\"{N(xs[row])}\" y2=\"{N(axisY + 4)}\" stroke=\"#333\" />\n");
            html.Append($"<text x=\"{N(xs[row] + 2)}\" y=\"{N(axisY + 16)}\">{HtmlText.Escape(ExactNumberText.FormatForDisplay(time))}</text>\n");
            if (row < grid.Rows.Count && grid.Rows[row].ScanCount > 1)
            {
                var mid = (xs[row] + xs[row + 1]) / 2;
                html.Append($"<path d=\"M{N(mid - 5)} {N(axisY + 5)} L{N(mid - 1)} {N(axisY - 5)} M{N(mid + 1)} {N(axisY + 5)} L{N(mid + 5)} {N(axisY - 5)}\" ")
                    .Append("stroke=\"#333\" fill=\"none\" />\n");
            }
        }

        html.Append($"<text x=\"{N(xs[^1] + 6)}\" y=\"{N(axisY + 4)}\">ms</text>\n");
    }

    private static string RowTitle(TraceGrid grid, int row)
    {
        var step = grid.Rows[row];
        var scans = step.ScanCount == 1
            ? "scan " + ReportSentences.Count(step.FirstScan)
            : $"scans {ReportSentences.Count(step.FirstScan)} to {ReportSentences.Count(step.LastScan)}";
        var failing = row == grid.FailingRow ? ", the failing scan" : string.Empty;
        return $"{scans}: {ExactNumberText.FormatForDisplay(grid.Duration(row))} ms from {ExactNumberText.FormatForDisplay(step.StartMilliseconds)} ms{failing}";
    }

    private static string FailingLabel(TraceGrid grid) => "fails at scan " + ReportSentences.Count(grid.View.Trace.FailingScan);

    private static string N(int value) => value.ToString(CultureInfo.InvariantCulture);
}
