using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Reports.Exports;

namespace LogicProof.Reports.Check;

/// <summary>
/// The check report for people, in plain aligned text: a title with the versions, the safety paragraph, then per
/// file its scheme and timing, the breaker sentence, the static diagnostics, one line per property (verdict,
/// origin, name, how the verdict was reached, elapsed time) with its statement, the rules that did not apply, the
/// power-up notes, and for each violation the counterexample table and its justification tree; last the summary
/// line with the exit code. Lines end with <c>\n</c>; nothing depends on the culture.
/// </summary>
public static class TextReportRenderer
{
    private const int ParagraphWidth = 100;
    private const int VerdictWidth = 14;

    public static void Render(CheckReport report, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        Line(writer, $"LogicProof {report.ToolVersion} check report (Z3 {report.Z3Version})");
        Line(writer, string.Empty);
        foreach (var line in TextWrapping.Wrap(SafetyStatement.Text, ParagraphWidth))
        {
            Line(writer, line);
        }

        foreach (var file in report.Files)
        {
            Line(writer, string.Empty);
            WriteFile(file, writer);
        }

        Line(writer, string.Empty);
        Line(writer, SummaryLine(report.Summary));
    }

    /// <summary>The last line of the text report, also useful on its own after another format.</summary>
    public static string SummaryLine(CheckRunSummary summary)
    {
        ArgumentNullException.ThrowIfNull(summary);
        var files = summary.Files == 1 ? "1 file" : ReportSentences.Count(summary.Files) + " files";
        return $"summary: {files}; {summary.Proved} proved, {summary.Violated} violated, {summary.Inconclusive} inconclusive, "
            + $"{summary.NotApplicable} not applicable; {Plural(summary.Errors, "error")}, {Plural(summary.Warnings, "warning")}, "
            + $"{Plural(summary.Notes, "note")}; exit code {ReportSentences.Count(summary.ExitCode)}";
    }

    private static void WriteFile(FileCheckReport file, TextWriter writer)
    {
        Line(writer, "file " + file.Path);
        if (file.SchemeName is not null)
        {
            Line(writer, $"  scheme {file.SchemeName}, {file.ScanTimingText}");
            foreach (var line in TextWrapping.Wrap(ReportSentences.Breaker(file.BreakerModelled), ParagraphWidth - 2))
            {
                Line(writer, "  " + line);
            }
        }

        var errors = file.Diagnostics.Count(d => d.Severity == Severity.Error);
        var warnings = file.Diagnostics.Count(d => d.Severity == Severity.Warning);
        var notes = file.Diagnostics.Count - errors - warnings;
        Line(writer, $"  static checks: {Plural(errors, "error")}, {Plural(warnings, "warning")}, {Plural(notes, "note")}");
        foreach (var diagnostic in file.Diagnostics)
        {
            WriteDiagnostic(diagnostic, writer);
        }

        if (file.Properties.Count > 0 || file.NotApplicableRules.Count > 0)
        {
            Line(writer, "  properties:");
        }

        foreach (var property in file.Properties)
        {
            var verdict = ReportSentences.Verdict(property.Verdict).ToUpperInvariant().PadRight(VerdictWidth);
            Line(writer, $"    {verdict}  {ReportSentences.Origin(property.Origin)} {property.Name}: "
                + $"{ReportSentences.VerdictDetail(property.Verdict)}; {ReportSentences.Seconds(property.Elapsed)} s");
            if (property.Statement is { } statement)
            {
                Line(writer, new string(' ', VerdictWidth + 6) + statement);
            }
        }

        foreach (var rule in file.NotApplicableRules)
        {
            Line(writer, $"    {"NOT APPLICABLE".PadRight(VerdictWidth)}  rule {rule.RuleId}: {ReportSentences.MissingRoles(rule)}");
            if (rule.Statement is { } statement)
            {
                Line(writer, new string(' ', VerdictWidth + 6) + statement);
            }
        }

        foreach (var note in file.PowerUpNotes)
        {
            Line(writer, "  power-up: " + ReportSentences.PowerUp(note));
        }

        foreach (var property in file.Properties.Where(p => p.Counterexample is not null))
        {
            WriteViolation(property, writer);
        }
    }

    private static void WriteDiagnostic(Diagnostic diagnostic, TextWriter writer)
    {
        Line(writer, $"    {Place(diagnostic.Span)}{ReportSentences.SeverityName(diagnostic.Severity)} {diagnostic.Code}: {diagnostic.Message}");
        foreach (var related in diagnostic.Related)
        {
            Line(writer, $"      {Place(related.Span)}{related.Message}");
        }
    }

    private static void WriteViolation(PropertyReport property, TextWriter writer)
    {
        var view = property.Counterexample!;
        var trace = view.Trace;
        var failingTime = Model.Simulation.ExactNumberText.FormatForDisplay(view.FailingMilliseconds);
        Line(writer, string.Empty);
        var place = property.Span.File.Length == 0 ? string.Empty : " at " + Place(property.Span).TrimEnd(' ', ':');
        Line(writer, $"  {ReportSentences.Origin(property.Origin)} {property.Name} violated{place}");
        Line(writer, $"    found by {view.Engine}: fails at scan {ReportSentences.Count(trace.FailingScan)} ({failingTime} ms), "
            + $"{ReportSentences.Count(trace.TotalScans)} scans from power-up in {ReportSentences.Count(trace.Steps.Count)} rows");
        CounterexampleTextExporter.Write(view, writer, "    ");
    }

    private static string Place(SourceSpan span) =>
        span.IsNone ? (span.File.Length == 0 ? string.Empty : span.File + ": ") : span + ": ";

    private static string Plural(int count, string noun) => ReportSentences.Count(count) + " " + noun + (count == 1 ? string.Empty : "s");

    private static void Line(TextWriter writer, string text)
    {
        writer.Write(text);
        writer.Write('\n');
    }
}
