using System.Globalization;
using System.Xml.Linq;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

public sealed class JUnitReportRendererTests
{
    [Fact]
    public void Render_SampleReport_CountsMatchTheTestCases()
    {
        var suite = Suites(Rendering.Render("junit")).Single();

        var cases = suite.Elements("testcase").ToList();
        Assert.Equal(cases.Count, Count(suite, "tests"));
        Assert.Equal(cases.Count(c => c.Element("failure") is not null), Count(suite, "failures"));
        Assert.Equal(cases.Count(c => c.Element("error") is not null), Count(suite, "errors"));
        Assert.Equal(cases.Count(c => c.Element("skipped") is not null), Count(suite, "skipped"));
        Assert.Equal(5, cases.Count);
    }

    [Fact]
    public void Render_EachVerdict_MapsToItsJUnitOutcome()
    {
        var cases = Suites(Rendering.Render("junit")).Single().Elements("testcase")
            .ToDictionary(c => (string)c.Attribute("name")!, StringComparer.Ordinal);

        Assert.False(cases["CLOSE_BLOCKED_IN_LOCKOUT"].HasElements);
        var failure = cases["NO_DOUBLE_CLOSE"].Element("failure")!;
        Assert.Equal("violated", (string?)failure.Attribute("type"));
        Assert.Contains(">  252", failure.Value, StringComparison.Ordinal);
        Assert.Equal("inconclusive", (string?)cases["SLIP_WITHIN_WINDOW"].Element("error")!.Attribute("type"));
        Assert.Contains("low_gas, spring_charged", (string?)cases["CLOSE_NEEDS_GAS_AND_SPRING"].Element("skipped")!.Attribute("message"), StringComparison.Ordinal);
        Assert.Null(cases["static checks"].Element("failure"));
    }

    [Fact]
    public void Render_SampleReport_CarriesTheSafetyStatementInPropertiesAndSystemOut()
    {
        var suite = Suites(Rendering.Render("junit")).Single();

        var property = suite.Element("properties")!.Elements("property").Single(p => (string?)p.Attribute("name") == "safetyStatement");
        Assert.Equal(SafetyStatement.Text, (string?)property.Attribute("value"));
        Assert.StartsWith(SafetyStatement.Text, suite.Element("system-out")!.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_FileWithErrorsAndHostileText_FailsStaticChecksAndStaysWellFormed()
    {
        var error = new Diagnostic("LP1001", Severity.Error, "unexpected '<&>' \u0001 here \uD800", new SourceSpan("broken.lpl", 10, 1, 2, 5));
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [CheckReportBuilder.ForFile("broken.lpl", null, [error], [])]);
        var writer = new StringWriter();

        JUnitReportRenderer.Render(report, writer);

        var suite = Suites(writer.ToString()).Single();
        var failure = suite.Elements("testcase").Single().Element("failure")!;
        Assert.Contains("unexpected '<&>' ? here ?", failure.Value, StringComparison.Ordinal);
        Assert.Equal("broken.lpl", (string?)suite.Attribute("name"));
    }

    private static IEnumerable<XElement> Suites(string xml)
    {
        Assert.StartsWith("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n", xml, StringComparison.Ordinal);
        var root = XDocument.Parse(xml).Root!;
        Assert.Equal("testsuites", root.Name.LocalName);
        return root.Elements("testsuite");
    }

    private static int Count(XElement element, string attribute) =>
        int.Parse((string)element.Attribute(attribute)!, CultureInfo.InvariantCulture);
}
