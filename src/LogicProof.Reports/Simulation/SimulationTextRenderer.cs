using System.Globalization;
using System.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Simulation;

/// <summary>
/// A simulation as an aligned text table, streamed row by row: a title line, a header, then one line per row.
/// Columns: scan, time_ms, the inputs, a bar, the outputs and the shown cells. Bools print as 1 and 0, reals and
/// times with at most four decimals (a trailing <c>~</c> marks a rounded value), and <c>*</c> after a value marks a
/// change since the previous scan. Lines end with <c>\n</c>; nothing depends on the culture.
/// </summary>
public static class SimulationTextRenderer
{
    private const string ColumnGap = "  ";
    private const string ChangeMark = "*";

    public static void Render(SimulationRun run, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        var lastTime = run.Timing.TimeOfScan(Math.Max(run.ScanCount - 1, 0));
        var scanWidth = Math.Max("scan".Length, Count(Math.Max(run.ScanCount - 1, 0)).Length);
        var timeWidth = Math.Max("time_ms".Length, ExactNumberText.FormatForDisplay(lastTime).Length);
        var widths = run.Columns.Select(column => Math.Max(column.Name.Length, column.Type == SignalType.Bool ? 2 : 8)).ToArray();
        var inputCount = run.Columns.Count(column => column.Kind == SimulationColumnKind.Input);
        var barBeforeColumn = inputCount > 0 && inputCount < run.Columns.Count ? inputCount : -1;

        writer.Write(Title(run));
        writer.Write('\n');
        var header = new StringBuilder();
        header.Append("scan".PadRight(scanWidth)).Append(ColumnGap).Append("time_ms".PadRight(timeWidth));
        for (var i = 0; i < run.Columns.Count; i++)
        {
            AppendCell(header, run.Columns[i].Name, widths[i], i == barBeforeColumn);
        }

        writer.Write(header.ToString().TrimEnd());
        writer.Write('\n');
        foreach (var row in run.Rows)
        {
            var line = new StringBuilder();
            line.Append(Count(row.Scan).PadRight(scanWidth)).Append(ColumnGap)
                .Append(ExactNumberText.FormatForDisplay(row.TimeMs).PadRight(timeWidth));
            for (var i = 0; i < run.Columns.Count; i++)
            {
                var text = SimulationValueText.Display(row.Values[i]) + (row.Changed[i] ? ChangeMark : string.Empty);
                AppendCell(line, text, widths[i], i == barBeforeColumn);
            }

            writer.Write(line.ToString().TrimEnd());
            writer.Write('\n');
        }
    }

    private static string Title(SimulationRun run)
    {
        var scan = ExactNumberText.FormatForDisplay(run.Timing.ScanMilliseconds);
        var exactScan = ExactNumberText.IsTerminating(run.Timing.ScanMilliseconds)
            ? string.Empty
            : " (exactly " + ExactNumberText.FormatExact(run.Timing.ScanMilliseconds) + " ms)";
        var rows = run.ChangesOnly ? "; scans without a change are left out" : string.Empty;
        return $"{run.SchemeName}: {Count(run.ScanCount)} scans of {scan} ms{exactScan}{rows}; * marks a change since the previous scan, ~ a rounded value";
    }

    private static void AppendCell(StringBuilder line, string text, int width, bool barBefore)
    {
        line.Append(barBefore ? ColumnGap + "|" + ColumnGap : ColumnGap);
        line.Append(text.PadRight(width));
    }

    private static string Count(long value) => value.ToString(CultureInfo.InvariantCulture);
}
