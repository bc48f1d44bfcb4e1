using System.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Html;

/// <summary>
/// The check report as one self-contained HTML page (inline style, no scripts, no external assets): the versions,
/// the safety statement in a visible box, the run summary, then per file its scheme, timing, breaker sentence,
/// static diagnostics and a table of the properties and rules that did not apply; for each violation an inline SVG
/// timing diagram, the counterexample table and the justification tree. All text is escaped, and every element is
/// closed, so the page after its doctype is well-formed XML. Nothing depends on the time or the culture.
/// </summary>
public static class HtmlReportRenderer
{
    public static void Render(CheckReport report, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\" />\n")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />\n")
            .Append("<title>LogicProof check report</title>\n<style>\n").Append(HtmlStyle.Css).Append("\n</style>\n</head>\n<body>\n")
            .Append("<h1>LogicProof check report</h1>\n")
            .Append($"<p class=\"meta\">LogicProof {E(report.ToolVersion)}, Z3 {E(report.Z3Version)}</p>\n")
            .Append($"<div class=\"safety\" role=\"note\"><strong>Limits of a proof.</strong> {E(SafetyStatement.Text)}</div>\n");
        WriteSummary(html, report.Summary);
        var violation = 0;
        foreach (var file in report.Files)
        {
            WriteFile(html, file, ref violation);
        }

        html.Append($"<p class=\"meta\">{E(TextReportRenderer.SummaryLine(report.Summary))}</p>\n</body>\n</html>\n");
        writer.Write(html.ToString());
    }

    private static void WriteSummary(StringBuilder html, CheckRunSummary summary)
    {
        html.Append("<h2>Summary</h2>\n<table class=\"summary\">\n")
            .Append("<tr><th>files</th><th>proved</th><th>violated</th><th>inconclusive</th><th>not applicable</th>")
            .Append("<th>errors</th><th>warnings</th><th>notes</th><th>exit code</th></tr>\n<tr>");
        foreach (var count in new[]
        {
            summary.Files, summary.Proved, summary.Violated, summary.Inconclusive, summary.NotApplicable,
            summary.Errors, summary.Warnings, summary.Notes, summary.ExitCode,
        })
        {
            html.Append($"<td>{E(ReportSentences.Count(count))}</td>");
        }

        html.Append("</tr>\n</table>\n");
    }

    private static void WriteFile(StringBuilder html, FileCheckReport file, ref int violation)
    {
        html.Append($"<section class=\"file\">\n<h2>{E(file.Path)}</h2>\n");
        if (file.SchemeName is not null)
        {
            html.Append($"<p>Scheme {E(file.SchemeName)}, {E(file.ScanTimingText)}.</p>\n")
                .Append($"<p class=\"breaker\">{E(ReportSentences.Breaker(file.BreakerModelled))}</p>\n");
        }

        html.Append("<h3>Static checks</h3>\n");
        if (file.Diagnostics.Count == 0)
        {
            html.Append("<p>No findings.</p>\n");
        }
        else
        {
            html.Append("<ul>\n");
            foreach (var diagnostic in file.Diagnostics)
            {
                html.Append($"<li class=\"{ReportSentences.SeverityName(diagnostic.Severity)}\">{E(ReportSentences.DiagnosticLine(diagnostic))}");
                foreach (var related in diagnostic.Related)
                {
                    html.Append($"<br />{E($"{related.Span}: {related.Message}")}");
                }

                html.Append("</li>\n");
            }

            html.Append("</ul>\n");
        }

        WriteProperties(html, file);
        foreach (var property in file.Properties.Where(p => p.Counterexample is not null))
        {
            WriteViolation(html, property, ++violation);
        }

        html.Append("</section>\n");
    }

    private static void WriteProperties(StringBuilder html, FileCheckReport file)
    {
        if (file.Properties.Count == 0 && file.NotApplicableRules.Count == 0)
        {
            return;
        }

        html.Append("<h3>Rules and requirements</h3>\n<table class=\"properties\">\n")
            .Append("<thead><tr><th>verdict</th><th>origin</th><th>name</th><th>statement</th><th>how</th><th>elapsed s</th></tr></thead>\n<tbody>\n");
        foreach (var property in file.Properties)
        {
            var verdict = ReportSentences.Verdict(property.Verdict);
            html.Append($"<tr><td class=\"{verdict}\">{E(verdict)}</td><td>{E(ReportSentences.Origin(property.Origin))}</td>")
                .Append($"<td>{E(property.Name)}</td><td>{E(property.Statement ?? string.Empty)}</td>")
                .Append($"<td>{E(ReportSentences.VerdictDetail(property.Verdict))}</td><td>{E(ReportSentences.Seconds(property.Elapsed))}</td></tr>\n");
        }

        foreach (var rule in file.NotApplicableRules)
        {
            html.Append($"<tr><td class=\"not-applicable\">not applicable</td><td>rule</td><td>{E(rule.RuleId)}</td>")
                .Append($"<td>{E(rule.Statement ?? string.Empty)}</td><td>{E(ReportSentences.MissingRoles(rule))}</td><td></td></tr>\n");
        }

        html.Append("</tbody>\n</table>\n");
        if (file.PowerUpNotes.Count > 0)
        {
            html.Append("<ul>\n");
            foreach (var note in file.PowerUpNotes)
            {
                html.Append($"<li>Power-up: {E(ReportSentences.PowerUp(note))}.</li>\n");
            }

            html.Append("</ul>\n");
        }
    }

    private static void WriteViolation(StringBuilder html, PropertyReport property, int number)
    {
        var view = property.Counterexample!;
        html.Append($"<section class=\"violation\" id=\"violation-{E(ReportSentences.Count(number))}\">\n")
            .Append($"<h3>{E(ReportSentences.Origin(property.Origin))} {E(property.Name)}: violated</h3>\n")
            .Append($"<p>{E(TraceSummary.Headline(property, view))}")
            .Append(property.Span.IsNone ? string.Empty : $" Location: {E(property.Span.ToString())}.")
            .Append("</p>\n");
        if (property.Statement is { } statement)
        {
            html.Append($"<p>Statement: {E(statement)}</p>\n");
        }

        foreach (var note in view.PowerUp)
        {
            html.Append($"<p>Power-up: {E(ReportSentences.PowerUpStart(note))}.</p>\n");
        }

        html.Append("<figure>\n");
        SvgTimingDiagram.Write(html, view);
        html.Append("<figcaption>Inputs, outputs and the property over time (ms). Shaded grey: an accelerated row, drawn shorter than it lasts; ")
            .Append("shaded red with a line: the failing scan.</figcaption>\n</figure>\n");
        HtmlTrace.WriteTable(html, view);
        html.Append($"<h4>Why {E(property.Name)} is FALSE at scan {E(ReportSentences.Count(view.Trace.FailingScan))}</h4>\n");
        HtmlTrace.WriteJustification(html, view.Trace.Justification.Root);
        html.Append("</section>\n");
    }

    private static string E(string text) => HtmlText.Escape(text);
}
