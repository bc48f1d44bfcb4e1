namespace LogicProof.Cli.Tests.Commands;

public sealed class CheckCommandTests : IDisposable
{
    // An invented bay (Quillmere 115 kV substation, breaker QM-7), with an intended one-scan delay and a spare
    // input, so the static checks have something to say.
    private const string Scheme = """
        scheme QM7_CHECK;
        frequency 60 Hz;
        scan 2 ms;
        inputs CMD : bool; CLOSED : bool; SPARE : bool; end
        locals PERMIT : bool; end
        outputs CLOSE : bool init FALSE; end
        logic
          CLOSE := (CMD AND PERMIT OR CLOSE) AND NOT CLOSED;
          PERMIT := NOT CLOSED;
        end
        """;

    private const string Clean = """
        scheme QM7_CLEAN;
        frequency 60 Hz;
        scan 2 ms;
        inputs CMD : bool; CLOSED : bool; end
        outputs CLOSE : bool; end
        logic
          CLOSE := CMD AND NOT CLOSED;
        end
        """;

    private readonly string _directory = Path.Combine(Path.GetTempPath(), "lp-check-" + Guid.NewGuid().ToString("N"));

    public CheckCommandTests() => Directory.CreateDirectory(_directory);

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Check_WhenStaticOnlyWithWarnings_PrintsThemWithPlacesAndExitsZero()
    {
        var (exitCode, output, error) = Run(["check", Write("bay.lpl", Scheme), "--static-only"]);

        Assert.Equal(0, exitCode);
        Assert.Contains("bay.lpl:4:35: warning LP3010", error, StringComparison.Ordinal);
        Assert.Contains("bay.lpl:8:21: warning LP3013", error, StringComparison.Ordinal);
        Assert.Contains("bay.lpl:9:3: 'PERMIT' is written here", error, StringComparison.Ordinal);
        Assert.Contains("note LP3014", error, StringComparison.Ordinal);
        Assert.Contains("summary: 1 file; 0 proved, 0 violated, 0 inconclusive", output, StringComparison.Ordinal);
        Assert.Contains("0 errors, 2 warnings, 1 note; exit code 0", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenStaticOnlyAndClean_PrintsOnlyTheSummary()
    {
        var (exitCode, output, error) = Run(["check", Write("clean.lpl", Clean), "--static-only"]);

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.Contains("0 errors, 0 warnings, 0 notes; exit code 0", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenAnyFileHasAnError_ChecksTheOthersAndExitsThree()
    {
        var broken = Write("broken.lpl", Clean.Replace("CMD AND", "CMD AND AND", StringComparison.Ordinal));

        var (exitCode, output, error) = Run(["check", Write("clean.lpl", Clean), broken, Write("bay.lpl", Scheme), "--static-only"]);

        Assert.Equal(3, exitCode);
        Assert.Contains("broken.lpl:7:", error, StringComparison.Ordinal);
        Assert.Contains("error LP1", error, StringComparison.Ordinal);
        Assert.Contains("warning LP3010", error, StringComparison.Ordinal);
        Assert.Contains("summary: 3 files;", output, StringComparison.Ordinal);
        Assert.Contains("1 error", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenModelCannotBeBuilt_ReportsTheErrorAndExitsThree()
    {
        var tooLong = Write("long.lpl", Clean.Replace("CLOSE := CMD AND NOT CLOSED;", "CLOSE := TON(CMD, T#100000d);", StringComparison.Ordinal));

        var (exitCode, _, error) = Run(["check", tooLong, "--static-only"]);

        Assert.Equal(3, exitCode);
        Assert.Contains("long.lpl:7:21: error LP3004", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenRequirementHolds_ProvesItAndExitsZero()
    {
        var scheme = Write("holds.lpl", Clean + "\nrequire NO_CLOSE_INTO_CLOSED: CLOSED -> NOT CLOSE;\n");

        var (exitCode, output, error) = Run(["check", scheme]);

        Assert.True(exitCode == 0, output + error);
        Assert.Contains("PROVED", output, StringComparison.Ordinal);
        Assert.Contains("A proof covers the logic as modelled", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenRequirementFails_ShowsTheTraceWritesTheCsvAndExitsOne()
    {
        var scheme = Write("fails.lpl", Clean + "\nrequire NEVER_CLOSES: NOT CLOSE;\n");
        var trace = Path.Combine(_directory, "trace.csv");

        var (exitCode, output, error) = Run(["check", scheme, "--trace-out", trace]);

        Assert.True(exitCode == 1, output + error);
        Assert.Contains("VIOLATED", output, StringComparison.Ordinal);
        Assert.StartsWith("time_ms,", File.ReadAllLines(trace).First(line => !line.StartsWith('#')), StringComparison.Ordinal);

        // The exported trace, replayed by the simulate command, closes the output at the failing scan.
        var (simulateExit, simulated, _) = Run(["simulate", scheme, "--inputs", trace, "--format", "csv"]);
        Assert.Equal(0, simulateExit);
        Assert.EndsWith(",1", simulated.TrimEnd().Split('\n')[^1].TrimEnd(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("json", "\"safetyStatement\"")]
    [InlineData("sarif", "\"2.1.0\"")]
    [InlineData("junit", "<testsuites")]
    public void Check_WhenMachineFormatAsked_WritesThatFormat(string format, string marker)
    {
        var scheme = Write("fails.lpl", Clean + "\nrequire NEVER_CLOSES: NOT CLOSE;\n");

        var (exitCode, output, _) = Run(["check", scheme, "--format", format]);

        Assert.Equal(1, exitCode);
        Assert.Contains(marker, output, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Check_WhenOnlyBoundedSearchRunsOnAHoldingRequirement_IsInconclusiveNeverProvedAndExitsTwo()
    {
        // Bounded model checking alone can refute but never prove: reaching its depth bound without a violation
        // must be reported as inconclusive (exit 2), not as a pass.
        var scheme = Write("deep.lpl", """
            scheme DEEP;
            frequency 60 Hz;
            scan 2 ms;
            inputs CMD : bool; end
            outputs LATE : bool; end
            logic
              LATE := TON(IN := CMD, PT := T#10s);
            end
            require LATE_ONLY_WITH_CMD: LATE -> CMD;
            """);

        var (exitCode, output, error) = Run(["check", scheme, "--time-limit", "1", "--depth", "3", "--engine", "bmc"]);

        Assert.True(exitCode == 2, output + error);
        Assert.Contains("INCONCLUSIVE", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenNoFileGiven_ExitsThree()
    {
        var (exitCode, _, _) = Run(["check", "--static-only"]);

        Assert.Equal(3, exitCode);
    }

    [Fact]
    public void Check_WhenExampleSchemes_HaveNoErrors()
    {
        var examples = Directory.GetFiles(Path.Combine(RepositoryRoot(), "examples"), "*.lpl", SearchOption.AllDirectories);
        Assert.NotEmpty(examples);

        var (exitCode, output, error) = Run(["check", .. examples, "--static-only"]);

        Assert.True(exitCode == 0, error);
        Assert.Contains("; 0 errors", output, StringComparison.Ordinal);
    }

    private string Write(string name, string text)
    {
        var path = Path.Combine(_directory, name);
        File.WriteAllText(path, text);
        return path;
    }

    private static (int ExitCode, string Output, string Error) Run(string[] arguments)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var exitCode = CliApplication.Run(arguments, output, error);
        return (exitCode, output.ToString(), error.ToString());
    }

    private static string RepositoryRoot([System.Runtime.CompilerServices.CallerFilePath] string sourceFile = "")
    {
        foreach (var start in new[] { AppContext.BaseDirectory, Path.GetDirectoryName(sourceFile) ?? string.Empty })
        {
            for (var directory = new DirectoryInfo(start); directory is not null; directory = directory.Parent)
            {
                if (File.Exists(Path.Combine(directory.FullName, "LogicProof.sln")))
                {
                    return directory.FullName;
                }
            }
        }

        throw new InvalidOperationException("LogicProof.sln not found");
    }
}
