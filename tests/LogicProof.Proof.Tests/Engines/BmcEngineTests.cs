using Fractions;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Engines;

public sealed class BmcEngineTests
{
    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Check_WhenOnDelayPassesAStandingCommand_FindsTheViolationAtScanTen(bool accelerate)
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var verdict = await Verdicts.RunAsync(new BmcEngine(), model, "NEVER_CLOSES", new EngineOptions { Accelerate = accelerate });

        // IEC 61131-3 TON: Q rises when ET reaches PT; with 20 ms at 2 ms per scan (10 scans) that is the 11th
        // consecutive scan with IN TRUE, scan index 10, starting at 20 ms.
        var trace = Assert.IsType<Violated>(verdict).Trace;
        Assert.Equal(10, trace.FailingScan);
        Assert.Equal(new Fraction(20), trace.Steps[trace.FailingStep].StartMilliseconds);
        Assert.All(trace.Steps, step => Assert.Equal(TraceValue.Of(true), Verdicts.Input(step, "CLOSE_CMD")));
        Assert.Equal(accelerate ? 2 : 11, trace.Steps.Count);
        TraceReplayer.Replay(model, SchemeLoader.Property(model, "NEVER_CLOSES"), trace, "bmc");
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Check_WhenAFewInputChangesBeatALongWait_ShowsTheTraceWithFewerScans(bool accelerate)
    {
        var model = SchemeLoader.Load(Schemes.QuickOrSlow);

        var verdict = await Verdicts.RunAsync(new BmcEngine(), model, "NOT_BAD", new EngineOptions { Accelerate = accelerate });

        var trace = Assert.IsType<Violated>(verdict).Trace;
        Assert.Equal(2, trace.FailingScan);
        Assert.Equal(
            [true, false, true],
            trace.Steps.Select(s => ((BoolTraceValue)Verdicts.Input(s, "B")).Value));
        TraceReplayer.Replay(model, SchemeLoader.Property(model, "NOT_BAD"), trace, "bmc");
    }

    [Fact]
    public async Task Check_WhenPropertyHolds_IsInconclusiveAtTheDepthLimitAndNeverProved()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var verdict = await Verdicts.RunAsync(new BmcEngine(), model, "CLOSES_ONLY_ON_COMMAND", new EngineOptions { MaxDepth = 6 });

        var inconclusive = Assert.IsType<Inconclusive>(verdict);
        Assert.Equal(6, inconclusive.DepthReached);
    }

    [Fact]
    public async Task Check_WhenLatchHasNoDeclaredPowerUp_StartsItTrueToBreakTheRule()
    {
        var model = SchemeLoader.Load(Schemes.SealIn(declareInit: false));

        var verdict = await Verdicts.RunAsync(new BmcEngine(), model, "SEAL_NEEDS_COMMAND_FIRST");

        var trace = Assert.IsType<Violated>(verdict).Trace;
        Assert.Equal(0, trace.FailingScan);
        var powerUp = Assert.Single(trace.PowerUp);
        Assert.Equal(TraceValue.Of(true), powerUp.Value);
        Assert.Equal(TraceValue.Of(false), Verdicts.Input(trace.Steps[0], "CLOSE_CMD"));
        TraceReplayer.Replay(model, SchemeLoader.Property(model, "SEAL_NEEDS_COMMAND_FIRST"), trace, "bmc");
    }

    [Fact]
    public async Task Check_WhenTraceIsFound_JustifiesTheFailingValueByTheDecidingTerms()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var trace = Assert.IsType<Violated>(await Verdicts.RunAsync(new BmcEngine(), model, "NEVER_CLOSES")).Trace;

        // NOT CLOSE_OUT is FALSE because CLOSE_OUT is TRUE, which the TON made from CLOSE_CMD and 10 elapsed scans.
        var root = trace.Justification.Root;
        Assert.Equal(TraceValue.Of(false), root.Value);
        Assert.Equal(10, root.Scan);
        var closeOut = Assert.Single(root.Causes);
        Assert.Equal("CLOSE_OUT", closeOut.Cell);
        Assert.Contains(closeOut.Terms, t => t.Text == "CLOSE_CMD" && t.Value == TraceValue.Of(true));
        Assert.Contains(closeOut.Terms, t => t.Text.StartsWith("TON elapsed", StringComparison.Ordinal) && t.Value == new CounterTraceValue(10));
    }
}
