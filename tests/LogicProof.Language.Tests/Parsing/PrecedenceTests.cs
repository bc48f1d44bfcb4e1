using LogicProof.Language.Syntax;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Parsing;

/// <summary>
/// The binding strength of the operators as the grammar's comment defines it (lowest first): ->, SINCE, OR, XOR,
/// AND, comparisons, + -, * /, prefix NOT and unary minus; -> groups to the right, the others to the left.
/// </summary>
public class PrecedenceTests
{
    [Theory]
    [InlineData("NOT A AND B", "((NOT A) And B)")]
    [InlineData("A AND NOT B AND NOT C", "((A And (NOT B)) And (NOT C))")]
    [InlineData("A OR B AND C", "(A Or (B And C))")]
    [InlineData("A AND B OR C", "((A And B) Or C)")]
    [InlineData("A XOR B OR C XOR D", "((A Xor B) Or (C Xor D))")]
    [InlineData("A AND B XOR C", "((A And B) Xor C)")]
    [InlineData("A OR B SINCE C OR D", "((A Or B) Since (C Or D))")]
    [InlineData("A SINCE B -> C SINCE D", "((A Since B) Implies (C Since D))")]
    [InlineData("A -> B -> C", "(A Implies (B Implies C))")]
    [InlineData("(A -> B) -> C", "((A Implies B) Implies C)")]
    [InlineData("A SINCE B SINCE C", "((A Since B) Since C)")]
    [InlineData("A - B - C", "((A Subtract B) Subtract C)")]
    [InlineData("A - (B - C)", "(A Subtract (B Subtract C))")]
    [InlineData("A / B * C", "((A Divide B) Multiply C)")]
    [InlineData("A + B * C", "(A Add (B Multiply C))")]
    [InlineData("-A * B", "((-A) Multiply B)")]
    [InlineData("A - -B", "(A Subtract (-B))")]
    [InlineData("A < B + 1 AND C", "((A Less (B Add 1)) And C)")]
    [InlineData("A = NOT B", "(A Equal (NOT B))")]
    [InlineData("NOT A = B", "((NOT A) Equal B)")]
    [InlineData("A = B = C", "((A Equal B) Equal C)")]
    [InlineData("NOT NOT A", "(NOT (NOT A))")]
    [InlineData("NOT (A AND B)", "(NOT (A And B))")]
    [InlineData("PREV(A OR B) AND NOT C -> D", "((PREV[(A Or B)] And (NOT C)) Implies D)")]
    [InlineData("TON(IN := A AND B, PT := T#1s) OR C", "(TON[IN=(A And B), PT=T#1s] Or C)")]
    public void Build_WhenOperatorsMix_GroupsByPrecedenceAndAssociativity(string expression, string expected)
    {
        var result = Scheme.LoadBody($"require P: {expression};\n");

        var requirement = Assert.Single(result.Syntax!.Requirements);
        Assert.Equal(expected, FullyParenthesized.Render(requirement.Formula));
    }

    [Fact]
    public void Build_WhenExpressionIsParenthesised_SpansTheOperatorsFromFirstToLastCharacter()
    {
        var result = Scheme.LoadBody("require P: (A OR B) AND NOT C;\n");

        var formula = Assert.IsType<BinarySyntax>(Assert.Single(result.Syntax!.Requirements).Formula);
        Assert.Equal((4, 12), (formula.Span.Line, formula.Span.Column));
        Assert.Equal("(A OR B) AND NOT C".Length, formula.Span.Length);
        var left = Assert.IsType<BinarySyntax>(formula.Left);
        Assert.Equal((4, 13), (left.Span.Line, left.Span.Column));
        var right = Assert.IsType<UnarySyntax>(formula.Right);
        Assert.Equal("NOT C".Length, right.Span.Length);
    }
}
