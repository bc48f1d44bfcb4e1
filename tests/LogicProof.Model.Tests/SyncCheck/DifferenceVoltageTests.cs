using CsCheck;
using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class DifferenceVoltageTests
{
    [Theory]
    [InlineData(10.0, 0.17431)] // 2·sin(5°) = 0.174311…: law of cosines at V1 = V2 = 1, i.e. sqrt(2 − 2·cos d) = 2·sin(d/2)
    [InlineData(20.0, 0.34730)] // 2·sin(10°) = 0.347296…, same identity
    [InlineData(30.0, 0.51764)] // 2·sin(15°) = 0.517638…, same identity
    [InlineData(60.0, 1.0)] // 2·sin(30°) = 1 exactly: the equilateral triangle of two unit phasors 60° apart
    public void Magnitude_WhenBothSidesAtOnePerUnit_EqualsTwiceSineOfHalfAngle(double angleDeg, double expected)
    {
        Assert.Equal(expected, DifferenceVoltage.Magnitude(angleDeg, 1.0, 1.0), 5);
    }

    [Fact]
    public void Magnitude_WhenInPhase_IsDifferenceOfMagnitudes()
    {
        Assert.Equal(0.1, DifferenceVoltage.Magnitude(0, 1.05, 0.95), 12); // |V1 − V2| when cos 0 = 1
    }

    [Fact]
    public void Magnitude_WhenInAntiphase_IsSumOfMagnitudes()
    {
        Assert.Equal(2.0, DifferenceVoltage.Magnitude(180, 1.05, 0.95), 12); // V1 + V2 when cos 180° = −1
    }

    [Fact]
    public void Magnitude_WhenVoltagesUnequal_MatchesLawOfCosines()
    {
        const double v1 = 1.05, v2 = 0.9, d = 25;
        var lawOfCosines = Math.Sqrt((v1 * v1) + (v2 * v2) - (2 * v1 * v2 * Math.Cos(d * Math.PI / 180)));
        Assert.Equal(lawOfCosines, DifferenceVoltage.Magnitude(d, v1, v2), 12);
    }

    [Theory]
    [InlineData(0.17431148549531633, 10.0)] // 2·sin(5°), the inverse of the first identity case
    [InlineData(1.0, 60.0)] // 2·sin(30°) = 1
    [InlineData(2.0, 180.0)] // V1 + V2: antiphase
    [InlineData(0.0, 0.0)] // |V1 − V2| = 0: in phase
    public void AngleDegrees_WhenBothSidesAtOnePerUnit_InvertsTwiceSineOfHalfAngle(double dv, double expectedDeg)
    {
        Assert.Equal(expectedDeg, DifferenceVoltage.AngleDegrees(dv, 1.0, 1.0), 9);
    }

    [Theory]
    [InlineData(0.001)]
    [InlineData(1.0)]
    [InlineData(20.0)]
    [InlineData(90.0)]
    [InlineData(179.999)]
    [InlineData(180.0)]
    public void AngleDegrees_WhenGivenMagnitudeOfAnAngle_ReturnsThatAngle(double angleDeg)
    {
        var dv = DifferenceVoltage.Magnitude(angleDeg, 1.0, 1.0);
        Assert.Equal(angleDeg, DifferenceVoltage.AngleDegrees(dv, 1.0, 1.0), 9);
    }

    [Fact]
    public void AngleDegrees_WhenRoundTrippedOverAnyAngleAndVoltages_ReturnsTheAngle()
    {
        Gen.Select(Gen.Double[0, 180], Gen.Double[0.5, 1.5], Gen.Double[0.5, 1.5]).Sample((angle, v1, v2) =>
        {
            var back = DifferenceVoltage.AngleDegrees(DifferenceVoltage.Magnitude(angle, v1, v2), v1, v2);
            return Math.Abs(back - angle) < 1e-6;
        });
    }

    [Theory]
    [InlineData(2.5, 1.0, 1.0)] // more than V1 + V2 = 2
    [InlineData(2.0000001, 1.0, 1.0)] // just past V1 + V2
    [InlineData(0.05, 1.05, 0.95)] // less than |V1 − V2| = 0.1
    [InlineData(-0.1, 1.0, 1.0)]
    [InlineData(double.NaN, 1.0, 1.0)]
    public void AngleDegrees_WhenNoAngleGivesTheMagnitude_ThrowsInputException(double dv, double v1, double v2)
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => DifferenceVoltage.AngleDegrees(dv, v1, v2));
        Assert.DoesNotContain('\n', exception.Message);
    }

    [Fact]
    public void AngleDegrees_WhenMagnitudeAboveSum_MessageNamesTheRange()
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => DifferenceVoltage.AngleDegrees(2.5, 1.0, 1.0));
        Assert.Contains("no phase angle gives |dV| = 2.5", exception.Message);
        Assert.Contains("V1 + V2 = 2", exception.Message);
    }

    [Theory]
    [InlineData(0.0, 1.0)]
    [InlineData(1.0, -1.0)]
    [InlineData(double.PositiveInfinity, 1.0)]
    public void Magnitude_WhenVoltageNotPositive_ThrowsInputException(double v1, double v2)
    {
        Assert.Throws<SyncCheckInputException>(() => DifferenceVoltage.Magnitude(20, v1, v2));
    }

    [Theory]
    [InlineData(-1.0)]
    [InlineData(180.5)]
    [InlineData(double.NaN)]
    public void Magnitude_WhenAngleOutsideZeroTo180_ThrowsInputException(double angleDeg)
    {
        Assert.Throws<SyncCheckInputException>(() => DifferenceVoltage.Magnitude(angleDeg, 1, 1));
    }
}
