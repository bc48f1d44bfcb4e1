using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Lemmas;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Oracle.Reference;
using LogicProof.Proof.Tests.Rules;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// One generated scheme checked against the reference: the verdicts and the shortest violation lengths come from the
/// reference interpreter's breadth-first exploration (independent of the product's lowering and simulator); the
/// product's portfolio, PDR alone and BMC alone must agree with them. With time acceleration off every counterexample
/// must be exactly as long as the reference's shortest, and must replay in the reference interpreter and in the
/// product's simulator, failing at the same scan. The generated lemmas must hold in every state the product's
/// simulator reaches (they are statements about the product's own state slots).
/// </summary>
internal static class OracleCheck
{
    private const int MaxExploredStates = 100_000;

    /// <summary>Generous limits: Inconclusive means a limit was really exceeded.</summary>
    private static readonly CheckOptions PortfolioOptions = new()
    {
        MaxDepth = 60,
        TimeLimitPerProperty = TimeSpan.FromSeconds(30),
        MaxParallelProperties = 1,
        Accelerate = false,
    };

    private static readonly EngineOptions SingleEngineOptions = new()
    {
        MaxDepth = 60,
        TimeLimit = TimeSpan.FromSeconds(30),
        Accelerate = false,
    };

    private static readonly InvariantGenerator Generator = new(new InvariantOptions { SimulationRuns = 16, ScansPerRun = 32 });

    /// <summary>The product's default engines, with PDR added when the defaults do not have it.</summary>
    private static readonly PortfolioChecker Checker = new(
        PortfolioChecker.DefaultEngines().Any(e => e.Kind == EngineKind.Pdr)
            ? PortfolioChecker.DefaultEngines()
            : [.. PortfolioChecker.DefaultEngines(), new PdrEngine()]);

    public static void Check(string source, IReadOnlyDictionary<string, Fraction[]> realDomains, OracleTally tally)
    {
        var (model, setup) = RuleProofHarness.Load(source);
        var interpreter = new ReferenceInterpreter(ReferenceProgram.FromSource(source));
        tally.Scheme(model.Inputs.Any(c => model.Cells[c].Type == SignalType.Real), setup.BreakerModelled);
        var reference = BreadthFirstExplorer.Explore(new ReferenceStepper(interpreter, realDomains), MaxExploredStates);
        if (!reference.Complete)
        {
            tally.IncompleteExploration();
            return;
        }

        var lemmas = Generator.Generate(model);
        tally.Lemmas(lemmas.Count);
        if (lemmas.Count > 0)
        {
            var product = BreadthFirstExplorer.Explore(new SimulatorStepper(model, realDomains), MaxExploredStates);
            foreach (var lemma in product.Complete ? lemmas : [])
            {
                var counterexample = product.ReachableStates.FirstOrDefault(s => !LemmaOracle.Holds(model, lemma.Expression, s));
                Assert.True(counterexample is null, $"lemma '{lemma.Description}' is FALSE in a reachable state");
            }
        }

        Assert.Equal(model.Properties.Select(p => p.Name), interpreter.Properties.Select(p => p.Name));
        var options = PortfolioOptions with { LemmaSource = sliced => LemmaProjection.Onto(lemmas, model, sliced) };
        for (var p = 0; p < model.Properties.Count; p++)
        {
            var property = model.Properties[p];
            var expected = new Expected(reference.ShortestViolation[p], reference.ShortestWitness[p]);
            tally.Property(property.Origin == PropertyOrigin.Rule);

            var portfolio = Checker.CheckPropertyAsync(model, property, options).GetAwaiter().GetResult().Verdict;
            tally.Portfolio(Agree(model, interpreter, property, expected, portfolio, "portfolio"));

            // PDR alone: a violation it finds is shown through BMC, whose trace must then be exactly the shortest;
            // otherwise BMC runs alone for that check.
            var pdr = Run(new PdrEngine(), model, property, lemmas);
            tally.Pdr(Agree(model, interpreter, property, expected, pdr, "pdr"));
            if (expected.Scans is not null && pdr is not Violated)
            {
                var bmc = Run(new BmcEngine(), model, property, []);
                Assert.Equal("violated", Agree(model, interpreter, property, expected, bmc, "bmc"));
            }
        }
    }

    /// <summary>Fails on a disagreement; returns "proved", "violated" or "inconclusive" for the tally.</summary>
    private static string Agree(ScanModel model, ReferenceInterpreter interpreter, ModelProperty property, Expected expected, PropertyVerdict verdict, string who)
    {
        switch (verdict)
        {
            case Proved proved:
                Assert.True(expected.Scans is null, $"{property.Name}: {who} proved it ({proved.Engine}), the reference violates it in {expected.Scans} scans: {expected.Witness}");
                return "proved";
            case Violated violated:
                var trace = violated.Trace;
                Assert.True(expected.Scans is not null, $"{property.Name}: {who} violated it ({violated.Engine}) in {trace.TotalScans} scans, the reference finds no violation");
                Assert.True(
                    trace.TotalScans == expected.Scans,
                    $"{property.Name}: {who}'s trace ({violated.Engine}) has {trace.TotalScans} scans, the reference's shortest {expected.Scans}: {expected.Witness}");
                Assert.Null(ReferenceReplay.Check(interpreter, property.Name, trace));
                Assert.Null(SimulatorReplay.Check(model, property, trace));
                return "violated";
            default:
                return "inconclusive";
        }
    }

    private static PropertyVerdict Run(IProofEngine engine, ScanModel model, ModelProperty property, IReadOnlyList<Lemma> lemmas) =>
        engine.CheckAsync(new ProofProblem(model, property) { Lemmas = lemmas }, SingleEngineOptions, CancellationToken.None).GetAwaiter().GetResult();

    private sealed record Expected(long? Scans, string? Witness);
}
