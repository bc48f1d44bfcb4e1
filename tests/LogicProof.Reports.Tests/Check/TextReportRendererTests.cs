using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

public sealed class TextReportRendererTests
{
    [Fact]
    public void Render_SampleReport_CarriesTheSafetyStatementAsAParagraph()
    {
        var text = Render(ReportSamples.Report());

        var paragraph = string.Join(' ', text.Split('\n').Skip(2).TakeWhile(line => line.Length > 0));
        Assert.Equal(SafetyStatement.Text, paragraph);
    }

    [Theory]
    [InlineData(true, "The breaker was modelled")]
    [InlineData(false, "The breaker was not modelled: 52a and 52b were free inputs")]
    public void Render_EitherWayOfBreakerModelling_SaysWhichOne(bool modelled, string expected)
    {
        var text = Render(ReportSamples.Report(modelled));

        Assert.Contains(expected, text, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_Violation_MarksTheFailingScanAndTheAcceleratedRange()
    {
        var lines = Render(ReportSamples.Report()).Split('\n');

        var failing = Assert.Single(lines, line => line.TrimStart().StartsWith('>'));
        Assert.Contains("252", failing, StringComparison.Ordinal);
        Assert.EndsWith("0*", failing, StringComparison.Ordinal);
        var accelerated = Assert.Single(lines, line => line.Contains("2..251 (500 ms)", StringComparison.Ordinal));
        Assert.Contains("0*", accelerated, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_Violation_NamesEachJustifyingEquationByFileAndLine()
    {
        var text = Render(ReportSamples.Report());

        Assert.Contains("CLOSE_OUT = TRUE at scan 252, examples/quillmere-bay7/qm7_close.lpl:22", text, StringComparison.Ordinal);
        Assert.Contains("because CLOSE_CMD = TRUE; NOT LOCKOUT_86 = TRUE", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_TableColumns_AreAligned()
    {
        var lines = Render(ReportSamples.Report()).Split('\n');
        var header = Array.FindIndex(lines, line => line.Contains("time_ms", StringComparison.Ordinal));

        var rows = lines.Skip(header).Take(5).ToList();
        var bars = rows.Select(row => row.IndexOf('|', StringComparison.Ordinal)).Distinct();
        Assert.Single(bars);
    }

    [Fact]
    public void Render_FileThatCouldNotBeModelled_ListsItsDiagnosticsOnly()
    {
        var error = new Diagnostic("LP1001", Severity.Error, "unexpected ';'", new SourceSpan("broken.lpl", 10, 1, 2, 5));
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [CheckReportBuilder.ForFile("broken.lpl", null, [error], [])]);

        var text = Render(report);

        Assert.Contains("broken.lpl:2:5: error LP1001: unexpected ';'", text, StringComparison.Ordinal);
        Assert.DoesNotContain("scheme ", text, StringComparison.Ordinal);
        Assert.EndsWith("exit code 3\n", text, StringComparison.Ordinal);
    }

    private static string Render(CheckReport report)
    {
        var writer = new StringWriter();
        TextReportRenderer.Render(report, writer);
        return writer.ToString();
    }
}
