using System.Globalization;
using LogicProof.Reports.Check;
using LogicProof.Reports.Exports;
using LogicProof.Reports.Html;

namespace LogicProof.Reports.Tests.Check;

/// <summary>Renders the sample report in each format to a string, optionally under a given culture.</summary>
internal static class Rendering
{
    public const string WorkingDirectory = "/srv/relay-logic";

    public static TheoryData<string> Formats =>
        ["text", "json", "sarif", "junit", "html", "counterexample-text", "counterexample-json", "csv", "vcd"];

    public static string Render(string format) => format switch
    {
        "text" => With(writer => TextReportRenderer.Render(ReportSamples.Report(), writer)),
        "json" => With(writer => JsonReportRenderer.Render(ReportSamples.Report(), writer)),
        "sarif" => With(writer => SarifReportRenderer.Render(ReportSamples.Report(), writer, WorkingDirectory)),
        "junit" => With(writer => JUnitReportRenderer.Render(ReportSamples.Report(), writer)),
        "html" => With(writer => HtmlReportRenderer.Render(ReportSamples.Report(), writer)),
        "counterexample-text" => With(writer => CounterexampleTextExporter.Export(ReportSamples.Violation(), writer)),
        "counterexample-json" => With(writer => CounterexampleJsonExporter.Export(ReportSamples.Violation(), writer)),
        "csv" => With(writer => CounterexampleCsvExporter.Export(ReportSamples.Model, ReportSamples.Violation(), writer)),
        "vcd" => With(writer => VcdExporter.Export(ReportSamples.Violation(), writer)),
        _ => throw new ArgumentOutOfRangeException(nameof(format), format, "unknown format"),
    };

    public static string RenderUnder(string culture, string format)
    {
        var previous = CultureInfo.CurrentCulture;
        var previousUi = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(culture);
            CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo(culture);
            return Render(format);
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
            CultureInfo.CurrentUICulture = previousUi;
        }
    }

    private static string With(Action<TextWriter> render)
    {
        var writer = new StringWriter(CultureInfo.CurrentCulture);
        render(writer);
        return writer.ToString();
    }
}
