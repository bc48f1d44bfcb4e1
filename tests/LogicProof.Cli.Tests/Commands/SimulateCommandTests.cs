using System.Globalization;
using System.Text.Json;

namespace LogicProof.Cli.Tests.Commands;

public sealed class SimulateCommandTests : IDisposable
{
    // An invented bay (Quillmere 115 kV substation, breaker QM-7): a sealed-in close, blocked by a lockout latch
    // without a declared power-up value.
    private const string Scheme = """
        scheme QM7_SIM "Quillmere 115 kV substation, breaker QM-7 (invented)";
        frequency 60 Hz;
        scan 2 ms;
        inputs
            CLOSE_CMD : bool;
            BRK_52A   : bool;
            TRIP_86   : bool;
            RESET_86  : bool;
            SLIP_HZ   : real range -2 .. 2;
        end
        locals
            SLIP_OK : bool;
        end
        outputs
            LOCKOUT_86 : bool;
            CLOSE_OUT  : bool init FALSE;
        end
        logic
            LOCKOUT_86 := SR(S1 := TRIP_86, R := RESET_86);
            SLIP_OK := ABS(SLIP_HZ) <= 0.1;
            CLOSE_OUT := (CLOSE_CMD AND SLIP_OK OR CLOSE_OUT) AND NOT BRK_52A AND NOT LOCKOUT_86;
        end
        """;

    private const string Trace = """
        # close with the slip inside the window; the breaker closes at 6 ms
        time_ms, CLOSE_CMD, BRK_52A, TRIP_86, RESET_86, SLIP_HZ
        0,       0,         0,       0,       0,        0.05
        2,       1
        4,       0
        6,       ,          1
        10,      END
        """;

    private readonly string _directory = Path.Combine(Path.GetTempPath(), "lp-simulate-" + Guid.NewGuid().ToString("N"));

    public SimulateCommandTests() => Directory.CreateDirectory(_directory);

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Simulate_WhenValidTrace_PrintsEveryScanAndExitsZero()
    {
        var (exitCode, output, error) = Simulate(Scheme, Trace, "--powerup", "LOCKOUT_86=FALSE");

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.Equal(
            [
                "QM7_SIM: 5 scans of 2 ms; * marks a change since the previous scan, ~ a rounded value",
                "scan  time_ms  CLOSE_CMD  BRK_52A  TRIP_86  RESET_86  SLIP_HZ   |  LOCKOUT_86  CLOSE_OUT",
                "0     0        0          0        0        0         0.05      |  0           0",
                "1     2        1*         0        0        0         0.05      |  0           1*",
                "2     4        0*         0        0        0         0.05      |  0           1",
                "3     6        0          1*       0        0         0.05      |  0           0*",
                "4     8        0          1        0        0         0.05      |  0           0",
            ],
            Lines(output));
    }

    [Fact]
    public void Simulate_WhenChangesOnlyAndShow_PrintsChangedScansAndTheLocal()
    {
        var (exitCode, output, _) = Simulate(Scheme, Trace, "--powerup", "LOCKOUT_86=FALSE", "--changes-only", "--show", "slip_ok");

        Assert.Equal(0, exitCode);
        var lines = Lines(output);
        Assert.EndsWith("SLIP_OK", lines[1], StringComparison.Ordinal);
        Assert.Equal(["0", "1", "2", "3"], lines.Skip(2).Select(line => line.Split(' ')[0]));
    }

    [Fact]
    public void Simulate_WhenLatchPowerUpNotGiven_WarnsAndStartsFalse()
    {
        var (exitCode, output, error) = Simulate(Scheme, Trace);

        Assert.Equal(0, exitCode);
        Assert.Contains("warning LP4019: latch 'LOCKOUT_86' has no declared power-up value", error, StringComparison.Ordinal);
        Assert.Contains("scheme.lpl:", error, StringComparison.Ordinal);
        Assert.EndsWith("|  0           1*", Lines(output)[3], StringComparison.Ordinal);
    }

    [Fact]
    public void Simulate_WhenARetainedLatchHasNoPowerUpGiven_SaysItIsRetainedAndStartsFalse()
    {
        var scheme = Scheme.Replace("LOCKOUT_86 : bool;", "LOCKOUT_86 : bool init retained;", StringComparison.Ordinal);
        Assert.NotEqual(Scheme, scheme);

        var (exitCode, output, error) = Simulate(scheme, Trace);

        Assert.Equal(0, exitCode);
        Assert.Contains("warning LP4019: latch 'LOCKOUT_86' is retained", error, StringComparison.Ordinal);
        Assert.EndsWith("|  0           1*", Lines(output)[3], StringComparison.Ordinal);
    }

    [Fact]
    public void Simulate_WhenLatchPoweredUpTrue_CloseIsBlocked()
    {
        var (exitCode, output, _) = Simulate(Scheme, Trace, "--powerup", "lockout_86=TRUE", "--format", "csv");

        Assert.Equal(0, exitCode);
        Assert.Equal(
            [
                "scan,time_ms,CLOSE_CMD,BRK_52A,TRIP_86,RESET_86,SLIP_HZ,LOCKOUT_86,CLOSE_OUT",
                "0,0,0,0,0,0,0.05,1,0",
                "1,2,1,0,0,0,0.05,1,0",
                "2,4,0,0,0,0,0.05,1,0",
                "3,6,0,1,0,0,0.05,1,0",
                "4,8,0,1,0,0,0.05,1,0",
            ],
            Lines(output));
    }

