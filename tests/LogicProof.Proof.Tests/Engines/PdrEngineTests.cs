using System.Diagnostics;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Oracle;
using LogicProof.Proof.Tests.Support;
using Xunit.Abstractions;

namespace LogicProof.Proof.Tests.Engines;

public sealed class PdrEngineTests(ITestOutputHelper output)
{
    private static readonly EngineOptions Options = new() { TimeLimit = TimeSpan.FromSeconds(60) };

    [Fact]
    public void Engine_Always_IsNamedPdrOfKindPdr()
    {
        var engine = new PdrEngine();

        Assert.Equal(EngineKind.Pdr, engine.Kind);
        Assert.Equal("pdr", engine.Name);
    }

    [Fact]
    public async Task Check_WhenThePropertyNeedsAnInvariant_ProvesAndWritesItOverSlotNames()
    {
        var verdict = await Run(Schemes.SealIn(declareInit: true), "SEAL_NEEDS_COMMAND_FIRST");

        var proved = Assert.IsType<Proved>(verdict);
        output.WriteLine(proved.Invariant);
        Assert.Equal("pdr", proved.Engine);
        Assert.NotNull(proved.Invariant);

        // SEAL TRUE last scan is only possible once the command has been seen: the invariant must say so in the
        // scheme's slot names, not in the solver's variable numbers or quoting.
        Assert.Contains("SEAL@last", proved.Invariant);
        Assert.Contains("ONCE", proved.Invariant);
        Assert.DoesNotContain(":var", proved.Invariant);
        Assert.DoesNotContain("|", proved.Invariant);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Check_WhenTheSealInHasNoDeclaredPowerUp_FindsTheViolationAtTheFirstScan(bool accelerate)
    {
        var verdict = await Run(Schemes.SealIn(declareInit: false), "SEAL_NEEDS_COMMAND_FIRST", Options with { Accelerate = accelerate });

        // An undeclared seal-in may power up TRUE (it has no de-energised state), breaking the rule at once.
        var trace = Assert.IsType<Violated>(verdict).Trace;
        Assert.Equal(0, trace.FailingScan);
        Assert.Contains(trace.PowerUp, p => p.Name == "SEAL@last" && p.Value == TraceValue.Of(true));
    }

    [Fact]
    public async Task Check_WhenATimerBreaksThePropertyAfterTenScans_ReturnsTheShortestTrace()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        var property = SchemeLoader.Property(model, "NEVER_CLOSES");

        var verdict = await new PdrEngine().CheckAsync(new ProofProblem(model, property), Options, CancellationToken.None);

        // TON with PT = 10 scans: Q rises at the 11th consecutive scan with IN (IEC 61131-3 ed.3 §6.6.3.5.4, TON timing).
        var violated = Assert.IsType<Violated>(verdict);
        Assert.Equal("pdr", violated.Engine);
        Assert.Equal(10, violated.Trace.FailingScan);
        Assert.Null(SimulatorReplay.Check(model, property, violated.Trace));
    }

