using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using LogicProof.Cli.Commands;

namespace LogicProof.Cli.Tests.Commands;

public sealed class SyncCalcCommandTests
{
    [Fact]
    public void Slip_WhenWindowAndQualifyingTimeGiven_PrintsFormulaAndResult()
    {
        var (exitCode, output, error) = Run("sync-calc", "slip", "--window-deg", "20", "--qualify", "500ms");

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.Equal(
            [
                "formula: slip_max = 2*theta / (360*T)",
                "inputs: theta = 20 deg, T = 0.5 s (given as 500 ms)",
                "result: slip_max = 0.22222 Hz", // 2·20 / (360·0.5)
            ],
            Lines(output));
    }

    [Fact]
    public void Slip_WhenQualifyingTimeInCyclesAt50Hz_ConvertsWithThatFrequency()
    {
        var (exitCode, output, _) = Run("sync-calc", "slip", "--window-deg", "20", "--qualify", "25cyc", "--frequency", "50");

        Assert.Equal(0, exitCode);
        Assert.Contains("result: slip_max = 0.22222 Hz", output); // 25 cycles at 50 Hz = 0.5 s
    }

    [Fact]
    public void Advance_WhenJsonFormat_PrintsResultInDegrees()
    {
        var (exitCode, output, _) = Run(
            "sync-calc", "advance", "--slip-hz", "0.1", "--closing-time", "100ms", "--format", "json");

        Assert.Equal(0, exitCode);
        using var document = JsonDocument.Parse(output);
        var result = document.RootElement.GetProperty("result");
        Assert.Equal(3.6, result.GetProperty("value").GetDouble(), 12); // 360·0.1·0.1
        Assert.Equal("deg", result.GetProperty("unit").GetString());
    }

    [Fact]
    public void Voltage_WhenAngleGiven_PrintsDifferenceVoltage()
    {
        var (exitCode, output, _) = Run("sync-calc", "voltage", "--angle-deg", "60");

        Assert.Equal(0, exitCode);
        Assert.Contains("result: |dV| = 1 pu", output); // 2·sin(30°) = 1 at V1 = V2 = 1 pu
    }

    [Fact]
    public void Voltage_WhenDifferenceVoltageGiven_PrintsAngle()
    {
        var (exitCode, output, _) = Run("sync-calc", "voltage", "--dv", "0.3473", "--v1", "1", "--v2", "1");

        Assert.Equal(0, exitCode);
        Assert.Contains("result: d = 20 deg", output); // 2·asin(0.3473/2) = 20.0003°, shown to 5 digits
    }

    [Theory]
    [InlineData("sync-calc", "slip", "--window-deg", "20", "--qualify", "500xs")] // unknown unit
    [InlineData("sync-calc", "slip", "--window-deg", "20", "--qualify", "500")] // no unit
    [InlineData("sync-calc", "slip", "--window-deg", "200", "--qualify", "500ms")] // window over 180°
    [InlineData("sync-calc", "slip", "--window-deg", "20", "--qualify", "0s")] // zero time
    [InlineData("sync-calc", "slip", "--qualify", "500ms")] // window missing
    [InlineData("sync-calc", "slip", "--qualify", "500ms", "--window-deg")] // window without its value
    [InlineData("sync-calc", "slip", "--window-deg", "2,5", "--qualify", "500ms")] // comma decimal
    [InlineData("sync-calc", "slip", "--window-deg", "20", "--qualify", "500ms", "--format", "xml")]
    [InlineData("sync-calc", "advance", "--slip-hz", "0.1", "--closing-time", "5cyc", "--frequency", "0")]
    [InlineData("sync-calc", "voltage", "--dv", "2.5")] // more than V1 + V2
    [InlineData("sync-calc", "voltage", "--dv", "0.3", "--angle-deg", "20")] // both directions at once
    [InlineData("sync-calc", "voltage")] // neither direction
    public void Invoke_WhenInputBad_ExitsWith3AndOneLineOnStandardError(params string[] args)
    {
        var (exitCode, output, error) = Run(args);

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        var line = Assert.Single(Lines(error));
        Assert.StartsWith("sync-calc ", line);
        Assert.DoesNotContain("Exception", line); // a stack trace would name the exception type
    }

    [Fact]
    public void Invoke_WhenUnknownOption_FailsWithoutResult()
    {
        // Unknown words are System.CommandLine's own parse errors, handled by the root command's setup.
        var (exitCode, output, _) = Run("sync-calc", "slip", "--window-deg", "20", "--qualify", "500ms", "--extra");

        Assert.NotEqual(0, exitCode);
        Assert.DoesNotContain("result:", output);
    }

    [Fact]
    public void Slip_WhenUnitUnknown_SaysWhichUnitsWork()
    {
        var (_, _, error) = Run("sync-calc", "slip", "--window-deg", "20", "--qualify", "500xs");

        Assert.Equal(
            "sync-calc slip: the qualifying time '500xs' has the unknown unit 'xs': write a number and a unit, such as 500ms, 0.5s or 30cyc.",
            error.TrimEnd());
    }

    [Theory]
    [InlineData("de-DE")] // where System.CommandLine's own double parsing would read "0.5" as 5
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void Slip_WhenCultureUsesCommaDecimals_ReadsAndPrintsPoints(string cultureName)
    {
        var saved = CultureInfo.CurrentCulture;
        CultureInfo.CurrentCulture = new CultureInfo(cultureName);
        try
        {
            var (exitCode, output, _) = Run("sync-calc", "slip", "--window-deg", "20.0", "--qualify", "0.5s");

            Assert.Equal(0, exitCode);
            Assert.Contains("result: slip_max = 0.22222 Hz", output);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    private static (int ExitCode, string Output, string Error) Run(params string[] args)
    {
        var root = new RootCommand("test root");
        root.Subcommands.Add(SyncCalcCommand.Create());
        using var output = new StringWriter(CultureInfo.InvariantCulture);
        using var error = new StringWriter(CultureInfo.InvariantCulture);
        var exitCode = root.Parse(args).Invoke(new InvocationConfiguration { Output = output, Error = error });
        return (exitCode, output.ToString(), error.ToString());
    }

    private static string[] Lines(string text) =>
        text.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(line => line.TrimEnd('\r')).ToArray();
}
