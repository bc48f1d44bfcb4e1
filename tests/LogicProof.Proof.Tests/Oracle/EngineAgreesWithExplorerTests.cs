using System.Diagnostics;
using CsCheck;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Lemmas;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;
using Xunit.Abstractions;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// Random small schemes, checked by the engines and by the explicit-state explorer; they must agree. Failing schemes
/// are shrunk by CsCheck and printed as .lpl source (replay one with the seed CsCheck prints).
/// </summary>
public sealed class EngineAgreesWithExplorerTests(ITestOutputHelper output)
{
    /// <summary>At least 2,000 schemes per run; LOGICPROOF_ORACLE_SCHEMES raises it for a longer soak (never lowers it).</summary>
    private static readonly int Iterations = Math.Max(2000, int.TryParse(Environment.GetEnvironmentVariable("LOGICPROOF_ORACLE_SCHEMES"), out var n) ? n : 0);
    private const int Threads = 2;
    private const int MaxExploredStates = 50_000;

    /// <summary>Generous limits: Inconclusive means a limit was really exceeded, and must stay under 1%.</summary>
    private static readonly CheckOptions PortfolioOptions = new()
    {
        MaxDepth = 60,
        TimeLimitPerProperty = TimeSpan.FromSeconds(30),
        MaxParallelProperties = 1,
    };

    private static readonly EngineOptions SingleEngineOptions = new()
    {
        MaxDepth = 60,
        TimeLimit = TimeSpan.FromSeconds(30),
    };

    private static readonly InvariantGenerator Generator = new(new InvariantOptions { SimulationRuns = 16, ScansPerRun = 32 });

    /// <summary>1-3 inputs, 2-6 equations, two requirements one time in four (else one), an assumption one time in four.</summary>
    private static readonly Gen<SchemeRecipe> Recipes =
        Gen.Select(Gen.Int[1, 3], Gen.Int[2, 6], Gen.Int[0, 3], Gen.Int[0, 3], Gen.Byte.Array[24, 160])
            .Select((inputs, locals, second, assume, choices) => new SchemeRecipe(inputs, locals, second == 0 ? 2 : 1, assume == 0, choices));

    [Fact]
    public void Verdicts_WhenSchemesAreRandom_AgreeWithTheExplorer()
    {
        var tally = new OracleTally();
        var clock = Stopwatch.StartNew();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;

        Recipes.Sample(recipe => CheckScheme(recipe, tally), iter: Iterations, threads: Threads, print: recipe => recipe.Source);

        var cpuSeconds = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
        output.WriteLine($"{tally} in {clock.Elapsed.TotalSeconds:0.0} s ({cpuSeconds:0.0} s of processor time)");
        Assert.True(tally.IncompleteExplorations * 100 <= tally.Schemes, $"too many schemes too large to explore: {tally}");
        Assert.True(tally.Inconclusive * 100 <= tally.Properties, $"more than 1% inconclusive: {tally}");
        Assert.True(tally.PdrInconclusive * 100 <= tally.Properties, $"PDR alone more than 1% inconclusive: {tally}");
    }

    private static void CheckScheme(SchemeRecipe recipe, OracleTally tally)
    {
        var model = SchemeLoader.Load(recipe.Source, "generated.lpl");
        tally.Scheme();
        var exploration = new ExplicitStateExplorer(model).Explore(MaxExploredStates);
        if (!exploration.Complete)
        {
            tally.IncompleteExploration();
            return;
        }

        var lemmas = Generator.Generate(model);
        tally.Lemmas(lemmas.Count);
        foreach (var lemma in lemmas)
        {
            var counterexample = exploration.ReachableStates.FirstOrDefault(s => !LemmaOracle.Holds(model, lemma.Expression, s));
            Assert.True(counterexample is null, $"lemma '{lemma.Description}' is FALSE in a reachable state");
        }

        // The portfolio checks each property on its cone, with the scheme's lemmas carried over to that cone.
        var checker = new PortfolioChecker([new BmcEngine(), new KInductionEngine(), new PdrEngine()]);
        var options = PortfolioOptions with { LemmaSource = sliced => LemmaProjection.Onto(lemmas, model, sliced) };
        for (var p = 0; p < model.Properties.Count; p++)
        {
            var property = model.Properties[p];
            var shortest = exploration.ShortestViolation[p];
            tally.Property();

            var portfolio = checker.CheckPropertyAsync(model, property, options).GetAwaiter().GetResult().Verdict;
            tally.Portfolio(Agree(model, property, shortest, portfolio, "portfolio"));

            // PDR alone, without acceleration: a violation it finds is shown through BMC without acceleration, whose
            // trace must then be exactly as long as the explorer's shortest; otherwise BMC runs alone for that check.
            var pdr = Run(new PdrEngine(), model, property, lemmas, SingleEngineOptions with { Accelerate = false });
            tally.Pdr(Agree(model, property, shortest, pdr, "pdr"));
            if (shortest is { } length)
            {
                var bmc = pdr as Violated ?? Run(new BmcEngine(), model, property, [], SingleEngineOptions with { Accelerate = false });
                var trace = Assert.IsType<Violated>(bmc).Trace;
                Assert.True(length == trace.TotalScans, $"{property.Name}: BMC without acceleration took {trace.TotalScans} scans, the explorer {length}");
                Assert.Null(SimulatorReplay.Check(model, property, trace));
            }
        }
    }

    /// <summary>Fails on a disagreement; returns "proved", "violated" or "inconclusive" for the tally.</summary>
    private static string Agree(ScanModel model, ModelProperty property, long? shortest, PropertyVerdict verdict, string who)
    {
        switch (verdict)
        {
            case Proved proved:
                Assert.True(shortest is null, $"{property.Name}: {who} proved it ({proved.Engine}), the explorer violates it in {shortest} scans");
                return "proved";
            case Violated violated:
                Assert.True(shortest is not null, $"{property.Name}: {who} violated it ({violated.Engine}), the explorer finds no violation");
                Assert.True(violated.Trace.TotalScans >= shortest, $"{property.Name}: {who}'s trace has {violated.Trace.TotalScans} scans, fewer than the explorer's shortest {shortest}");
                Assert.Null(SimulatorReplay.Check(model, property, violated.Trace));
                return "violated";
            default:
                return "inconclusive";
        }
    }

    private static PropertyVerdict Run(IProofEngine engine, ScanModel model, ModelProperty property, IReadOnlyList<Lemma> lemmas, EngineOptions options) =>
        engine.CheckAsync(new ProofProblem(model, property) { Lemmas = lemmas }, options, CancellationToken.None).GetAwaiter().GetResult();
}