    [Fact]
    public async Task Check_WhenAnAssumptionRulesOutTheCommand_Proves()
    {
        var verdict = await Run(Schemes.ShortDelayAssumingNoCommand, "NEVER_CLOSES");

        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task Check_WhenTheDeepTimerIsViolatedAfter5000Scans_FindsItWithAcceleration()
    {
        var model = SchemeLoader.Load(Schemes.DeepTimer);
        var property = SchemeLoader.Property(model, "NO_GAS_LOCK");
        var clock = Stopwatch.StartNew();

        var verdict = await new PdrEngine().CheckAsync(new ProofProblem(model, property), Options, CancellationToken.None);

        output.WriteLine($"deep timer violation in {clock.Elapsed.TotalSeconds:0.000} s");
        var trace = Assert.IsType<Violated>(verdict).Trace;
        Assert.Equal(5000, trace.FailingScan);
        Assert.Null(SimulatorReplay.Check(model, property, trace));
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Check_WhenTheDeepTimerPropertyHolds_Proves(bool accelerate)
    {
        var clock = Stopwatch.StartNew();

        var verdict = await Run(Schemes.DeepTimer, "LOCK_NEEDS_GAS", Options with { Accelerate = accelerate });

        output.WriteLine($"deep timer proof in {clock.Elapsed.TotalSeconds:0.000} s (acceleration {accelerate})");
        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task Check_WhenTwoTimersMustStayInStep_ProvesWithIntegerCounters()
    {
        var clock = Stopwatch.StartNew();

        var verdict = await Run(Schemes.TwoTimers, "SLOW_AFTER_FAST");

        output.WriteLine($"two timers without lemmas in {clock.Elapsed.TotalSeconds:0.000} s: {(verdict as Proved)?.Invariant}");
        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task Check_WhenGeneratedLemmasAreGiven_StillProves()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        var property = SchemeLoader.Property(model, "SLOW_AFTER_FAST");
        var lemmas = new InvariantGenerator().Generate(model);
        var clock = Stopwatch.StartNew();

        var verdict = await new PdrEngine().CheckAsync(new ProofProblem(model, property) { Lemmas = lemmas }, Options, CancellationToken.None);

        output.WriteLine($"two timers with {lemmas.Count} lemmas in {clock.Elapsed.TotalSeconds:0.000} s");
        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task Check_WhenTheModelHasNoMemory_DecidesFromOneScan()
    {
        var proved = await Run(PdrSchemes.Combinational, "LIVE_MEANS_VOLTAGE");
        var violated = await Run(PdrSchemes.Combinational, "NEVER_LIVE");

        Assert.IsType<Proved>(proved);
        Assert.Equal(0, Assert.IsType<Violated>(violated).Trace.FailingScan);
    }

    [Fact]
    public async Task Check_WhenBmcCannotReachTheViolationWithinItsDepth_ReturnsInconclusiveWithoutATrace()
    {
        // Without acceleration the violation needs 11 steps; BMC may take only 5, so no trace can be shown.
        var verdict = await Run(Schemes.ShortDelay, "NEVER_CLOSES", Options with { Accelerate = false, MaxDepth = 5 });

        var inconclusive = Assert.IsType<Inconclusive>(verdict);
        Assert.Contains("PDR found a violation", inconclusive.Reason);
    }

    [Fact]
    public async Task Check_WhenAlreadyCancelled_ReturnsInconclusive()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        using var cancelled = new CancellationTokenSource();
        await cancelled.CancelAsync();

        var verdict = await new PdrEngine().CheckAsync(
            new ProofProblem(model, SchemeLoader.Property(model, "SLOW_AFTER_FAST")), Options, cancelled.Token);

        Assert.IsType<Inconclusive>(verdict);
    }

    [Fact]
    public async Task Check_WhenCancelledWhileRunning_StopsPromptlyWithInconclusive()
    {
        var model = SchemeLoader.Load(PdrSchemes.Counter(24));
        using var cancellation = new CancellationTokenSource(TimeSpan.FromMilliseconds(300));
        var clock = Stopwatch.StartNew();

        var verdict = await new PdrEngine().CheckAsync(
            new ProofProblem(model, SchemeLoader.Property(model, "NOT_FULL")), Options with { TimeLimit = null }, cancellation.Token);

        output.WriteLine($"stopped after {clock.Elapsed.TotalSeconds:0.000} s");
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(30), $"took {clock.Elapsed}");
        Assert.Equal("cancelled", Assert.IsType<Inconclusive>(verdict).Reason);
    }

    [Fact]
    public async Task Check_WhenTheTimeLimitIsReached_ReturnsInconclusive()
    {
        var clock = Stopwatch.StartNew();

        var verdict = await Run(PdrSchemes.Counter(24), "NOT_FULL", Options with { TimeLimit = TimeSpan.FromMilliseconds(300) });

        output.WriteLine($"stopped after {clock.Elapsed.TotalSeconds:0.000} s");
        Assert.Equal("time limit reached", Assert.IsType<Inconclusive>(verdict).Reason);
    }

    private static Task<PropertyVerdict> Run(string source, string property, EngineOptions? options = null) =>
        Verdicts.RunAsync(new PdrEngine(), SchemeLoader.Load(source), property, options ?? Options);
}
