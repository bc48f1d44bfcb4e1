using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Language.Parsing;
using LogicProof.Language.Syntax;

namespace LogicProof.Model.Tests.Rules;

/// <summary>The Language layer's entry points for formulas written outside a scheme (rules, the breaker model).</summary>
public sealed class FormulaEntryPointTests
{
    private const string Scheme = RuleHarness.Header + """
        inputs A : bool; B : bool; V : real; end
        settings WINDOW : time = T#6ms; end
        outputs C : bool; end
        logic C := A AND B; end
        """;

    [Fact]
    public void Parse_WhenTheFormulaIsValid_BuildsItWithTheLanguagePrecedence()
    {
        var diagnostics = new DiagnosticBag();

        var formula = FormulaReader.Parse("rule x", "ROSE(A) -> NOT B OR C", diagnostics);

        Assert.Empty(diagnostics);
        var implies = Assert.IsType<BinarySyntax>(formula);
        Assert.Equal(BinaryOperator.Implies, implies.Operator);
        Assert.Equal(BinaryOperator.Or, Assert.IsType<BinarySyntax>(implies.Right).Operator);
        Assert.Equal("rule x", implies.Span.File);
    }

    [Theory]
    [InlineData("A B", LanguageCodes.SyntaxError, 3)]
    [InlineData("A AND", LanguageCodes.SyntaxError, 6)]
    [InlineData("(A OR B", LanguageCodes.SyntaxError, 8)]
    [InlineData("A $ B", LanguageCodes.UnexpectedCharacter, 3)]
    [InlineData("HELD(A, T#5xyz)", LanguageCodes.InvalidDuration, 9)]
    public void Parse_WhenTheFormulaIsWrong_ReportsACodeAndAPositionAndGivesNull(string text, string code, int column)
    {
        var diagnostics = new DiagnosticBag();

        var formula = FormulaReader.Parse("rule x", text, diagnostics);

        Assert.Null(formula);
        var error = diagnostics.First(d => d.IsError);
        Assert.Equal(code, error.Code);
        Assert.Equal("rule x", error.Span.File);
        Assert.Equal(1, error.Span.Line);
        Assert.Equal(column, error.Span.Column);
    }

    [Fact]
    public void Bind_WhenTheFormulaUsesPastTimeOperatorsAndImplies_BindsAgainstTheScheme()
    {
        var scheme = RuleHarness.Bind(Scheme);
        var diagnostics = new DiagnosticBag();
        var syntax = FormulaReader.Parse("rule x", "HELD(A, WINDOW) -> PREV(C) OR (A SINCE B)", diagnostics)!;

        var bound = FormulaBinder.Bind(scheme, syntax, diagnostics);

        Assert.Empty(diagnostics);
        Assert.Equal(Language.Syntax.ValueType.Bool, bound!.Type);
    }

    [Theory]
    [InlineData("A -> NOPE", LanguageCodes.UndefinedName)]
    [InlineData("V + 1", LanguageCodes.TypeMismatch)]
    [InlineData("HELD(A, B)", LanguageCodes.DurationExpected)]
    public void Bind_WhenTheFormulaDoesNotFitTheScheme_ReportsTheBinderCode(string text, string code)
    {
        var scheme = RuleHarness.Bind(Scheme);
        var diagnostics = new DiagnosticBag();
        var syntax = FormulaReader.Parse("rule x", text, diagnostics)!;

        var bound = FormulaBinder.Bind(scheme, syntax, diagnostics);

        Assert.Null(bound);
        Assert.Equal(code, Assert.Single(diagnostics).Code);
    }
}
