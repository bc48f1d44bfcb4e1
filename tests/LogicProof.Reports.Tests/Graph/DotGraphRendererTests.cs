using System.Globalization;
using LogicProof.Reports.Graph;

namespace LogicProof.Reports.Tests.Graph;

public sealed class DotGraphRendererTests
{
    private const string Expected = """
        digraph "QM7_SEAL" {
          rankdir=LR;
          "CMD" [shape=box, label="CMD\ninput"];
          "CLOSED" [shape=box, label="CLOSED\ninput"];
          "FAIL" [shape=ellipse, label="FAIL\nlocal"];
          "CLOSE" [shape=doubleoctagon, label="CLOSE\noutput"];
          "FAIL.TON#1" [shape=component, label="FAIL.TON#1\nTON T#500ms"];
          "CMD" -> "CLOSE";
          "CLOSE" -> "CLOSE" [style=dashed, label="last scan"];
          "CLOSED" -> "CLOSE";
          "FAIL" -> "CLOSE" [style=dashed, label="last scan"];
          "FAIL.TON#1" -> "FAIL";
          "CLOSE" -> "FAIL.TON#1";
        }

        """;

    [Fact]
    public void Render_WhenSealInScheme_WritesTheExpectedDot()
    {
        var dot = DotGraphRenderer.Render(GraphFixture.Build());

        Assert.Equal(Expected, dot);
    }

    [Fact]
    public void Render_WhenFormulasIncluded_DrawsThemAsNotes()
    {
        var dot = DotGraphRenderer.Render(GraphFixture.Build(includeFormulas: true));

        Assert.Contains("\"ENDS\" [shape=note, label=\"ENDS\\nrequirement\"];", dot, StringComparison.Ordinal);
        Assert.Contains("\"CLOSE\" -> \"ENDS\";", dot, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void Render_UnderAnyCulture_IsIdentical(string culture)
    {
        var graph = GraphFixture.Build();
        var previous = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(culture);
            Assert.Equal(Expected, DotGraphRenderer.Render(graph));
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }
    }
}
