using System.Text.Json;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;
using LogicProof.Reports.Exports;

namespace LogicProof.Reports.Check;

/// <summary>
/// The check report as a SARIF 2.1.0 log with one run. The driver lists one reporting descriptor per property
/// (a built-in rule by its id, a requirement as <c>SCHEME.NAME</c>), per rule that did not apply, and per
/// diagnostic code. Results, in file order:
/// <list type="bullet">
/// <item>each static diagnostic: level error, warning or note, at its span, related places as related locations;</item>
/// <item>a violation: level error at the requirement (for a rule, the close output's equation), the trace
/// summarised in the message and given in full in <c>properties.counterexample</c>;</item>
/// <item>an inconclusive verdict: level warning, the reason in the message (the requirement is not established,
/// so it is treated as a finding);</item>
/// <item>a proof: kind <c>pass</c>, level <c>none</c>; a rule that did not apply: kind <c>notApplicable</c>,
/// level <c>none</c>, at the file.</item>
/// </list>
/// The safety statement is in <c>run.properties.safetyStatement</c>, in the driver's full description and in an
/// invocation notification. Artifact URIs are relative to the working directory. Nothing in the log depends on
/// the time, the machine or the culture, so the same report gives the same bytes.
/// </summary>
public static class SarifReportRenderer
{
    public const string SchemaUri = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/os/schemas/sarif-schema-2.1.0.json";

    public static void Render(CheckReport report, TextWriter writer) => Render(report, writer, Environment.CurrentDirectory);

