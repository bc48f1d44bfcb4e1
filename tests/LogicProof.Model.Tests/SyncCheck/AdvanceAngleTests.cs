using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class AdvanceAngleTests
{
    [Fact]
    public void Degrees_WhenSlip0Point1HzAndClosing100Ms_Is3Point6()
    {
        Assert.Equal(3.6, AdvanceAngle.Degrees(0.1, 0.100), 12); // 360·0.1·0.1 = 3.6°
    }

    [Fact]
    public void Degrees_WhenNoSlip_IsZero()
    {
        Assert.Equal(0.0, AdvanceAngle.Degrees(0, 0.08));
    }

    [Fact]
    public void Degrees_WhenClosingTimeInCycles_ConvertsAtThePowerFrequency()
    {
        var closing = TimeSetting.Parse("5cyc", "the closing time").ToSeconds(50); // 5 cycles at 50 Hz = 0.1 s
        Assert.Equal(3.6, AdvanceAngle.Degrees(0.1, closing), 12);
    }

    [Theory]
    [InlineData(0.1, 0.0)]
    [InlineData(0.1, -0.05)]
    [InlineData(-0.1, 0.1)]
    public void Degrees_WhenSlipNegativeOrClosingTimeNotPositive_ThrowsInputException(double slip, double seconds)
    {
        Assert.Throws<SyncCheckInputException>(() => AdvanceAngle.Degrees(slip, seconds));
    }
}
