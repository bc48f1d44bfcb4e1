using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

public sealed class ExactRealTests
{
    [Fact]
    public void Step_WhenTenthsAreAdded_SumComparesEqualExactly()
    {
        // 0.1 + 0.2 = 0.3 holds for exact rationals; in binary floating point it does not.
        Assert.NotEqual(0.3, 0.1 + 0.2);
        var builder = new TestModelBuilder();
        var a = builder.RealInput("A");
        var b = builder.RealInput("B");
        var sum = builder.Real("SUM");
        var equal = builder.Bool("EQUAL");
        builder.Assign(sum, new AddExpression(builder.Now(a), builder.Now(b)));
        builder.Assign(equal, new CompareExpression(CompareOperator.Equal, builder.Now(sum), new RealConstantExpression(new Fraction(3, 10))));
        var model = builder.Build();
        var simulator = ScanSimulator.Compile(model);
        var inputs = simulator.CreateInputs();
        inputs.SetReal(a, new Fraction(1, 10));
        inputs.SetReal(b, new Fraction(2, 10));
        var values = simulator.CreateValues();

        simulator.Step(simulator.PowerUpState(null), inputs, values);

        Assert.True(values.GetBool(equal));
        Assert.Equal(new Fraction(3, 10), values.GetReal(sum));
    }

    [Fact]
    public void Step_WhenScaledByThirdAndBackByThree_ValueIsUnchanged()
    {
        var builder = new TestModelBuilder();
        var a = builder.RealInput("A");
        var result = builder.Real("R");
        builder.Assign(result, new ScaleExpression(3, new ScaleExpression(new Fraction(1, 3), builder.Now(a))));
        var values = StepOnce(builder, inputs => inputs.SetReal(a, new Fraction(7, 10)));
        Assert.Equal(new Fraction(7, 10), values.GetReal(result));
    }

    [Theory]
    [InlineData("-0.25", "0.5", "0.25", "-0.25", "0.5", "-0.75")]
    [InlineData("1.5", "-2", "1.5", "-2", "1.5", "3.5")]
    public void Step_WhenAbsMinMaxSubtract_GiveExactResults(string left, string right, string abs, string min, string max, string difference)
    {
        var builder = new TestModelBuilder();
        var x = builder.RealInput("X");
        var y = builder.RealInput("Y");
        var absCell = builder.Real("ABS_X");
        var minCell = builder.Real("MIN_XY");
        var maxCell = builder.Real("MAX_XY");
        var differenceCell = builder.Real("X_MINUS_Y");
        builder.Assign(absCell, new AbsExpression(builder.Now(x)));
        builder.Assign(minCell, new MinExpression(builder.Now(x), builder.Now(y)));
        builder.Assign(maxCell, new MaxExpression(builder.Now(x), builder.Now(y)));
        builder.Assign(differenceCell, new SubtractExpression(builder.Now(x), new NegateExpression(new NegateExpression(builder.Now(y)))));
        var values = StepOnce(builder, inputs =>
        {
            inputs.SetReal(x, Parse(left));
            inputs.SetReal(y, Parse(right));
        });
        Assert.Equal(Parse(abs), values.GetReal(absCell));
        Assert.Equal(Parse(min), values.GetReal(minCell));
        Assert.Equal(Parse(max), values.GetReal(maxCell));
        Assert.Equal(Parse(difference), values.GetReal(differenceCell));
    }

    [Theory]
    [InlineData(CompareOperator.Less, "0.05", true)]
    [InlineData(CompareOperator.Less, "0.1", false)]
    [InlineData(CompareOperator.LessOrEqual, "0.1", true)]
    [InlineData(CompareOperator.Greater, "0.1", false)]
    [InlineData(CompareOperator.GreaterOrEqual, "0.1", true)]
    [InlineData(CompareOperator.NotEqual, "0.1", false)]
    [InlineData(CompareOperator.NotEqual, "-0.1", true)]
    public void Step_WhenComparedWithSetting_ComparesExactly(CompareOperator compare, string slip, bool expected)
    {
        // SLIP_OK := SLIP_HZ <op> 0.1;
        var builder = new TestModelBuilder();
        var slipInput = builder.RealInput("SLIP_HZ");
        var ok = builder.Bool("SLIP_OK");
        builder.Assign(ok, new CompareExpression(compare, builder.Now(slipInput), new RealConstantExpression(new Fraction(1, 10))));
        var values = StepOnce(builder, inputs => inputs.SetReal(slipInput, Parse(slip)));
        Assert.Equal(expected, values.GetBool(ok));
    }

    [Fact]
    public void Step_WhenRealReadFromPreviousScan_GivesLastScansValue()
    {
        // DELTA := V - V_LAST; V_LAST := V;  -- V_LAST read before its equation: the previous scan's V.
        var builder = new TestModelBuilder();
        var v = builder.RealInput("V");
        var delta = builder.Real("DELTA");
        var last = builder.Real("V_LAST");
        builder.Assign(delta, new SubtractExpression(builder.Now(v), builder.Prev(last)));
        builder.Assign(last, builder.Now(v));
        var simulator = ScanSimulator.Compile(builder.Build());
        var state = simulator.PowerUpState(null);
        var values = simulator.CreateValues();
        var inputs = simulator.CreateInputs();
        var deltas = new List<Fraction>();
        foreach (var reading in new[] { "1.5", "1.75", "1.75" })
        {
            inputs.SetReal(v, Parse(reading));
            simulator.Step(state, inputs, values);
            deltas.Add(values.GetReal(delta));
        }

        Assert.Equal([Parse("1.5"), Parse("0.25"), Fraction.Zero], deltas);
    }

    private static ScanValues StepOnce(TestModelBuilder builder, Action<ScanInputs> setInputs)
    {
        var simulator = ScanSimulator.Compile(builder.Build());
        var inputs = simulator.CreateInputs();
        setInputs(inputs);
        var values = simulator.CreateValues();
        simulator.Step(simulator.PowerUpState(null), inputs, values);
        return values;
    }

    private static Fraction Parse(string text) =>
        ExactNumberText.TryParse(text, out var value) ? value : throw new FormatException(text);
}
