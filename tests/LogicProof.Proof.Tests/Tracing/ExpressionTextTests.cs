using System.Globalization;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Tracing;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Tracing;

public sealed class ExpressionTextTests
{
    [Theory]
    [InlineData("fr-FR")]
    [InlineData("tr-TR")]
    [InlineData("en-US")]
    public void Number_WhenCultureDiffers_WritesTheSameExactText(string culture)
    {
        var saved = CultureInfo.CurrentCulture;
        CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(culture);
        try
        {
            Assert.Equal("1.5", ExpressionText.Number(new Fraction(3, 2)));
            Assert.Equal("-0.125", ExpressionText.Number(new Fraction(-1, 8)));
            Assert.Equal("1/3", ExpressionText.Number(new Fraction(1, 3)));
            Assert.Equal("-12000", ExpressionText.Number(new Fraction(-12000)));
            Assert.Equal("0.0001", ExpressionText.Number(new Fraction(1, 10000)));
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void Write_WhenOperandsAreCompound_ParenthesisesThemAndMarksPreviousReads()
    {
        var model = new HandModel();
        var a = model.BoolInput("A");
        var b = model.BoolInput("B");
        var c = model.Bool("C");
        var expression = HandModel.Or(HandModel.And(HandModel.Now(a), HandModel.Not(HandModel.Now(b))), model.Prev(c));
        model.Assign(c, expression);

        Assert.Equal("(A AND (NOT B)) OR PREV(C)", ExpressionText.Write(expression, model.Build()));
    }

    [Fact]
    public void Write_WhenExpressionIsArithmetic_UsesTheLanguagesOperators()
    {
        var model = new HandModel();
        var a = model.BoolInput("A");
        var cells = model.Build().Cells;
        var scan = new ScanModel("R", new ScanTiming(50, 2), [.. cells, new Cell(1, "V", CellKind.Input, SignalType.Real, default)], [a, 1], [], [], [], []);
        var v = new CellReadExpression(1, ReadTiming.Current, SignalType.Real);
        var expression = new CompareExpression(
            CompareOperator.GreaterOrEqual,
            new AbsExpression(new SubtractExpression(v, new RealConstantExpression(new Fraction(1, 4)))),
            new ScaleExpression(new Fraction(2), new MaxExpression(v, new RealConstantExpression(Fraction.Zero))));

        Assert.Equal("ABS(V - 0.25) >= (2 * MAX(V, 0))", ExpressionText.Write(expression, scan));
    }
}
