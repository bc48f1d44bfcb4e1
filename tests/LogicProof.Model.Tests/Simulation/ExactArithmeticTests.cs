using System.Numerics;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>
/// The simulator's real arithmetic takes a 64-bit shortcut for small fractions and BigInteger arithmetic for the
/// rest; both must give exactly what <see cref="Fraction"/> gives, on either side of the 32-bit boundary.
/// </summary>
public sealed class ExactArithmeticTests
{
    [Fact]
    public void Step_WhenRandomSmallAndLargeFractions_MatchesFractionArithmetic()
    {
        var builder = new TestModelBuilder();
        var a = builder.RealInput("A");
        var b = builder.RealInput("B");
        var sum = builder.Real("SUM");
        var difference = builder.Real("DIFFERENCE");
        var scaled = builder.Real("SCALED");
        var negated = builder.Real("NEGATED");
        var absolute = builder.Real("ABSOLUTE");
        var less = builder.Bool("LESS");
        var equal = builder.Bool("EQUAL");
        var factor = new Fraction(-7, 3);
        builder.Assign(sum, new AddExpression(builder.Now(a), builder.Now(b)));
        builder.Assign(difference, new SubtractExpression(builder.Now(a), builder.Now(b)));
        builder.Assign(scaled, new ScaleExpression(factor, builder.Now(a)));
        builder.Assign(negated, new NegateExpression(builder.Now(b)));
        builder.Assign(absolute, new AbsExpression(builder.Now(difference)));
        builder.Assign(less, new CompareExpression(CompareOperator.Less, builder.Now(a), builder.Now(b)));
        builder.Assign(equal, new CompareExpression(CompareOperator.Equal, builder.Now(sum), new AddExpression(builder.Now(b), builder.Now(a))));
        var simulator = ScanSimulator.Compile(builder.Build());
        var state = simulator.PowerUpState(null);
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var random = new Random(61131);

        for (var trial = 0; trial < 2000; trial++)
        {
            var x = RandomFraction(random);
            var y = random.Next(10) == 0 ? x : RandomFraction(random);
            inputs.SetReal(a, x);
            inputs.SetReal(b, y);
            simulator.Step(state, inputs, values);

            Assert.Equal(0, (x + y).CompareTo(values.GetReal(sum)));
            Assert.Equal(0, (x - y).CompareTo(values.GetReal(difference)));
            Assert.Equal(0, (factor * x).CompareTo(values.GetReal(scaled)));
            Assert.Equal(0, (-y).CompareTo(values.GetReal(negated)));
            Assert.Equal(0, (x - y).Abs().CompareTo(values.GetReal(absolute)));
            Assert.Equal(x.CompareTo(y) < 0, values.GetBool(less));
            Assert.True(values.GetBool(equal));
            Assert.True(values.GetReal(sum).Denominator.Sign > 0);
            Assert.True(BigInteger.GreatestCommonDivisor(values.GetReal(sum).Numerator, values.GetReal(sum).Denominator) <= 1);
        }
    }

    private static Fraction RandomFraction(Random random)
    {
        // Around the 32-bit boundary as often as well inside it.
        var scale = random.Next(3) switch
        {
            0 => 100L,
            1 => int.MaxValue,
            _ => 1L << 40,
        };
        var numerator = random.NextInt64(-scale, scale + 1);
        var denominator = random.NextInt64(1, scale + 1);
        return new Fraction(numerator, denominator);
    }
}
