using System.Text.Json;
using LogicProof.Reports.Graph;

namespace LogicProof.Reports.Tests.Graph;

public sealed class JsonGraphRendererTests
{
    [Fact]
    public void Render_WhenSealInScheme_WritesVerticesAndEdgesInGraphOrder()
    {
        var json = JsonGraphRenderer.Render(GraphFixture.Build());

        using var document = JsonDocument.Parse(json);
        var root = document.RootElement;
        Assert.Equal("QM7_SEAL", root.GetProperty("scheme").GetString());
        Assert.Equal(
            ["CMD", "CLOSED", "FAIL", "CLOSE", "FAIL.TON#1"],
            root.GetProperty("vertices").EnumerateArray().Select(v => v.GetProperty("name").GetString()));
        Assert.Equal(
            ["CMD->CLOSE same scan", "CLOSE->CLOSE last scan", "CLOSED->CLOSE same scan", "FAIL->CLOSE last scan", "FAIL.TON#1->FAIL same scan", "CLOSE->FAIL.TON#1 same scan"],
            root.GetProperty("edges").EnumerateArray().Select(e =>
                $"{e.GetProperty("from").GetString()}->{e.GetProperty("to").GetString()} {e.GetProperty("read").GetString()}"));
    }

    [Fact]
    public void Render_WhenVertexHasADescription_WritesItEscapedWithThePlace()
    {
        var json = JsonGraphRenderer.Render(GraphFixture.Build());

        Assert.Contains(
            """
                {
                  "name": "CMD",
                  "kind": "input",
                  "line": 5,
                  "column": 3,
                  "detail": "close \"command\""
                },
            """,
            json,
            StringComparison.Ordinal);
        Assert.Contains("\"kind\": \"function block\"", json, StringComparison.Ordinal);
        Assert.EndsWith("}\n", json, StringComparison.Ordinal);
        Assert.DoesNotContain("\r", json, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_WhenEdge_GivesTheReadingEquationsPlace()
    {
        using var document = JsonDocument.Parse(JsonGraphRenderer.Render(GraphFixture.Build()));

        var timerEdge = document.RootElement.GetProperty("edges").EnumerateArray()
            .Single(e => e.GetProperty("to").GetString() == "FAIL.TON#1");
        Assert.Equal(12, timerEdge.GetProperty("line").GetInt32());
        Assert.Equal(3, timerEdge.GetProperty("column").GetInt32());
    }
}
