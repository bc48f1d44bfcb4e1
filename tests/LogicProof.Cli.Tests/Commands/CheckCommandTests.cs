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
        Assert.Equal("checked 1 file: 0 errors, 2 warnings, 1 note" + Environment.NewLine, output);
    }

    [Fact]
    public void Check_WhenStaticOnlyAndClean_PrintsOnlyTheSummary()
    {
        var (exitCode, output, error) = Run(["check", Write("clean.lpl", Clean), "--static-only"]);

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.Equal("checked 1 file: 0 errors, 0 warnings, 0 notes" + Environment.NewLine, output);
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
        Assert.StartsWith("checked 3 files: 1 error", output, StringComparison.Ordinal);
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
    public void Check_WhenProofsAreAsked_SaysTheyAreNotAvailableAndExitsTwo()
    {
        var (exitCode, output, _) = Run(["check", Write("clean.lpl", Clean)]);

        Assert.Equal(2, exitCode);
        Assert.Contains("proofs are not available in this build", output, StringComparison.Ordinal);
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
        Assert.Contains(" 0 errors", output, StringComparison.Ordinal);
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
