using System.Text.Json;

namespace LogicProof.Cli.Tests.Commands;

public sealed class GraphCommandTests : IDisposable
{
    // An invented bay (Quillmere 115 kV substation, breaker QM-7): a sealed-in close with a close-fail timer.
    private const string Scheme = """
        scheme QM7_GRAPH;
        frequency 60 Hz;
        scan 0.25 cyc;
        inputs CMD : bool; CLOSED : bool; GAS_LOW : bool; end
        locals FAIL : bool; ALARM : bool; end
        outputs CLOSE : bool; end
        logic
          CLOSE := (CMD OR CLOSE) AND NOT CLOSED AND NOT FAIL;
          FAIL := TON(CLOSE, T#500ms);
          ALARM := GAS_LOW;
        end
        require ENDS: NOT HELD(CLOSE, T#525ms);
        """;

    private readonly string _directory = Path.Combine(Path.GetTempPath(), "lp-graph-" + Guid.NewGuid().ToString("N"));

    public GraphCommandTests() => Directory.CreateDirectory(_directory);

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Graph_WhenValidScheme_PrintsDotAndExitsZero()
    {
        var (exitCode, output, error) = Run(Scheme, "graph");

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.StartsWith("digraph \"QM7_GRAPH\" {\n", output, StringComparison.Ordinal);
        Assert.Contains("\"FAIL\" -> \"CLOSE\" [style=dashed, label=\"last scan\"];", output, StringComparison.Ordinal);
        Assert.Contains("\"ALARM\" [shape=ellipse", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Graph_WhenJsonAndCone_PrintsOnlyTheConeAsJson()
    {
        var (exitCode, output, _) = Run(Scheme, "graph", "--format", "json", "--cone", "close");

        Assert.Equal(0, exitCode);
        using var document = JsonDocument.Parse(output);
        Assert.Equal(
            ["CMD", "CLOSED", "FAIL", "CLOSE", "FAIL.TON#1"],
            document.RootElement.GetProperty("vertices").EnumerateArray().Select(v => v.GetProperty("name").GetString()));
    }

    [Fact]
    public void Graph_WhenFormulasAsked_IncludesTheRequirement()
    {
        var (exitCode, output, _) = Run(Scheme, "graph", "--formulas");

        Assert.Equal(0, exitCode);
        Assert.Contains("\"CLOSE\" -> \"ENDS\";", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Graph_WhenConeNameIsUnknown_ReportsLP3020AndExitsThree()
    {
        var (exitCode, output, error) = Run(Scheme, "graph", "--cone", "NOPE");

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Contains("error LP3020", error, StringComparison.Ordinal);
        Assert.Contains("scheme.lpl", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Graph_WhenSchemeHasAnError_PrintsItWithPlaceAndExitsThree()
    {
        var (exitCode, output, error) = Run(Scheme.Replace("NOT CLOSED", "NOT CLOSSED", StringComparison.Ordinal), "graph");

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Contains("scheme.lpl:8:", error, StringComparison.Ordinal);
        Assert.Contains("error LP2", error, StringComparison.Ordinal);
        Assert.Contains("^", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Graph_WhenFormatIsUnknown_ExitsThree()
    {
        var (exitCode, _, error) = Run(Scheme, "graph", "--format", "svg");

        Assert.Equal(3, exitCode);
        Assert.Contains("svg", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Graph_WhenFileIsMissing_ExitsThreeWithADiagnostic()
    {
        var output = new StringWriter();
        var error = new StringWriter();

        var exitCode = CliApplication.Run(["graph", Path.Combine(_directory, "missing.lpl")], output, error);

        Assert.Equal(3, exitCode);
        Assert.Contains("LP1001", error.ToString(), StringComparison.Ordinal);
    }

    private (int ExitCode, string Output, string Error) Run(string scheme, params string[] arguments)
    {
        var path = Path.Combine(_directory, "scheme.lpl");
        File.WriteAllText(path, scheme);
        var output = new StringWriter();
        var error = new StringWriter();
        var exitCode = CliApplication.Run([.. arguments.Take(1), path, .. arguments.Skip(1)], output, error);
        return (exitCode, output.ToString(), error.ToString());
    }
}
