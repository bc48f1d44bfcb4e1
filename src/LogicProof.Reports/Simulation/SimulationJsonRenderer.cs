using System.Globalization;
using System.Text.Json;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Simulation;

/// <summary>
/// A simulation as one JSON object, streamed with one row per line:
/// <code>
/// {"scheme": "QM7", "scanMs": "2", "scans": 3, "changesOnly": false,
///  "columns": [{"name": "CLOSE_CMD", "kind": "input", "type": "bool"}, ...],
///  "rows": [
///   {"scan": 0, "timeMs": "0", "values": [false, "0.25"], "changed": []},
///   ...]}
/// </code>
/// Bools are JSON booleans; reals and times are strings holding the exact value (a decimal, or p/q), because a
/// JSON number would be read as binary floating point by most consumers. <c>changed</c> names the columns that
/// changed since the previous scan.
/// </summary>
public static class SimulationJsonRenderer
{
    public static void Render(SimulationRun run, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        writer.Write("{\"scheme\": ");
        writer.Write(Text(run.SchemeName));
        writer.Write(", \"scanMs\": ");
        writer.Write(Text(ExactNumberText.FormatExact(run.Timing.ScanMilliseconds)));
        writer.Write(", \"scans\": ");
        writer.Write(run.ScanCount.ToString(CultureInfo.InvariantCulture));
        writer.Write(", \"changesOnly\": ");
        writer.Write(run.ChangesOnly ? "true" : "false");
        writer.Write(",\n \"columns\": [");
        for (var i = 0; i < run.Columns.Count; i++)
        {
            var column = run.Columns[i];
            writer.Write(i == 0 ? string.Empty : ", ");
            writer.Write("{\"name\": " + Text(column.Name)
                + ", \"kind\": " + Text(SimulationValueText.Kind(column.Kind))
                + ", \"type\": " + Text(SimulationValueText.Type(column.Type)) + "}");
        }

        writer.Write("],\n \"rows\": [");
        var first = true;
        foreach (var row in run.Rows)
        {
            writer.Write(first ? "\n  " : ",\n  ");
            first = false;
            WriteRow(run, row, writer);
        }

        writer.Write("]}\n");
    }

    private static void WriteRow(SimulationRun run, SimulationRow row, TextWriter writer)
    {
        writer.Write("{\"scan\": ");
        writer.Write(row.Scan.ToString(CultureInfo.InvariantCulture));
        writer.Write(", \"timeMs\": ");
        writer.Write(Text(ExactNumberText.FormatExact(row.TimeMs)));
        writer.Write(", \"values\": [");
        for (var i = 0; i < row.Values.Count; i++)
        {
            var value = row.Values[i];
            writer.Write(i == 0 ? string.Empty : ", ");
            writer.Write(value.Type == SignalType.Bool ? (value.Bool ? "true" : "false") : Text(ExactNumberText.FormatExact(value.Real)));
        }

        writer.Write("], \"changed\": [");
        var firstChange = true;
        for (var i = 0; i < row.Changed.Count; i++)
        {
            if (row.Changed[i])
            {
                writer.Write(firstChange ? string.Empty : ", ");
                writer.Write(Text(run.Columns[i].Name));
                firstChange = false;
            }
        }

        writer.Write("]}");
    }

    private static string Text(string value) => JsonSerializer.Serialize(value);
}
