using System.Text.Json;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

/// <summary>
/// Structure checks written by hand from the SARIF 2.1.0 JSON schema (OASIS, sarif-schema-2.1.0.json): the
/// "required" lists of sarifLog, run, tool, toolComponent, reportingDescriptor, multiformatMessageString, result,
/// message (text or id), physicalLocation (artifactLocation or address), invocation and notification, the enums of
/// result.level and result.kind, and the minimum of 1 on region.startLine and region.startColumn.
/// </summary>
public sealed class SarifReportRendererTests
{
    private static readonly string[] Levels = ["none", "note", "warning", "error"];
    private static readonly string[] Kinds = ["notApplicable", "pass", "fail", "review", "open", "informational"];

    [Fact]
    public void Render_SampleReport_HasEveryRequiredSarifField()
    {
        using var document = JsonDocument.Parse(Rendering.Render("sarif"));
        var log = document.RootElement;

        Assert.Equal("2.1.0", log.GetProperty("version").GetString());
        Assert.Equal(JsonValueKind.String, log.GetProperty("$schema").ValueKind);
        var run = Assert.Single(log.GetProperty("runs").EnumerateArray());
        var driver = run.GetProperty("tool").GetProperty("driver");
        Assert.Equal("LogicProof", driver.GetProperty("name").GetString());
        var rules = driver.GetProperty("rules").EnumerateArray().ToList();
        Assert.NotEmpty(rules);
        foreach (var rule in rules)
        {
            Assert.False(string.IsNullOrEmpty(rule.GetProperty("id").GetString()));
            foreach (var text in new[] { "shortDescription", "fullDescription", "help" })
            {
                Assert.Equal(JsonValueKind.String, rule.GetProperty(text).GetProperty("text").ValueKind);
            }
        }

        Assert.Equal(rules.Count, rules.Select(r => r.GetProperty("id").GetString()).Distinct(StringComparer.Ordinal).Count());
        foreach (var result in run.GetProperty("results").EnumerateArray())
        {
            Assert.Equal(JsonValueKind.String, result.GetProperty("message").GetProperty("text").ValueKind);
            Assert.Contains(result.GetProperty("level").GetString(), Levels);
            if (result.TryGetProperty("kind", out var kind))
            {
                Assert.Contains(kind.GetString(), Kinds);

                // SARIF 2.1.0 §3.27.10 (from memory): a result whose kind is not "fail" has level "none".
                Assert.Equal("none", result.GetProperty("level").GetString());
            }

            var index = result.GetProperty("ruleIndex").GetInt32();
            Assert.Equal(result.GetProperty("ruleId").GetString(), rules[index].GetProperty("id").GetString());
            foreach (var location in result.GetProperty("locations").EnumerateArray())
            {
                var physical = location.GetProperty("physicalLocation");
                Assert.True(physical.TryGetProperty("artifactLocation", out _) || physical.TryGetProperty("address", out _));
                if (physical.TryGetProperty("region", out var region))
                {
                    Assert.True(region.GetProperty("startLine").GetInt32() >= 1);
                    Assert.True(region.GetProperty("startColumn").GetInt32() >= 1);
                }
            }
        }

        var invocation = Assert.Single(run.GetProperty("invocations").EnumerateArray());
        Assert.True(invocation.GetProperty("executionSuccessful").GetBoolean());
        foreach (var notification in invocation.GetProperty("toolExecutionNotifications").EnumerateArray())
        {
            Assert.Equal(JsonValueKind.String, notification.GetProperty("message").GetProperty("text").ValueKind);
        }
    }

