using LogicProof.Reports.Check;
using LogicProof.Reports.Html;

namespace LogicProof.Cli.Checking;

/// <summary>Renders a finished check report in the chosen format.</summary>
public static class ReportWriter
{
    public static void Write(CheckReport report, ReportFormat format, TextWriter writer)
    {
        switch (format)
        {
            case ReportFormat.Json:
                JsonReportRenderer.Render(report, writer);
                break;
            case ReportFormat.Sarif:
                SarifReportRenderer.Render(report, writer);
                break;
            case ReportFormat.Junit:
                JUnitReportRenderer.Render(report, writer);
                break;
            case ReportFormat.Html:
                HtmlReportRenderer.Render(report, writer);
                break;
            default:
                TextReportRenderer.Render(report, writer);
                break;
        }
    }
}
