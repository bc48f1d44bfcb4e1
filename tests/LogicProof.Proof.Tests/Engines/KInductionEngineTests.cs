using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Lemmas;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Engines;

public sealed class KInductionEngineTests
{
    [Fact]
    public async Task Check_WhenCloseNeedsTheCommandInTheSameScan_ProvesWithDepthOne()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var verdict = await Verdicts.RunAsync(new KInductionEngine(), model, "CLOSES_ONLY_ON_COMMAND");

        Assert.Equal(new Proved(KInductionEngine.EngineName, 1, null), verdict);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Check_WhenSealInPowerUpIsDeclared_ProvesWhatTheUnknownPowerUpBreaks(bool declareInit)
    {
        var model = SchemeLoader.Load(Schemes.SealIn(declareInit));

        var verdict = await Verdicts.RunAsync(new KInductionEngine(), model, "SEAL_NEEDS_COMMAND_FIRST");

        if (declareInit)
        {
            Assert.IsType<Proved>(verdict);
        }
        else
        {
            Assert.Equal(0, Assert.IsType<Violated>(verdict).Trace.FailingScan);
        }
    }

    [Fact]
    public async Task Check_WhenViolationExists_ReportsItFromTheBaseCase()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var verdict = await Verdicts.RunAsync(new KInductionEngine(), model, "NEVER_CLOSES");

        Assert.Equal(10, Assert.IsType<Violated>(verdict).Trace.FailingScan);
    }

    [Fact]
    public async Task Check_WhenPropertyNeedsARelationBetweenTimers_ProvesOnlyWithThatLemma()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        var slow = SchemeLoader.CounterSlotOf(model, "SLOW");
        var fast = SchemeLoader.CounterSlotOf(model, "FAST");

        // Invariant: both timers count the same standing input, so FAST's counter is min(SLOW's counter, 2500).
        var relation = new Lemma(
            "FAST counter = min(SLOW counter, 2500)",
            new LemmaOr(
            [
                new LemmaAnd(
                [
                    new LemmaCompare(CompareOperator.Less, new LemmaSlot(slow), new LemmaNumber(new Fraction(2500))),
                    new LemmaCompare(CompareOperator.Equal, new LemmaSlot(fast), new LemmaSlot(slow)),
                ]),
                new LemmaAnd(
                [
                    new LemmaCompare(CompareOperator.GreaterOrEqual, new LemmaSlot(slow), new LemmaNumber(new Fraction(2500))),
                    new LemmaCompare(CompareOperator.Equal, new LemmaSlot(fast), new LemmaNumber(new Fraction(2500))),
                ]),
            ]));
        var property = SchemeLoader.Property(model, "SLOW_AFTER_FAST");
        var options = new EngineOptions { MaxDepth = 4 };

        var without = await new KInductionEngine().CheckAsync(new ProofProblem(model, property), options, CancellationToken.None);
        var with = await new KInductionEngine().CheckAsync(new ProofProblem(model, property) { Lemmas = [relation] }, options, CancellationToken.None);

        Assert.IsType<Inconclusive>(without);
        Assert.IsType<Proved>(with);
    }
}
