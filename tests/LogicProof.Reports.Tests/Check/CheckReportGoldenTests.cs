namespace LogicProof.Reports.Tests.Check;

/// <summary>The sample report in each report format, byte for byte against the golden files.</summary>
public sealed class CheckReportGoldenTests
{
    [Theory]
    [InlineData("text", "check-report.txt")]
    [InlineData("json", "check-report.json")]
    [InlineData("sarif", "check-report.sarif")]
    [InlineData("junit", "check-report.junit.xml")]
    public void Render_SampleReport_MatchesGolden(string format, string golden) =>
        GoldenFile.AssertMatches(golden, Rendering.Render(format));
}
