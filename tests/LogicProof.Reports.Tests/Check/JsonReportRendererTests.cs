using System.Text.Json;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

public sealed class JsonReportRendererTests
{
    [Fact]
    public void Render_SampleReport_HasStableTopLevelOrder()
    {
        using var document = JsonDocument.Parse(Rendering.Render("json"));

        Assert.Equal(["tool", "safetyStatement", "summary", "files"], document.RootElement.EnumerateObject().Select(p => p.Name));
        Assert.Equal(SafetyStatement.Text, document.RootElement.GetProperty("safetyStatement").GetString());
        Assert.Equal(1, document.RootElement.GetProperty("summary").GetProperty("exitCode").GetInt32());
    }

    [Fact]
    public void Render_RealsAndTimes_AreExactStrings()
    {
        using var document = JsonDocument.Parse(Rendering.Render("json"));
        var violated = document.RootElement.GetProperty("files")[0].GetProperty("properties")[1];

        var steps = violated.GetProperty("counterexample").GetProperty("steps");
        Assert.Equal("-1/3", steps[2].GetProperty("values").GetProperty("SLIP_HZ").GetString());
        Assert.Equal("4", steps[2].GetProperty("timeMs").GetString());
        Assert.Equal("500", steps[2].GetProperty("durationMs").GetString());
        Assert.Equal(250, steps[2].GetProperty("scanCount").GetInt64());
        Assert.True(steps[3].GetProperty("failing").GetBoolean());
        Assert.Equal("340", violated.GetProperty("elapsedMs").GetString());
        Assert.Equal(JsonValueKind.False, steps[3].GetProperty("values").GetProperty("NO_DOUBLE_CLOSE").ValueKind);
    }

    [Fact]
    public void Render_EachVerdict_CarriesItsOwnFields()
    {
        using var document = JsonDocument.Parse(Rendering.Render("json"));
        var file = document.RootElement.GetProperty("files")[0];
        var properties = file.GetProperty("properties");

        Assert.Equal("proved", properties[0].GetProperty("verdict").GetString());
        Assert.Equal(2, properties[0].GetProperty("depth").GetInt32());
        Assert.Equal("violated", properties[1].GetProperty("verdict").GetString());
        Assert.Equal(252, properties[1].GetProperty("counterexample").GetProperty("failingScan").GetInt64());
        Assert.Equal("inconclusive", properties[2].GetProperty("verdict").GetString());
        Assert.Equal(50, properties[2].GetProperty("depthReached").GetInt32());
        Assert.Equal(["low_gas", "spring_charged"], file.GetProperty("notApplicableRules")[0].GetProperty("missingRoles").EnumerateArray().Select(r => r.GetString()));
        Assert.False(file.GetProperty("breakerModelled").GetBoolean());
    }

    [Fact]
    public void Render_MessageWithLoneSurrogateAndQuotes_StaysValidJson()
    {
        var message = "bad byte \uD800 in \"name\" \\ here";
        var diagnostic = new Diagnostic("LP1002", Severity.Error, message, new SourceSpan("odd.lpl", 0, 1, 1, 1));
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [CheckReportBuilder.ForFile("odd.lpl", null, [diagnostic], [])]);
        var json = new StringWriter();
        var sarif = new StringWriter();

        JsonReportRenderer.Render(report, json);
        SarifReportRenderer.Render(report, sarif, Rendering.WorkingDirectory);

        using var document = JsonDocument.Parse(json.ToString());
        Assert.Equal("bad byte \uFFFD in \"name\" \\ here", document.RootElement.GetProperty("files")[0].GetProperty("diagnostics")[0].GetProperty("message").GetString());
        using var log = JsonDocument.Parse(sarif.ToString());
        Assert.Equal(3, log.RootElement.GetProperty("runs")[0].GetProperty("invocations")[0].GetProperty("exitCode").GetInt32());
    }
}