    [Fact]
    public void Simulate_WhenJsonAndUntil_RunsTheGivenLengthAsValidJson()
    {
        var (exitCode, output, _) = Simulate(Scheme, Trace, "--powerup", "LOCKOUT_86=FALSE", "--format", "json", "--until", "3");

        Assert.Equal(0, exitCode);
        using var json = JsonDocument.Parse(output);
        Assert.Equal(2, json.RootElement.GetProperty("scans").GetInt32());
        var rows = json.RootElement.GetProperty("rows");
        Assert.Equal(2, rows.GetArrayLength());
        Assert.Equal("CLOSE_CMD", rows[1].GetProperty("changed")[0].GetString());
        Assert.Equal("0.05", rows[1].GetProperty("values")[4].GetString());
    }

    [Fact]
    public void Simulate_WhenTraceHasBadValue_ExitsThreeWithPlaceExcerptAndCaret()
    {
        var (exitCode, output, error) = Simulate(Scheme, "time_ms,CLOSE_CMD\n0,0\n2,  yes\n");

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        var lines = Lines(error);
        var index = Array.FindIndex(lines, line => line.Contains("LP4008", StringComparison.Ordinal));
        Assert.True(index >= 0, error);
        Assert.EndsWith("trace.csv:3:5: error LP4008: 'yes' is not a value of bool input 'CLOSE_CMD': use 1, 0, TRUE or FALSE.", lines[index], StringComparison.Ordinal);
        Assert.Equal("    | 2,  yes", lines[index + 1]);
        Assert.Equal("    |     ^^^", lines[index + 2]);
    }

    [Fact]
    public void Simulate_WhenSchemeHasError_ExitsThreeWithoutRunning()
    {
        var (exitCode, output, error) = Simulate(Scheme.Replace("NOT BRK_52A", "NOT BRK_52X", StringComparison.Ordinal), Trace);

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Contains("scheme.lpl:", error, StringComparison.Ordinal);
        Assert.Contains("error LP", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--show", "NO_SUCH_NAME", "LP4020")]
    [InlineData("--powerup", "CLOSE_OUT=TRUE", "LP4018")]
    [InlineData("--powerup", "LOCKOUT_86=maybe", "LP4018")]
    [InlineData("--until", "-5", "LP4017")]
    [InlineData("--until", "1,5", "LP4017")]
    [InlineData("--format", "xml", "LP4021")]
    [InlineData("--until", "3600000000", "LP4022")]
    public void Simulate_WhenOptionIsBad_ExitsThreeWithItsCode(string option, string value, string code)
    {
        var (exitCode, output, error) = Simulate(Scheme, Trace, option, value);

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Contains($"error {code}:", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Simulate_WhenTraceFileMissing_ExitsThreeWithUnreadableCode()
    {
        var scheme = Write("scheme.lpl", Scheme);
        var (exitCode, _, error) = Run("simulate", scheme, "--inputs", Path.Combine(_directory, "absent.csv"));

        Assert.Equal(3, exitCode);
        Assert.Contains("error LP4001:", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Simulate_WhenInputsOptionMissing_ExitsThree()
    {
        var scheme = Write("scheme.lpl", Scheme);
        var (exitCode, _, _) = Run("simulate", scheme);

        Assert.Equal(3, exitCode);
    }

    [Theory]
    [InlineData("text")]
    [InlineData("csv")]
    [InlineData("json")]
    public void Simulate_UnderTurkishFrenchAndInvariantCultures_OutputIsByteIdentical(string format)
    {
        var outputs = new[] { "tr-TR", "fr-FR", string.Empty }.Select(culture =>
        {
            var previous = CultureInfo.CurrentCulture;
            try
            {
                CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(culture);
                var (exitCode, output, _) = Simulate(Scheme, Trace, "--powerup", "lockout_86=false", "--format", format, "--show", "slip_ok");
                Assert.Equal(0, exitCode);
                return output;
            }
            finally
            {
                CultureInfo.CurrentCulture = previous;
            }
        }).ToList();

        Assert.Equal(outputs[0], outputs[1]);
        Assert.Equal(outputs[0], outputs[2]);
        Assert.Contains("0.05", outputs[0], StringComparison.Ordinal);
    }

    private (int ExitCode, string Output, string Error) Simulate(string scheme, string trace, params string[] options)
    {
        var schemePath = Write("scheme.lpl", scheme);
        var tracePath = Write("trace.csv", trace);
        return Run(["simulate", schemePath, "--inputs", tracePath, .. options]);
    }

    private string Write(string name, string content)
    {
        var path = Path.Combine(_directory, name);
        File.WriteAllText(path, content);
        return path;
    }

    private static (int ExitCode, string Output, string Error) Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var exitCode = CliApplication.Run(args, output, error);
        return (exitCode, output.ToString(), error.ToString());
    }

    private static string[] Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
}
