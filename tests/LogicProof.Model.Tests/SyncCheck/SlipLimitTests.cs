using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class SlipLimitTests
{
    [Fact]
    public void MaximumSlipHz_WhenWindow20DegOverHalfSecond_Is0Point2222()
    {
        Assert.Equal(0.2222, SlipLimit.MaximumSlipHz(20, 0.5), 4); // 2·20 / (360·0.5) = 40/180 = 0.2222…
    }

    [Fact]
    public void MaximumSlipHz_WhenWholeWindowTraversedInQualifyingTime_IsExactlyTheRate()
    {
        // ±180° is a full turn: one turn in 1 s is a slip of 1 Hz.
        Assert.Equal(1.0, SlipLimit.MaximumSlipHz(180, 1.0), 15);
    }

    [Fact]
    public void MaximumQualifyingTimeSeconds_WhenGivenTheSlipLimit_ReturnsTheQualifyingTime()
    {
        var slip = SlipLimit.MaximumSlipHz(20, 0.5);
        Assert.Equal(0.5, SlipLimit.MaximumQualifyingTimeSeconds(20, slip), 12);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-0.5)]
    [InlineData(double.NaN)]
    public void MaximumSlipHz_WhenQualifyingTimeNotPositive_ThrowsInputException(double seconds)
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => SlipLimit.MaximumSlipHz(20, seconds));
        Assert.Contains("qualifying time", exception.Message);
    }

    [Theory]
    [InlineData(180.001)]
    [InlineData(200.0)]
    [InlineData(0.0)]
    [InlineData(-10.0)]
    public void MaximumSlipHz_WhenWindowOutsideZeroTo180_ThrowsInputException(double windowDeg)
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => SlipLimit.MaximumSlipHz(windowDeg, 0.5));
        Assert.Contains("angle window", exception.Message);
    }

    [Fact]
    public void MaximumSlipHz_WhenWindowIs180_IsAccepted()
    {
        Assert.Equal(2.0, SlipLimit.MaximumSlipHz(180, 0.5), 12); // 2·180 / (360·0.5)
    }

    [Fact]
    public void MaximumSlipHz_WhenRejected_ThrowsAnArgumentException()
    {
        Assert.ThrowsAny<ArgumentException>(() => SlipLimit.MaximumSlipHz(20, 0));
    }
}
