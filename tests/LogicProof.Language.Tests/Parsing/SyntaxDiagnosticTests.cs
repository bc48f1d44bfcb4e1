using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Parsing;

public class SyntaxDiagnosticTests
{
    private const string H = Scheme.Header;

    [Theory]
    [InlineData(LanguageCodes.UnexpectedCharacter, H + "logic\n  X := A @# B;\nend\n")]
    [InlineData(LanguageCodes.UnexpectedCharacter, H + "inputs\n  A : bool @$$$;\nend\n")]
    [InlineData(LanguageCodes.UnterminatedString, H + "inputs\n  A : bool @\"never closed;\nend\n")]
    [InlineData(LanguageCodes.UnterminatedComment, H + "inputs\n  A : bool;\n@(* this comment runs to the end\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, "@")]
    [InlineData(LanguageCodes.SyntaxError, "// only a comment\n@")]
    [InlineData(LanguageCodes.SyntaxError, H + "inputs\n  A : bool@\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, H + "logic\n  X := A AND @;\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, H + "logic\n  X := (A OR B@;\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, H + "inputs\n  A : @integer;\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, H + "@input\n  A : bool;\nend\n")]
    [InlineData(LanguageCodes.SyntaxError, "scheme T;\n@scan 2 ms;\nfrequency 60 Hz;\n")]
    [InlineData(LanguageCodes.InvalidDuration, H + "settings\n  D : time = @T#5x;\nend\n")]
    [InlineData(LanguageCodes.InvalidDuration, H + "settings\n  D : time = @2 min;\nend\n")]
    [InlineData(LanguageCodes.InvalidDuration, "scheme T;\nfrequency 60 Hz;\nscan @T#2ms5s;\n")]
    [InlineData(LanguageCodes.FrequencyUnitNotHertz, "scheme T;\nfrequency 60 @kHz;\nscan 2 ms;\n")]
    [InlineData(LanguageCodes.DuplicateBreakerModel, H + "breaker_model\n  a = TRUE;\nend\n@breaker_model\n  b = FALSE;\nend\n")]
    [InlineData(LanguageCodes.TimingNotPositive, "scheme T;\nfrequency @0 Hz;\nscan 2 ms;\n")]
    [InlineData(LanguageCodes.TimingNotPositive, "scheme T;\nfrequency 60 Hz;\nscan @0.0 cyc;\n")]
    [InlineData(LanguageCodes.UnknownInitWord, H + "locals\n  L : bool init @retain;\nend\n")]
    public void Load_WhenTextIsMalformed_ReportsTheCodeAtThePlace(string code, string markedText)
    {
        DiagnosticAssert.ErrorAtMarker(code, markedText);
    }

    [Fact]
    public void Load_WhenFileIsEmpty_SaysTheSchemeHeaderIsExpected()
    {
        var result = Scheme.Load(string.Empty);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.SyntaxError, error.Code);
        Assert.Equal((1, 1), (error.Span.Line, error.Span.Column));
        Assert.Contains("scheme header", error.Message, StringComparison.Ordinal);
        Assert.Contains("end of the file", error.Message, StringComparison.Ordinal);
        Assert.Null(result.Syntax);
    }

    [Fact]
    public void Load_WhenSemicolonIsMissing_ReportsJustAfterThePreviousToken()
    {
        var result = Scheme.LoadBody("inputs\n  A : bool \"first\"\n  B : bool;\nend\n");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal((5, 19), (error.Span.Line, error.Span.Column));
        Assert.Contains("';'", error.Message, StringComparison.Ordinal);
        Assert.Contains("the name 'B'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Load_WhenFileHasSeveralSyntaxErrors_ReportsEachOfThem()
    {
        var result = Scheme.LoadBody("inputs\n  A : bool\n  B : ;\nend\nlogic\n  X := A AND ;\n  Y := (B;\nend\n");

        var lines = result.Diagnostics.Where(d => d.Code == LanguageCodes.SyntaxError).Select(d => d.Span.Line).ToList();
        Assert.True(lines.Count >= 4, Scheme.Describe(result.Diagnostics));
        Assert.Contains(5, lines);
        Assert.Contains(6, lines);
        Assert.Contains(9, lines);
        Assert.Contains(10, lines);
    }

    [Theory]
    [InlineData("inputs\n  A : bool\nend\n")]
    [InlineData("inputs A bool; end")]
    [InlineData("logic X := A AND AND B; end")]
    [InlineData("logic X := ; end")]
    [InlineData("logic X := A B; end")]
    [InlineData("logic X := TON(IN := ; end")]
    [InlineData("end end")]
    [InlineData("require : A;")]
    [InlineData("roles close = ; end")]
    [InlineData("breaker_model t = 1 .. ; end")]
    public void Load_WhenSyntaxIsWrong_SpeaksInPlainWordsWithoutParserJargon(string body)
    {
        var result = Scheme.LoadBody(body);

        Assert.NotEmpty(result.Diagnostics);
        foreach (var diagnostic in result.Diagnostics)
        {
            Assert.Equal(LanguageCodes.SyntaxError, diagnostic.Code);
            Assert.Matches("^expected .+ but found .+$", diagnostic.Message);
            foreach (var jargon in new[] { "mismatched", "extraneous", "viable", "token recognition", "missing", "<EOF>", "{", "input at" })
            {
                Assert.DoesNotContain(jargon, diagnostic.Message, StringComparison.OrdinalIgnoreCase);
            }
        }
    }

    [Fact]
    public void Load_WhenAnExpressionIsExpected_SaysSoInsteadOfListingTokens()
    {
        var result = Scheme.LoadBody("logic\n  X := ;\nend\n");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal("expected an expression but found ';'", error.Message);
    }

    [Fact]
    public void Load_WhenAStrayCharacterIsReported_DoesNotReportItAgainAsASyntaxError()
    {
        var result = Scheme.LoadBody("inputs\n  A : bool;\n  B : bool;\nend\nlogic\n  X := A # AND B;\nend\n");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.UnexpectedCharacter, error.Code);
        Assert.Contains("'#'", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("inputs\n  A : bool \"never closed;\n  B : bool;\nend\n", LanguageCodes.UnterminatedString)]
    [InlineData("inputs\n  A : bool;\n(* the rest is a comment\n  B : bool;\nend\n", LanguageCodes.UnterminatedComment)]
    [InlineData("inputs\n  A : bool $;\n  B : bool;\nend\n", LanguageCodes.UnexpectedCharacter)]
    public void Load_WhenALexicalErrorBreaksALine_ReportsOnlyThatError(string body, string code)
    {
        var result = Scheme.LoadBody(body);

        Assert.Equal(code, Assert.Single(result.Diagnostics).Code);
        Assert.Null(result.Syntax);
    }
}
