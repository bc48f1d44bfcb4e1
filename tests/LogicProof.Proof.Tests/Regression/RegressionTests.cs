using LogicProof.Core.Diagnostics;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Oracle;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Regression;

/// <summary>
/// The regression folders: every file under Regression/proved, Regression/violated and Regression/error, each starting
/// with a comment saying what it checks. The folder is the expected verdict of every requirement in the file, and each
/// engine runs alone (through the portfolio checker with one engine selected, so slicing, the invariant generator's
/// lemmas and the replay of traces are the product's own):
/// <list type="bullet">
/// <item>proved/: k-induction and PDR prove; BMC alone can only bound, so it must be Inconclusive (no violation
/// within its depth), never Violated.</item>
/// <item>violated/: every engine returns Violated, and the trace replays in the simulator.</item>
/// <item>error/: the front end (or the lowering) reports an input error: a diagnostic of code LP1xxx (reading and
/// syntax) or LP2xxx (names and types), with a line and column. The kind is checked, not the wording.</item>
/// </list>
/// </summary>
public sealed class RegressionTests
{
    private static readonly PortfolioChecker Checker = new([new BmcEngine(), new KInductionEngine(), new PdrEngine()]);

    private static readonly CheckOptions Options = new()
    {
        MaxDepth = 30,
        TimeLimitPerProperty = TimeSpan.FromSeconds(120),
        MaxParallelProperties = 1,
        LemmaSource = model => new InvariantGenerator().Generate(model),
    };

    public static TheoryData<string, string> Files()
    {
        var data = new TheoryData<string, string>();
        foreach (var folder in new[] { "proved", "violated", "error" })
        {
            foreach (var file in Directory.EnumerateFiles(Path.Combine(Root(), folder), "*.lpl").Order(StringComparer.Ordinal))
            {
                data.Add(folder, Path.GetFileName(file));
            }
        }

        return data;
    }

    [Fact]
    public void Folders_Always_HoldTheAgreedMinimumOfFiles()
    {
        Assert.True(Count("proved") >= 8, "at least 8 proved files");
        Assert.True(Count("violated") >= 8, "at least 8 violated files");
        Assert.True(Count("error") >= 6, "at least 6 error files");
    }

    [Theory]
    [MemberData(nameof(Files))]
    public async Task File_WhenCheckedByEachEngineAlone_GivesTheVerdictOfItsFolder(string folder, string file)
    {
        var path = Path.Combine(Root(), folder, file);
        var source = await File.ReadAllTextAsync(path);
        Assert.StartsWith("//", source.TrimStart());
        var (model, diagnostics) = SchemeLoader.TryLoad(source, file);

        if (folder == "error")
        {
            var errors = diagnostics.Where(d => d.IsError).ToList();
            Assert.True(errors.Count > 0, "an error file must give an error");
            Assert.All(errors, e => Assert.False(e.Span.IsNone, $"{e.Code} has no place"));
            Assert.Contains(errors, e => e.Code.StartsWith("LP1", StringComparison.Ordinal) || e.Code.StartsWith("LP2", StringComparison.Ordinal));
            return;
        }

        Assert.True(model is not null, string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null))));
        Assert.NotEmpty(model.Properties);
        var mismatches = new List<string>();
        foreach (var engine in new[] { EngineSelection.Bmc, EngineSelection.KInduction, EngineSelection.Pdr })
        {
            var results = await Checker.CheckAsync(model, Options with { Engine = engine });
            foreach (var result in results)
            {
                var problem = Mismatch(folder, engine, model, result);
                if (problem is not null)
                {
                    mismatches.Add($"{engine} on {result.Property.Name}: {problem}");
                }
            }
        }

        Assert.True(mismatches.Count == 0, string.Join(Environment.NewLine, mismatches));
    }

    private static string? Mismatch(string folder, EngineSelection engine, ScanModel model, PropertyResult result) =>
        (folder, engine, result.Verdict) switch
        {
            ("proved", EngineSelection.Bmc, Inconclusive) => null,
            ("proved", _, Proved) when engine != EngineSelection.Bmc => null,
            ("violated", _, Violated violated) => SimulatorReplay.Check(model, result.Property, violated.Trace),
            _ => $"expected {(folder == "proved" && engine == EngineSelection.Bmc ? "Inconclusive (bounded)" : folder)}, got {result.Verdict}",
        };

    private static int Count(string folder) => Directory.EnumerateFiles(Path.Combine(Root(), folder), "*.lpl").Count();

    /// <summary>The folders as the project copies them next to the test assembly.</summary>
    private static string Root() => Path.Combine(AppContext.BaseDirectory, "Regression");
}
