using System.Diagnostics;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Oracle;
using LogicProof.Proof.Tests.Support;
using Xunit.Abstractions;

namespace LogicProof.Proof.Tests.Invariants;

public sealed class InvariantGeneratorTests(ITestOutputHelper output)
{
    [Fact]
    public void Generate_WhenTwoTimersShareAnInput_KeepsTheMinRelation()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);

        var lemmas = new InvariantGenerator().Generate(model);

        Assert.Contains(lemmas, l => l.Description == "FAST@timer = min(SLOW@timer, 2500)");
    }

    [Fact]
    public async Task Generate_WhenAPropertyNeedsTheTimerRelation_LetsKInductionProveIt()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        var property = SchemeLoader.Property(model, "SLOW_AFTER_FAST");
        var options = new EngineOptions { MaxDepth = 4, TimeLimit = TimeSpan.FromSeconds(60) };
        var clock = Stopwatch.StartNew();
        var lemmas = new InvariantGenerator().Generate(model);
        var generation = clock.Elapsed;

        clock.Restart();
        var without = await new KInductionEngine().CheckAsync(new ProofProblem(model, property), options, CancellationToken.None);
        var withoutTime = clock.Elapsed;
        clock.Restart();
        var with = await new KInductionEngine().CheckAsync(new ProofProblem(model, property) { Lemmas = lemmas }, options, CancellationToken.None);
        var withTime = clock.Elapsed;

        output.WriteLine($"generation {generation.TotalSeconds:0.000} s; k-induction without lemmas {withoutTime.TotalSeconds:0.000} s ({without}), with {lemmas.Count} lemmas {withTime.TotalSeconds:0.000} s");
        Assert.IsType<Inconclusive>(without);
        Assert.IsType<Proved>(with);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Generate_WhenLatchPowerUpIsUnknown_DoesNotClaimMemoryEqualsLastValue(bool declareInit)
    {
        var model = SchemeLoader.Load(InvariantSchemes.Lockout(declareInit));

        var lemmas = new InvariantGenerator().Generate(model);

        // LOCKOUT@latch and LOCKOUT@last are equal after the first scan; at power-up they are two independent
        // unknowns unless LOCKOUT declares its value, so only then is the equality an invariant.
        var equality = lemmas.Any(l => l.Description == "LOCKOUT@latch = LOCKOUT@last");
        Assert.Equal(declareInit, equality);
    }

    [Fact]
    public void Generate_WhenAnEdgeWatchesACellWithALastValue_RelatesTheMemoryToIt()
    {
        var model = SchemeLoader.Load(InvariantSchemes.Lockout(declareInit: true));

        var lemmas = new InvariantGenerator().Generate(model);

        // R_TRIG: M' = CLK, so M is the clock's value at the previous scan (IEC 61131-3 ed.3 §6.6.3.5.3, R_TRIG body).
        Assert.Contains(lemmas, l => l.Description == "CLOSE_EDGE@edge = CLOSE_OUT@last");
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Generate_WhenAnAssumptionRestrictsTheInputs_KeepsWhatHoldsUnderIt(bool assume)
    {
        var model = SchemeLoader.Load(InvariantSchemes.AssumedNoReset(assume));

        var lemmas = new InvariantGenerator().Generate(model);

        // With RESET never operated, a seal-in once set stays set: its value two scans ago implies its last value.
        var kept = lemmas.Any(l => l.Description == "WAS_SEEN@last -> SEEN@last");
        Assert.Equal(assume, kept);
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Generate_OnSmallSchemes_GivesOnlyLemmasTrueInEveryReachableState(bool declareInit)
    {
        var total = 0;
        foreach (var source in new[] { InvariantSchemes.Lockout(declareInit), InvariantSchemes.AssumedNoReset(declareInit) })
        {
            var model = SchemeLoader.Load(source);
            var reachable = BreadthFirstExplorer.Explore(new SimulatorStepper(model), 100_000);
            Assert.True(reachable.Complete);

            var lemmas = new InvariantGenerator().Generate(model);

            total += lemmas.Count;
            foreach (var lemma in lemmas)
            {
                Assert.All(reachable.ReachableStates, state => Assert.True(LemmaOracle.Holds(model, lemma.Expression, state), lemma.Description));
            }
        }

        Assert.True(total > 0, "no lemma at all: the check above checked nothing");
    }

    [Fact]
    public void Generate_WhenTheModelHas200Slots_FinishesWithinSeconds()
    {
        var model = SchemeLoader.Load(InvariantSchemes.ManyBays(40));
        var clock = Stopwatch.StartNew();

        var lemmas = new InvariantGenerator().Generate(model);

        output.WriteLine($"{model.StateSlots.Count} slots, {lemmas.Count} lemmas in {clock.Elapsed.TotalSeconds:0.00} s");
        Assert.True(model.StateSlots.Count >= 200, $"only {model.StateSlots.Count} slots");
        Assert.NotEmpty(lemmas);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(60), $"took {clock.Elapsed}");
    }

    [Fact]
    public void Generate_WhenCancelled_ReturnsNoLemmas()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();

        var lemmas = new InvariantGenerator().Generate(model, cancelled.Token);

        Assert.Empty(lemmas);
    }

    [Fact]
    public void Generate_WhenTheSolverHasNoTime_ReturnsNoLemmasRatherThanUncheckedOnes()
    {
        var model = SchemeLoader.Load(InvariantSchemes.ManyBays(10));

        var lemmas = new InvariantGenerator(new InvariantOptions { TimeLimit = TimeSpan.Zero }).Generate(model);

        Assert.Empty(lemmas);
    }

    [Fact]
    public void Generate_WhenTheCandidateCapIsSmall_NeverReturnsMoreThanTheCap()
    {
        var model = SchemeLoader.Load(InvariantSchemes.ManyBays(10));

        var lemmas = new InvariantGenerator(new InvariantOptions { MaxCandidates = 5 }).Generate(model);

        Assert.InRange(lemmas.Count, 0, 5);
    }
}
