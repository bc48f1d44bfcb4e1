using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;

namespace LogicProof.Core.Tests.Diagnostics;

public class DiagnosticFormatterTests
{
    [Fact]
    public void Format_WhenSourceIsGiven_ShowsPlaceCodeMessageLineAndCaret()
    {
        var source = new SourceText("qm7.lpl", "logic\n  X := Y AND Z;\nend\n");
        var diagnostic = new Diagnostic("LP2002", Severity.Error, "'Y' is not declared", source.Span(13, 1));

        var text = DiagnosticFormatter.Format(diagnostic, source);

        Assert.Equal(
            "qm7.lpl:2:8: error LP2002: 'Y' is not declared\n    |   X := Y AND Z;\n    |        ^",
            text.ReplaceLineEndings("\n"));
    }

    [Fact]
    public void Format_WhenDiagnosticHasRelatedPlaces_ListsThemBelow()
    {
        var source = new SourceText("a.lpl", "A : bool;\nA : bool;\n");
        var diagnostic = new Diagnostic("LP2001", Severity.Error, "'A' is already declared", source.Span(10, 1))
        {
            Related = [new RelatedLocation("the first declaration", source.Span(0, 1))],
        };

        var lines = DiagnosticFormatter.Format(diagnostic, source).ReplaceLineEndings("\n").Split('\n');

        Assert.Equal("a.lpl:2:1: error LP2001: 'A' is already declared", lines[0]);
        Assert.Equal("  a.lpl:1:1: the first declaration", lines[3]);
    }

    [Fact]
    public void Format_WhenLineIsVeryLong_ShowsAWindowAroundTheColumn()
    {
        var line = new string('a', 5000) + "#" + new string('b', 5000);
        var source = new SourceText("long.lpl", line);
        var diagnostic = new Diagnostic("LP1005", Severity.Error, "stray", source.Span(5000, 1));

        var lines = DiagnosticFormatter.Format(diagnostic, source).ReplaceLineEndings("\n").Split('\n');

        Assert.Equal("long.lpl:1:5001: error LP1005: stray", lines[0]);
        Assert.True(lines[1].Length < 200);
        Assert.Equal('#', lines[1][lines[2].IndexOf('^', StringComparison.Ordinal)]);
    }

    [Fact]
    public void Format_WhenSpanHasNoLine_ShowsOnlyTheFile()
    {
        var diagnostic = new Diagnostic("LP1001", Severity.Error, "cannot read the file", new SourceSpan("missing.lpl", 0, 0, 0, 0));

        Assert.Equal("missing.lpl: error LP1001: cannot read the file", DiagnosticFormatter.Format(diagnostic, null));
    }

    [Fact]
    public void Format_WhenSeverityIsWarningOrInfo_NamesIt()
    {
        var span = new SourceSpan("a.lpl", 0, 1, 1, 1);

        Assert.StartsWith("a.lpl:1:1: warning LP3001", DiagnosticFormatter.Format(new Diagnostic("LP3001", Severity.Warning, "w", span), null), StringComparison.Ordinal);
        Assert.StartsWith("a.lpl:1:1: note LP3002", DiagnosticFormatter.Format(new Diagnostic("LP3002", Severity.Info, "i", span), null), StringComparison.Ordinal);
    }
}