    public static void Render(CheckReport report, TextWriter writer, string workingDirectory)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(workingDirectory);
        var descriptors = SarifDescriptors.Collect(report);
        JsonOutput.Write(writer, json =>
        {
            json.WriteStartObject();
            JsonOutput.String(json, "$schema", SchemaUri);
            JsonOutput.String(json, "version", "2.1.0");
            json.WriteStartArray("runs");
            json.WriteStartObject();
            WriteTool(json, report, descriptors);
            WriteInvocation(json, report);
            json.WriteStartArray("results");
            foreach (var file in report.Files)
            {
                WriteResults(json, file, descriptors, workingDirectory);
            }

            json.WriteEndArray();
            WriteRunProperties(json, report);
            json.WriteEndObject();
            json.WriteEndArray();
            json.WriteEndObject();
        });
    }

    private static void WriteTool(Utf8JsonWriter json, CheckReport report, SarifDescriptors descriptors)
    {
        json.WriteStartObject("tool");
        json.WriteStartObject("driver");
        JsonOutput.String(json, "name", "LogicProof");
        JsonOutput.String(json, "version", report.ToolVersion);
        Message(json, "shortDescription", "Proves close-supervision rules and requirements of relay logic for every input sequence.");
        Message(json, "fullDescription", "LogicProof models a relay's scan cycle, timers and latches and proves with Z3 that rules and "
            + "requirements hold for every input sequence, or gives the shortest timed input sequence that breaks one. "
            + SafetyStatement.Text);
        json.WriteStartArray("rules");
        foreach (var descriptor in descriptors.All)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "id", descriptor.Id);
            JsonOutput.String(json, "name", descriptor.Name);
            Message(json, "shortDescription", descriptor.ShortDescription);
            Message(json, "fullDescription", descriptor.FullDescription);
            Message(json, "help", descriptor.Help);
            json.WriteStartObject("properties");
            JsonOutput.String(json, "category", descriptor.Category);
            json.WriteEndObject();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteInvocation(Utf8JsonWriter json, CheckReport report)
    {
        json.WriteStartArray("invocations");
        json.WriteStartObject();
        json.WriteBoolean("executionSuccessful", report.Summary.ExitCode != CheckExitCode.InternalError);
        json.WriteNumber("exitCode", report.Summary.ExitCode);
        json.WriteStartArray("toolExecutionNotifications");
        json.WriteStartObject();
        JsonOutput.String(json, "level", "note");
        Message(json, "message", SafetyStatement.Text);
        json.WriteEndObject();
        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndArray();
    }

    private static void WriteResults(Utf8JsonWriter json, FileCheckReport file, SarifDescriptors descriptors, string workingDirectory)
    {
        foreach (var diagnostic in file.Diagnostics)
        {
            json.WriteStartObject();
            RuleReference(json, descriptors, diagnostic.Code);
            JsonOutput.String(json, "level", ReportSentences.SeverityName(diagnostic.Severity));
            Message(json, "message", diagnostic.Message);
            Locations(json, diagnostic.Span.File.Length > 0 ? diagnostic.Span : FileSpan(file), workingDirectory);
            if (diagnostic.Related.Count > 0)
            {
                json.WriteStartArray("relatedLocations");
                foreach (var related in diagnostic.Related.Where(r => SarifLocations.HasFile(r.Span)))
                {
                    SarifLocations.Write(json, related.Span, workingDirectory, related.Message);
                }

                json.WriteEndArray();
            }

            json.WriteEndObject();
        }

        foreach (var property in file.Properties)
        {
            WritePropertyResult(json, file, property, descriptors, workingDirectory);
        }

        foreach (var rule in file.NotApplicableRules)
        {
            json.WriteStartObject();
            RuleReference(json, descriptors, rule.RuleId);
            JsonOutput.String(json, "kind", "notApplicable");
            JsonOutput.String(json, "level", "none");
            Message(json, "message", $"Rule {rule.RuleId} was not checked: {ReportSentences.MissingRoles(rule)}. A rule not checked is not passed.");
            Locations(json, FileSpan(file), workingDirectory);
            json.WriteStartObject("properties");
            JsonOutput.String(json, "verdict", "not applicable");
            json.WriteStartArray("missingRoles");
            foreach (var role in rule.MissingRoles)
            {
                JsonOutput.StringValue(json, role);
            }

            json.WriteEndArray();
            json.WriteEndObject();
            json.WriteEndObject();
        }
    }

    private static void WritePropertyResult(
        Utf8JsonWriter json, FileCheckReport file, PropertyReport property, SarifDescriptors descriptors, string workingDirectory)
    {
        var origin = ReportSentences.OriginAtStart(property.Origin);
        json.WriteStartObject();
        RuleReference(json, descriptors, SarifDescriptors.PropertyId(file, property));
        switch (property.Verdict)
        {
            case Proved:
                JsonOutput.String(json, "kind", "pass");
                JsonOutput.String(json, "level", "none");
                Message(json, "message", $"{origin} {property.Name} is proved ({ReportSentences.VerdictDetail(property.Verdict)}).");
                break;
            case Violated:
                JsonOutput.String(json, "level", "error");
                Message(json, "message", property.Counterexample is { } view
                    ? TraceSummary.Describe(property, view) + " The full trace is in this result's properties."
                    : $"{origin} {property.Name} is violated.");
                break;
            case Inconclusive inconclusive:
                JsonOutput.String(json, "level", "warning");
                Message(json, "message", $"{origin} {property.Name} is neither proved nor violated: {inconclusive.Reason}; "
                    + $"no violation within {ReportSentences.Count(inconclusive.DepthReached)} steps.");
                break;
        }

        Locations(json, SarifLocations.HasFile(property.Span) ? property.Span : FileSpan(file), workingDirectory);
        json.WriteStartObject("properties");
        JsonOutput.String(json, "verdict", ReportSentences.Verdict(property.Verdict));
        JsonOutput.String(json, "origin", ReportSentences.Origin(property.Origin));
        JsonOutput.Milliseconds(json, "elapsedMs", property.Elapsed);
        if (property.Counterexample is { } counterexample)
        {
            json.WritePropertyName("counterexample");
            CounterexampleJsonExporter.Write(json, counterexample);
        }

        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteRunProperties(Utf8JsonWriter json, CheckReport report)
    {
        json.WriteStartObject("properties");
        JsonOutput.String(json, "safetyStatement", SafetyStatement.Text);
        JsonOutput.String(json, "z3Version", report.Z3Version);
        json.WriteStartObject("summary");
        json.WriteNumber("files", report.Summary.Files);
        json.WriteNumber("proved", report.Summary.Proved);
        json.WriteNumber("violated", report.Summary.Violated);
        json.WriteNumber("inconclusive", report.Summary.Inconclusive);
        json.WriteNumber("notApplicable", report.Summary.NotApplicable);
        json.WriteNumber("exitCode", report.Summary.ExitCode);
        json.WriteEndObject();
        json.WriteStartArray("files");
        foreach (var file in report.Files)
        {
            json.WriteStartObject();
            JsonOutput.String(json, "path", file.Path);
            JsonOutput.OptionalString(json, "scheme", file.SchemeName);
            JsonOutput.String(json, "scanTiming", file.ScanTimingText);
            json.WriteBoolean("breakerModelled", file.BreakerModelled);
            JsonOutput.String(json, "breaker", ReportSentences.Breaker(file.BreakerModelled));
            json.WriteStartArray("powerUpNotes");
            foreach (var note in file.PowerUpNotes)
            {
                JsonOutput.StringValue(json, ReportSentences.PowerUp(note));
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void RuleReference(Utf8JsonWriter json, SarifDescriptors descriptors, string id)
    {
        JsonOutput.String(json, "ruleId", id);
        json.WriteNumber("ruleIndex", descriptors.IndexOf(id));
    }

    private static void Locations(Utf8JsonWriter json, Core.Text.SourceSpan span, string workingDirectory)
    {
        json.WriteStartArray("locations");
        if (SarifLocations.HasFile(span))
        {
            SarifLocations.Write(json, span, workingDirectory);
        }

        json.WriteEndArray();
    }

    private static Core.Text.SourceSpan FileSpan(FileCheckReport file) => new(file.Path, 0, 0, 0, 0);

    private static void Message(Utf8JsonWriter json, string name, string text)
    {
        json.WriteStartObject(name);
        JsonOutput.String(json, "text", text);
        json.WriteEndObject();
    }
}
