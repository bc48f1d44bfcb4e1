using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class TimeSettingTests
{
    [Fact]
    public void CyclesToMilliseconds_When60Hz_OneCycleIs16Point667()
    {
        Assert.Equal(16.667, TimeConversion.CyclesToMilliseconds(1, 60), 3); // 1000/60 ms, common practice
    }

    [Fact]
    public void CyclesToMilliseconds_When50Hz_OneCycleIs20()
    {
        Assert.Equal(20.0, TimeConversion.CyclesToMilliseconds(1, 50), 12); // 1000/50 ms, common practice
    }

    [Theory]
    [InlineData(1.0, 50.0)]
    [InlineData(1.0, 60.0)]
    [InlineData(30.0, 60.0)]
    [InlineData(2.5, 50.0)]
    [InlineData(7.0, 16.7)]
    public void MillisecondsToCycles_WhenGivenConvertedCycles_ReturnsTheCycles(double cycles, double frequencyHz)
    {
        var ms = TimeConversion.CyclesToMilliseconds(cycles, frequencyHz);
        Assert.Equal(cycles, TimeConversion.MillisecondsToCycles(ms, frequencyHz), 12);
    }

    [Theory]
    [InlineData(20.0, 50.0, 1.0)] // 20 ms at 50 Hz is one cycle
    [InlineData(500.0, 60.0, 30.0)] // 500 ms at 60 Hz is 30 cycles
    public void MillisecondsToCycles_WhenWholeCycles_IsExact(double ms, double frequencyHz, double expected)
    {
        Assert.Equal(expected, TimeConversion.MillisecondsToCycles(ms, frequencyHz), 12);
    }

    [Theory]
    [InlineData("500ms", 0.5)]
    [InlineData("0.5s", 0.5)]
    [InlineData("30cyc", 0.5)] // 30 cycles at 60 Hz
    [InlineData(" 30 cycles ", 0.5)]
    [InlineData("0.5 S", 0.5)]
    [InlineData("5e2ms", 0.5)]
    public void Parse_WhenNumberAndUnit_ConvertsToSeconds(string text, double expectedSeconds)
    {
        Assert.Equal(expectedSeconds, TimeSetting.Parse(text, "the time").ToSeconds(60), 12);
    }

    [Theory]
    [InlineData("500")] // no unit
    [InlineData("500xs")] // unknown unit
    [InlineData("ms")] // no number
    [InlineData("1,5s")] // comma as decimal separator
    [InlineData("0ms")]
    [InlineData("-5ms")]
    [InlineData("NaNs")]
    public void Parse_WhenNotAPositiveTimeWithUnit_ThrowsInputException(string text)
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => TimeSetting.Parse(text, "the qualifying time"));
        Assert.StartsWith("the qualifying time", exception.Message);
    }

    [Fact]
    public void Parse_WhenUnitUnknown_MessageSaysWhichUnitsWork()
    {
        var exception = Assert.Throws<SyncCheckInputException>(() => TimeSetting.Parse("500xs", "the qualifying time"));
        Assert.Equal(
            "the qualifying time '500xs' has the unknown unit 'xs': write a number and a unit, such as 500ms, 0.5s or 30cyc.",
            exception.Message);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-60.0)]
    public void ToSeconds_WhenCyclesAndFrequencyNotPositive_ThrowsInputException(double frequencyHz)
    {
        var setting = TimeSetting.Parse("30cyc", "the qualifying time");
        Assert.Throws<SyncCheckInputException>(() => setting.ToSeconds(frequencyHz));
    }
}
