using System.Globalization;
using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

public sealed class SyncCheckFormattingTests
{
    [Theory]
    [InlineData(0.34729635533386066, 5, "0.3473")] // trailing zero of 0.34730 dropped
    [InlineData(3.6000000000000005, 5, "3.6")]
    [InlineData(0.2222222222222222, 4, "0.2222")]
    [InlineData(16.666666666666668, 5, "16.667")]
    [InlineData(123456.0, 3, "123000")]
    [InlineData(-0.5, 5, "-0.5")]
    [InlineData(0.0, 5, "0")]
    [InlineData(1.5e-9, 3, "1.5E-09")]
    public void Format_WhenRoundedToSignificantDigits_DropsTrailingZeros(double value, int digits, string expected)
    {
        Assert.Equal(expected, SyncCheckNumber.Format(value, digits));
    }

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void ToTextLines_WhenCultureUsesCommaDecimals_StillUsesPoint(string cultureName)
    {
        var lines = UnderCulture(cultureName, () =>
            SyncCalculator.MaximumSlip(20, TimeSetting.Parse("500ms", "the qualifying time"), 60).ToTextLines());

        Assert.Equal(
            [
                "formula: slip_max = 2*theta / (360*T)",
                "inputs: theta = 20 deg, T = 0.5 s (given as 500 ms)",
                "result: slip_max = 0.22222 Hz",
            ],
            lines);
    }

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void ToJson_WhenCultureUsesCommaDecimals_StillUsesPoint(string cultureName)
    {
        var json = UnderCulture(cultureName, () =>
            SyncCalculator.DifferenceVoltageFromAngle(60, 1.5, 1.5, "pu").ToJson());

        Assert.Contains("\"value\": 1.5", json);
        Assert.DoesNotContain("1,5", json);
    }

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void Parse_WhenCultureUsesCommaDecimals_ReadsPointAsDecimal(string cultureName)
    {
        Assert.Equal(0.5, UnderCulture(cultureName, () => SyncCheckNumber.Parse("0.5", "the value")));
        Assert.Equal(0.5, UnderCulture(cultureName, () => TimeSetting.Parse("0.5s", "the time").ToSeconds(60)));
    }

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void Message_WhenCultureUsesCommaDecimals_StillUsesPoint(string cultureName)
    {
        var message = UnderCulture(cultureName, () =>
            Assert.Throws<SyncCheckInputException>(() => SlipLimit.MaximumSlipHz(180.5, 0.5)).Message);

        Assert.Contains("got 180.5 deg", message);
    }

    private static T UnderCulture<T>(string cultureName, Func<T> action)
    {
        var saved = CultureInfo.CurrentCulture;
        CultureInfo.CurrentCulture = new CultureInfo(cultureName);
        try
        {
            Assert.Equal(",", CultureInfo.CurrentCulture.NumberFormat.NumberDecimalSeparator);
            return action();
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }
}
