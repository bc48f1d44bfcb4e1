using System.Globalization;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Simulation;

/// <summary>
/// A simulation as CSV, streamed: header <c>scan,time_ms,&lt;column names&gt;</c>, then one record per row. Bools are
/// 1 and 0; times and reals are exact (a decimal, or a fraction p/q when the value has no finite decimal form).
/// Comma-separated, lines ending with <c>\n</c>, independent of the culture.
/// </summary>
public static class SimulationCsvRenderer
{
    public static void Render(SimulationRun run, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        writer.Write("scan,time_ms");
        foreach (var column in run.Columns)
        {
            writer.Write(',');
            writer.Write(Quote(column.Name));
        }

        writer.Write('\n');
        foreach (var row in run.Rows)
        {
            writer.Write(row.Scan.ToString(CultureInfo.InvariantCulture));
            writer.Write(',');
            writer.Write(ExactNumberText.FormatExact(row.TimeMs));
            foreach (var value in row.Values)
            {
                writer.Write(',');
                writer.Write(SimulationValueText.Exact(value));
            }

            writer.Write('\n');
        }
    }

    private static string Quote(string text) =>
        text.AsSpan().IndexOfAny(",\"\r\n") < 0 ? text : "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";
}
