using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Orchestration;

public sealed class ReplayTests
{
    [Fact]
    public async Task CheckPropertyAsync_WhenAnEngineWorkedOnAWrongModel_ThrowsReplayMismatch()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        var checker = new PortfolioChecker([new WrongModelEngine()]);

        var error = await Assert.ThrowsAsync<ReplayMismatchException>(
            () => checker.CheckPropertyAsync(model, SchemeLoader.Property(model, "NEVER_CLOSES"), new CheckOptions()));

        Assert.Equal("NEVER_CLOSES", error.Property);
    }

    [Fact]
    public async Task Replay_WhenTraceClaimsAnInputValueTheModelDoesNotFail_ThrowsReplayMismatch()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        var property = SchemeLoader.Property(model, "NEVER_CLOSES");
        var trace = Assert.IsType<Violated>(await Verdicts.RunAsync(new BmcEngine(), model, "NEVER_CLOSES")).Trace;
        var tampered = trace with
        {
            Steps = [.. trace.Steps.Select((s, i) => i == 0 ? s with { Inputs = [.. s.Inputs.Select(v => v with { Value = TraceValue.Of(false) })] } : s)],
        };

        TraceReplayer.Replay(model, property, trace, "bmc");
        Assert.Throws<ReplayMismatchException>(() => TraceReplayer.Replay(model, property, tampered, "bmc"));
    }

    [Fact]
    public async Task CheckPropertyAsync_WhenPropertyConeLeavesInputsOut_ReportsTraceInTheGivenModelsCells()
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);

        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, "NO_LOCKED_CLOSE"), new CheckOptions());

        var trace = Assert.IsType<Violated>(result.Verdict).Trace;
        Assert.DoesNotContain(trace.Steps[0].Inputs, i => i.Name == "LOAD_I");
        Assert.All(trace.Steps.SelectMany(s => s.Inputs.Concat(s.Cells)), v => Assert.Equal(model.Cells[v.Index].Name, v.Name));
        Assert.All(trace.Steps.SelectMany(s => s.Memories), v => Assert.Equal(model.StateSlots[v.Index].Name, v.Name));
    }

    /// <summary>Runs BMC on the model with the TON's preset one scan shorter than the model it is asked about.</summary>
    private sealed class WrongModelEngine : IProofEngine
    {
        public EngineKind Kind => EngineKind.Bmc;

        public string Name => "wrong-model";

        public Task<PropertyVerdict> CheckAsync(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken)
        {
            var wrong = problem.Model with
            {
                Steps = [.. problem.Model.Steps.Select(s => s is TimerStep t ? t with { PresetScans = t.PresetScans - 1 } : s)],
                StateSlots = [.. problem.Model.StateSlots.Select(s => s.Kind == StateSlotKind.TimerCounter ? s with { CounterMax = s.CounterMax - 1 } : s)],
            };
            return new BmcEngine().CheckAsync(problem with { Model = wrong }, options, cancellationToken);
        }
    }
}
