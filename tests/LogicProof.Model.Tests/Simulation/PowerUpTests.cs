using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

public sealed class PowerUpTests
{
    [Fact]
    public void PowerUpState_WhenUnknownLatchHasNoValue_Throws()
    {
        var (simulator, _) = LatchModel();
        var error = Assert.Throws<ArgumentException>(() => simulator.PowerUpState(null));
        Assert.Contains("L@latch", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PowerUpStateDefaulting_WhenUnknownLatchHasNoValue_StartsFalseAndReportsIt()
    {
        var (simulator, slot) = LatchModel();
        var result = simulator.PowerUpStateDefaultingUnknownToFalse(null);
        Assert.False(result.State.GetBool(slot));
        Assert.Equal([slot], result.DefaultedToFalse.Select(s => s.Index));
    }

    [Fact]
    public void PowerUpStateDefaulting_WhenValueGiven_UsesItAndReportsNothing()
    {
        var (simulator, slot) = LatchModel();
        var result = simulator.PowerUpStateDefaultingUnknownToFalse(new Dictionary<int, bool> { [slot] = true });
        Assert.True(result.State.GetBool(slot));
        Assert.Empty(result.DefaultedToFalse);
    }

    [Fact]
    public void PowerUpState_WhenKeyIsNotAnUnknownLatch_Throws()
    {
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var edge = builder.Bool("E");
        var edgeSlot = builder.Edge(EdgeKind.Rising, edge, builder.Now(input));
        var simulator = ScanSimulator.Compile(builder.Build());
        Assert.Throws<ArgumentException>(() => simulator.PowerUpState(new Dictionary<int, bool> { [edgeSlot] = true }));
        Assert.Throws<ArgumentException>(() => simulator.PowerUpState(new Dictionary<int, bool> { [edgeSlot + 1] = true }));
    }

    [Fact]
    public void PowerUpState_WhenDeclaredValues_UsesThem()
    {
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var x = builder.Bool("X");
        var timer = builder.Bool("T");
        builder.Assign(x, new OrExpression([builder.Now(input), builder.Prev(x, new KnownBoolPowerUp(true))]));
        var timerSlot = builder.Timer(TimerKind.OffDelay, timer, builder.Now(input), 5);
        var simulator = ScanSimulator.Compile(builder.Build());
        var state = simulator.PowerUpState(null);
        Assert.True(state.GetBool(builder.PreviousSlotOf(x)));
        Assert.Equal(5, state.GetCounter(timerSlot));
        Assert.Empty(simulator.UnknownPowerUpSlots);
    }

    [Fact]
    public void Replay_WhenRun_ReturnsEveryScanAndLeavesStartUnchanged()
    {
        var (simulator, slot) = LatchModel();
        var start = simulator.PowerUpState(new Dictionary<int, bool> { [slot] = true });
        var reset = simulator.CreateInputs();
        reset.SetBool(simulator.Model.Inputs[1], true);
        var idle = simulator.CreateInputs();

        var scans = simulator.Replay(start, [idle, reset, idle]);

        var latch = simulator.Model.StateSlots[slot].Cell;
        Assert.Equal([true, false, false], scans.Select(values => values.GetBool(latch)));
        Assert.True(start.GetBool(slot));
    }

    private static (ScanSimulator Simulator, int Slot) LatchModel()
    {
        var builder = new TestModelBuilder();
        var s = builder.BoolInput("S");
        var r = builder.BoolInput("R");
        var latch = builder.Bool("L");
        var slot = builder.Latch(LatchKind.ResetDominant, latch, builder.Now(s), builder.Now(r));
        return (ScanSimulator.Compile(builder.Build()), slot);
    }
}
