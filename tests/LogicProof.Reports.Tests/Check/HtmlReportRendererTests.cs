using System.Xml.Linq;
using LogicProof.Reports.Check;
using LogicProof.Reports.Html;

namespace LogicProof.Reports.Tests.Check;

public sealed class HtmlReportRendererTests
{
    private const string Doctype = "<!DOCTYPE html>\n";

    [Fact]
    public void Render_SampleReport_IsWellFormedAfterTheDoctype()
    {
        var html = Rendering.Render("html");

        Assert.StartsWith(Doctype, html, StringComparison.Ordinal);
        var document = XDocument.Parse(html[Doctype.Length..]);
        Assert.Equal("html", document.Root!.Name.LocalName);
    }

    [Fact]
    public void Render_SampleReport_ShowsTheSafetyStatementInAVisibleBox()
    {
        var document = Parse(Rendering.Render("html"));

        var box = Assert.Single(document.Descendants("div"), div => (string?)div.Attribute("class") == "safety");
        Assert.Contains(SafetyStatement.Text, box.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_Violation_DrawsOneLanePerInputAndOutputAndMarksTheFailingScan()
    {
        var document = Parse(Rendering.Render("html"));
        XNamespace svg = "http://www.w3.org/2000/svg";

        var diagram = Assert.Single(document.Descendants(svg + "svg"));
        var labels = diagram.Elements(svg + "text").Select(text => text.Value).ToList();
        foreach (var lane in new[] { "CLOSE_CMD", "LOCKOUT_86", "SLIP_HZ", "BKR_52A", "CLOSE_OUT", "NO_DOUBLE_CLOSE" })
        {
            Assert.Contains(lane, labels);
        }

        Assert.DoesNotContain("SEAL", labels);
        Assert.Contains("fails at scan 252", labels);
        Assert.Contains(diagram.Elements(svg + "line"), line => (string?)line.Attribute("stroke") == "#c00000");
        Assert.Contains("506", labels);
    }

    [Fact]
    public void Render_TextWithMarkup_IsEscaped()
    {
        var file = ReportSamples.File();
        var hostile = file.Properties[1] with { Name = "<script>alert(1)</script>", Statement = "A & B > C" };
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [file with { Properties = [hostile] }]);
        var writer = new StringWriter();

        HtmlReportRenderer.Render(report, writer);

        var html = writer.ToString();
        Assert.DoesNotContain("<script>", html, StringComparison.Ordinal);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html, StringComparison.Ordinal);
        Assert.Contains("A &amp; B &gt; C", html, StringComparison.Ordinal);
        _ = Parse(html);
    }

    [Fact]
    public void Render_SampleReport_LoadsNothingFromOutside()
    {
        var html = Rendering.Render("html");

        Assert.DoesNotContain(" src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(" href=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("@import", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Render_Violation_ShowsTheTraceTableWithTheFailingRow()
    {
        var document = Parse(Rendering.Render("html"));

        var table = Assert.Single(document.Descendants("table"), t => (string?)t.Attribute("class") == "trace");
        var rows = table.Element("tbody")!.Elements("tr").ToList();
        Assert.Equal(ReportSamples.Counterexample().Steps.Count, rows.Count);
        Assert.Equal("failing", (string?)rows[^1].Attribute("class"));
        Assert.Equal("2..251", rows[2].Elements("td").First().Value);
    }

    private static XDocument Parse(string html) => XDocument.Parse(html[Doctype.Length..]);
}
