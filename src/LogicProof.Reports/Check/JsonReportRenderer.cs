using System.Text.Json;
using LogicProof.Core.Diagnostics;
using LogicProof.Proof.Results;
using LogicProof.Reports.Exports;

namespace LogicProof.Reports.Check;

/// <summary>
/// The check report as one JSON document, properties always in this order:
/// <code>
/// {"tool": {"name": "LogicProof", "version": ..., "z3Version": ...},
///  "safetyStatement": ...,
///  "summary": {"files", "proved", "violated", "inconclusive", "notApplicable", "errors", "warnings", "notes", "exitCode"},
///  "files": [{"path", "scheme", "scanTiming": {"text", "scanMs", "frequencyHz"}, "breakerModelled", "breaker",
///             "diagnostics": [{"code", "severity", "message", "file", "line", "column", "related": [...]}],
///             "properties": [{"name", "origin", "statement", "file", "line", "column", "verdict", "elapsedMs",
///                             then per verdict: "engine", "depth", "invariant" | "engine", "counterexample" |
///                             "reason", "depthReached"}],
///             "notApplicableRules": [{"id", "statement", "missingRoles"}],
///             "powerUpNotes": [{"property", "latch", "slot", "breakingValue"}]}]}
/// </code>
/// Reals, times and the elapsed time are strings with the exact value; the counterexample is the object of
/// <see cref="CounterexampleJsonExporter"/>. Text is UTF-8, lines end with <c>\n</c>, nothing depends on the culture.
/// </summary>
public static class JsonReportRenderer
{
    public static void Render(CheckReport report, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        JsonOutput.Write(writer, json => Write(json, report));
    }

    private static void Write(Utf8JsonWriter json, CheckReport report)
    {
        json.WriteStartObject();
        json.WriteStartObject("tool");
        JsonOutput.String(json, "name", "LogicProof");
        JsonOutput.String(json, "version", report.ToolVersion);
        JsonOutput.String(json, "z3Version", report.Z3Version);
        json.WriteEndObject();
        JsonOutput.String(json, "safetyStatement", SafetyStatement.Text);
        WriteSummary(json, report.Summary);
        json.WriteStartArray("files");
        foreach (var file in report.Files)
        {
            WriteFile(json, file);
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteSummary(Utf8JsonWriter json, CheckRunSummary summary)
    {
        json.WriteStartObject("summary");
        json.WriteNumber("files", summary.Files);
        json.WriteNumber("proved", summary.Proved);
        json.WriteNumber("violated", summary.Violated);
        json.WriteNumber("inconclusive", summary.Inconclusive);
        json.WriteNumber("notApplicable", summary.NotApplicable);
        json.WriteNumber("errors", summary.Errors);
        json.WriteNumber("warnings", summary.Warnings);
        json.WriteNumber("notes", summary.Notes);
        json.WriteNumber("exitCode", summary.ExitCode);
        json.WriteEndObject();
    }

    private static void WriteFile(Utf8JsonWriter json, FileCheckReport file)
    {
        json.WriteStartObject();
        JsonOutput.String(json, "path", file.Path);
        JsonOutput.OptionalString(json, "scheme", file.SchemeName);
        if (file.Timing is { } timing)
        {
            json.WriteStartObject("scanTiming");
            JsonOutput.String(json, "text", file.ScanTimingText);
            JsonOutput.Exact(json, "scanMs", timing.ScanMilliseconds);
            JsonOutput.Exact(json, "frequencyHz", timing.FrequencyHz);
            json.WriteEndObject();
            json.WriteBoolean("breakerModelled", file.BreakerModelled);
            JsonOutput.String(json, "breaker", ReportSentences.Breaker(file.BreakerModelled));
        }
        else
        {
            json.WriteNull("scanTiming");
        }

        json.WriteStartArray("diagnostics");
        foreach (var diagnostic in file.Diagnostics)
        {
            WriteDiagnostic(json, diagnostic);
        }

        json.WriteEndArray();
        json.WriteStartArray("properties");
        foreach (var property in file.Properties)
        {
            WriteProperty(json, property);
        }

        json.WriteEndArray();
        json.WriteStartArray("notApplicableRules");
        foreach (var rule in file.NotApplicableRules)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "id", rule.RuleId);
            JsonOutput.OptionalString(json, "statement", rule.Statement);
            json.WriteStartArray("missingRoles");
            foreach (var role in rule.MissingRoles)
            {
                JsonOutput.StringValue(json, role);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("powerUpNotes");
        foreach (var note in file.PowerUpNotes)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "property", note.Property);
            JsonOutput.String(json, "latch", note.Latch);
            JsonOutput.String(json, "slot", note.Slot);
            json.WriteBoolean("breakingValue", note.BreakingValue);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteDiagnostic(Utf8JsonWriter json, Diagnostic diagnostic)
    {
        json.WriteStartObject();
        JsonOutput.String(json, "code", diagnostic.Code);
        JsonOutput.String(json, "severity", ReportSentences.SeverityName(diagnostic.Severity));
        JsonOutput.String(json, "message", diagnostic.Message);
        JsonOutput.Place(json, diagnostic.Span);
        json.WriteStartArray("related");
        foreach (var related in diagnostic.Related)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "message", related.Message);
            JsonOutput.Place(json, related.Span);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteProperty(Utf8JsonWriter json, PropertyReport property)
    {
        json.WriteStartObject();
        JsonOutput.String(json, "name", property.Name);
        JsonOutput.String(json, "origin", ReportSentences.Origin(property.Origin));
        JsonOutput.OptionalString(json, "statement", property.Statement);
        JsonOutput.Place(json, property.Span);
        JsonOutput.String(json, "verdict", ReportSentences.Verdict(property.Verdict));
        JsonOutput.Milliseconds(json, "elapsedMs", property.Elapsed);
        switch (property.Verdict)
        {
            case Proved proved:
                JsonOutput.String(json, "engine", proved.Engine);
                if (proved.Depth is { } depth)
                {
                    json.WriteNumber("depth", depth);
                }
                else
                {
                    json.WriteNull("depth");
                }

                JsonOutput.OptionalString(json, "invariant", proved.Invariant);
                break;
            case Violated violated:
                JsonOutput.String(json, "engine", violated.Engine);
                if (property.Counterexample is { } view)
                {
                    json.WritePropertyName("counterexample");
                    CounterexampleJsonExporter.Write(json, view);
                }

                break;
            case Inconclusive inconclusive:
                JsonOutput.String(json, "reason", inconclusive.Reason);
                json.WriteNumber("depthReached", inconclusive.DepthReached);
                break;
        }

        json.WriteEndObject();
    }
}
