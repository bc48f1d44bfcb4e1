using System.Text.Json;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Exports;

/// <summary>
/// A counterexample as one JSON object, properties always in this order:
/// <code>
/// {"scheme": "QM7_CLOSE", "property": "NO_DOUBLE_CLOSE", "engine": "bmc", "scanMs": "2",
///  "failingScan": 5001, "failingTimeMs": "10002", "endMs": "10004", "totalScans": 5002,
///  "powerUp": [{"latch": "SEAL", "slot": "SEAL@last", "value": true}],
///  "signals": [{"name": "CLOSE_CMD", "role": "input", "type": "bool"}, ...],
///  "steps": [{"firstScan": 0, "lastScan": 0, "scanCount": 1, "timeMs": "0", "durationMs": "2",
///             "failing": false, "values": {"CLOSE_CMD": false, ...}, "changed": []}, ...],
///  "justification": {"cell": ..., "value": false, "scan": 5001, "file": ..., "line": 31, "column": 1,
///                    "note": null, "terms": [{"text": ..., "value": ...}], "causes": [...]}}
/// </code>
/// Bools are JSON booleans, timer counters JSON integers; reals and times are strings with the exact value (a
/// decimal, or p/q), since most JSON readers turn numbers into binary floating point. <c>changed</c> names the
/// signals that differ from the step before. Timer counters are as at the start of the step.
/// </summary>
public static class CounterexampleJsonExporter
{
    public static void Export(CounterexampleView view, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(view);
        ArgumentNullException.ThrowIfNull(writer);
        JsonOutput.Write(writer, json => Write(json, view));
    }

    internal static void Write(Utf8JsonWriter json, CounterexampleView view)
    {
        var grid = new TraceGrid(view);
        var trace = view.Trace;
        json.WriteStartObject();
        JsonOutput.String(json, "scheme", view.SchemeName);
        JsonOutput.String(json, "property", view.PropertyName);
        JsonOutput.String(json, "engine", view.Engine);
        JsonOutput.Exact(json, "scanMs", view.Timing.ScanMilliseconds);
        json.WriteNumber("failingScan", trace.FailingScan);
        JsonOutput.Exact(json, "failingTimeMs", view.FailingMilliseconds);
        JsonOutput.Exact(json, "endMs", view.EndMilliseconds);
        json.WriteNumber("totalScans", trace.TotalScans);
        json.WriteStartArray("powerUp");
        foreach (var note in view.PowerUp)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "latch", note.Latch);
            JsonOutput.String(json, "slot", note.Slot);
            json.WriteBoolean("value", note.BreakingValue);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("signals");
        foreach (var signal in view.Signals)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "name", signal.Name);
            JsonOutput.String(json, "role", signal.Role.ToString().ToLowerInvariant());
            JsonOutput.String(json, "type", signal.Type.ToString().ToLowerInvariant());
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("steps");
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            WriteStep(json, grid, row);
        }

        json.WriteEndArray();
        json.WritePropertyName("justification");
        WriteNode(json, trace.Justification.Root);
        json.WriteEndObject();
    }

    internal static void WriteValue(Utf8JsonWriter json, string name, TraceValue? value)
    {
        json.WritePropertyName(JsonOutput.Clean(name));
        WriteValue(json, value);
    }

    private static void WriteValue(Utf8JsonWriter json, TraceValue? value)
    {
        switch (value)
        {
            case BoolTraceValue b:
                json.WriteBooleanValue(b.Value);
                break;
            case CounterTraceValue c:
                json.WriteNumberValue(c.Scans);
                break;
            case RealTraceValue:
                JsonOutput.StringValue(json, TraceValueText.Exact(value));
                break;
            default:
                json.WriteNullValue();
                break;
        }
    }

    private static void WriteStep(Utf8JsonWriter json, TraceGrid grid, int row)
    {
        var step = grid.Rows[row];
        json.WriteStartObject();
        json.WriteNumber("firstScan", step.FirstScan);
        json.WriteNumber("lastScan", step.LastScan);
        json.WriteNumber("scanCount", step.ScanCount);
        JsonOutput.Exact(json, "timeMs", step.StartMilliseconds);
        JsonOutput.Exact(json, "durationMs", grid.Duration(row));
        json.WriteBoolean("failing", row == grid.FailingRow);
        json.WriteStartObject("values");
        for (var signal = 0; signal < grid.Signals.Count; signal++)
        {
            WriteValue(json, grid.Signals[signal].Name, grid.Value(row, signal));
        }

        json.WriteEndObject();
        json.WriteStartArray("changed");
        for (var signal = 0; signal < grid.Signals.Count; signal++)
        {
            if (grid.Changed(row, signal))
            {
                JsonOutput.StringValue(json, grid.Signals[signal].Name);
            }
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteNode(Utf8JsonWriter json, JustificationNode node)
    {
        json.WriteStartObject();
        JsonOutput.String(json, "cell", node.Cell);
        WriteValue(json, "value", node.Value);
        json.WriteNumber("scan", node.Scan);
        JsonOutput.Place(json, node.Equation);
        JsonOutput.OptionalString(json, "note", node.Note);
        json.WriteStartArray("terms");
        foreach (var term in node.Terms)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "text", term.Text);
            WriteValue(json, "value", term.Value);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("causes");
        foreach (var cause in node.Causes)
        {
            WriteNode(json, cause);
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