    [Fact]
    public void Render_SampleReport_CarriesTheSafetyStatementInRunPropertiesAndDriver()
    {
        using var document = JsonDocument.Parse(Rendering.Render("sarif"));
        var run = document.RootElement.GetProperty("runs")[0];

        Assert.Equal(SafetyStatement.Text, run.GetProperty("properties").GetProperty("safetyStatement").GetString());
        Assert.Contains(SafetyStatement.Text, run.GetProperty("tool").GetProperty("driver").GetProperty("fullDescription").GetProperty("text").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Render_Violation_IsAnErrorAtTheRequirementWithTheFullTraceInProperties()
    {
        using var document = JsonDocument.Parse(Rendering.Render("sarif"));
        var results = document.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray().ToList();

        var violation = Assert.Single(results, r => r.GetProperty("level").GetString() == "error");
        Assert.Equal("QM7_CLOSE.NO_DOUBLE_CLOSE", violation.GetProperty("ruleId").GetString());
        var physical = violation.GetProperty("locations")[0].GetProperty("physicalLocation");
        Assert.Equal("examples/quillmere-bay7/qm7_close.lpl", physical.GetProperty("artifactLocation").GetProperty("uri").GetString());
        Assert.Equal(31, physical.GetProperty("region").GetProperty("startLine").GetInt32());
        Assert.Contains("at 2 ms CLOSE_CMD=1; at 4 ms CLOSE_CMD=0, SLIP_HZ=-0.3333~", violation.GetProperty("message").GetProperty("text").GetString(), StringComparison.Ordinal);
        Assert.Equal(252, violation.GetProperty("properties").GetProperty("counterexample").GetProperty("failingScan").GetInt64());
    }

    [Fact]
    public void Render_OtherVerdicts_UseTheirOwnLevelAndKind()
    {
        using var document = JsonDocument.Parse(Rendering.Render("sarif"));
        var results = document.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray()
            .ToDictionary(r => r.GetProperty("ruleId").GetString()!, StringComparer.Ordinal);

        Assert.Equal("pass", results["CLOSE_BLOCKED_IN_LOCKOUT"].GetProperty("kind").GetString());
        Assert.Equal("warning", results["QM7_CLOSE.SLIP_WITHIN_WINDOW"].GetProperty("level").GetString());
        Assert.Equal("notApplicable", results["CLOSE_NEEDS_GAS_AND_SPRING"].GetProperty("kind").GetString());
        Assert.Equal("warning", results["LP3013"].GetProperty("level").GetString());
        Assert.Equal("note", results["LP3014"].GetProperty("level").GetString());
        Assert.Equal(24, results["LP3013"].GetProperty("relatedLocations")[0].GetProperty("physicalLocation").GetProperty("region").GetProperty("startLine").GetInt32());
    }

    [Theory]
    [InlineData("/srv/relay-logic/examples", "quillmere-bay7/qm7_close.lpl")]
    [InlineData("/srv/relay-logic/other", "../examples/quillmere-bay7/qm7_close.lpl")]
    public void Render_ArtifactUri_IsRelativeToTheWorkingDirectory(string workingDirectory, string expected)
    {
        Assert.Equal(expected, UriOfDiagnosticIn("/srv/relay-logic/examples/quillmere-bay7/qm7_close.lpl", workingDirectory));
    }

    [Fact]
    public void Render_PathWithSpaces_PercentEncodesTheUri()
    {
        Assert.Equal("bay%207/qm%207.lpl", UriOfDiagnosticIn("bay 7/qm 7.lpl", Rendering.WorkingDirectory));
    }

    private static string? UriOfDiagnosticIn(string path, string workingDirectory)
    {
        var diagnostic = new Diagnostic("LP3010", Severity.Warning, "unused input", new SourceSpan(path, 0, 1, 3, 2));
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [CheckReportBuilder.ForFile(path, null, [diagnostic], [])]);
        var writer = new StringWriter();

        SarifReportRenderer.Render(report, writer, workingDirectory);

        using var document = JsonDocument.Parse(writer.ToString());
        return document.RootElement.GetProperty("runs")[0].GetProperty("results")[0].GetProperty("locations")[0]
            .GetProperty("physicalLocation").GetProperty("artifactLocation").GetProperty("uri").GetString();
    }
}
