using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class SyncCalculatorTests
{
    [Fact]
    public void AdvanceAngle_WhenClosingTimeInCycles_ShowsSecondsAndTheCyclesGiven()
    {
        var result = SyncCalculator.AdvanceAngle(0.1, TimeSetting.Parse("6cyc", "the closing time"), 60);

        Assert.Equal(3.6, result.Result.Value, 12); // 6 cycles at 60 Hz = 0.1 s; 360·0.1·0.1
        Assert.Equal("inputs: s = 0.1 Hz, t = 0.1 s (given as 6 cyc at 60 Hz)", result.ToTextLines()[1]);
        Assert.Equal("result: advance = 3.6 deg", result.ToTextLines()[2]);
    }

    [Fact]
    public void AngleFromDifferenceVoltage_WhenOnePerUnit_ReportsDegrees()
    {
        var result = SyncCalculator.AngleFromDifferenceVoltage(1.0, 1.0, 1.0, "pu");

        Assert.Equal("d = arccos((V1^2 + V2^2 - dV^2) / (2*V1*V2))", result.Formula);
        Assert.Equal("result: d = 60 deg", result.ToTextLines()[2]); // 2·sin(30°) = 1
    }

    [Fact]
    public void MaximumSlip_WhenFrequencyNotPositive_ThrowsInputException()
    {
        Assert.Throws<SyncCheckInputException>(() =>
            SyncCalculator.MaximumSlip(20, TimeSetting.Parse("500ms", "the qualifying time"), 0));
    }

    [Fact]
    public void ToJson_WhenSlip_HasFormulaInputsAndResult()
    {
        var json = SyncCalculator.MaximumSlip(20, TimeSetting.Parse("30cyc", "the qualifying time"), 60).ToJson();

        using var document = System.Text.Json.JsonDocument.Parse(json);
        var root = document.RootElement;
        Assert.Equal("slip", root.GetProperty("calculation").GetString());
        Assert.Equal("30 cyc at 60 Hz", root.GetProperty("inputs")[1].GetProperty("given").GetString());
        Assert.Equal(0.2222, root.GetProperty("result").GetProperty("value").GetDouble(), 4); // 30 cyc = 0.5 s
        Assert.Equal("Hz", root.GetProperty("result").GetProperty("unit").GetString());
    }
}
