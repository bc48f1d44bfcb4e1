using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

public sealed class ScanStateTests
{
    [Fact]
    public void Clone_WhenUnchanged_IsEqualWithEqualHash()
    {
        var (simulator, _, _, _) = TimerAndLatchModel();
        var state = simulator.PowerUpState(new Dictionary<int, bool> { [1] = true });
        var copy = state.Clone();
        Assert.Equal(state, copy);
        Assert.Equal(state.GetHashCode(), copy.GetHashCode());
        Assert.NotSame(state, copy);
    }

    [Fact]
    public void Clone_WhenCopyIsStepped_OriginalIsUnchanged()
    {
        var (simulator, _, _, _) = TimerAndLatchModel();
        var state = simulator.PowerUpState(new Dictionary<int, bool> { [1] = false });
        var copy = state.Clone();
        var inputs = simulator.CreateInputs();
        inputs.SetBool(simulator.Model.Inputs[0], true);
        simulator.Step(copy, inputs, simulator.CreateValues());
        Assert.NotEqual(state, copy);
        Assert.Equal(0, state.GetCounter(0));
        Assert.Equal(1, copy.GetCounter(0));
    }

    [Fact]
    public void SetCounter_WhenTimerSetExpired_StepGivesOutputAtOnce()
    {
        // Stepping from an arbitrary state: a TON whose counter already reached the preset gives Q with IN TRUE.
        var (simulator, timer, _, _) = TimerAndLatchModel();
        var state = simulator.PowerUpState(new Dictionary<int, bool> { [1] = false });
        state.SetCounter(0, 2);
        var inputs = simulator.CreateInputs();
        inputs.SetBool(simulator.Model.Inputs[0], true);
        var values = simulator.CreateValues();
        simulator.Step(state, inputs, values);
        Assert.True(values.GetBool(timer));
    }

    [Fact]
    public void SetCounter_WhenBeyondPreset_Throws()
    {
        var (simulator, _, _, _) = TimerAndLatchModel();
        Assert.Throws<ArgumentOutOfRangeException>(() => simulator.CreateState().SetCounter(0, 3));
    }

    [Fact]
    public void GetBool_WhenSlotIsCounter_Throws()
    {
        var (simulator, _, _, _) = TimerAndLatchModel();
        Assert.Throws<ArgumentException>(() => simulator.CreateState().GetBool(0));
    }

    [Fact]
    public void BreadthFirstSearch_WhenEveryStateAndInputExplored_FindsAllReachableStatesAndShortestViolation()
    {
        // Breadth-first search over (state, inputs) from both power-up values of the latch, as a brute-force
        // model checker would: T := TON(A, 2 scans); L := SR(S1 := A AND B, R := NOT A); OK := NOT (T AND NOT L).
        var (simulator, _, _, ok) = TimerAndLatchModel();
        var frontier = new List<ScanState>
        {
            simulator.PowerUpState(new Dictionary<int, bool> { [1] = false }),
            simulator.PowerUpState(new Dictionary<int, bool> { [1] = true }),
        };
        var visited = new HashSet<ScanState>(frontier);
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var firstViolationScans = -1;
        for (var depth = 1; frontier.Count > 0; depth++)
        {
            var next = new List<ScanState>();
            foreach (var state in frontier)
            {
                for (var bits = 0; bits < 4; bits++)
                {
                    inputs.SetBool(simulator.Model.Inputs[0], (bits & 1) != 0);
                    inputs.SetBool(simulator.Model.Inputs[1], (bits & 2) != 0);
                    var successor = state.Clone();
                    simulator.Step(successor, inputs, values);
                    if (!values.GetBool(ok) && firstViolationScans < 0)
                    {
                        firstViolationScans = depth;
                    }

                    if (visited.Add(successor))
                    {
                        next.Add(successor);
                    }
                }
            }

            frontier = next;
        }

        // Counter 0..2 times latch FALSE/TRUE: all six combinations are reachable.
        Assert.Equal(6, visited.Count);

        // A held for three scans with B FALSE from L = FALSE: T rises at the third scan while L is FALSE.
        Assert.Equal(3, firstViolationScans);
    }

    [Fact]
    public void Equals_WhenStatesOfDifferentSimulators_IsFalse()
    {
        var first = TimerAndLatchModel().Simulator.CreateState();
        var second = TimerAndLatchModel().Simulator.CreateState();
        Assert.False(first.Equals(second));
        Assert.Throws<ArgumentException>(() => first.CopyFrom(second));
    }

    private static (ScanSimulator Simulator, int Timer, int Latch, int Ok) TimerAndLatchModel()
    {
        var builder = new TestModelBuilder();
        var a = builder.BoolInput("A");
        var b = builder.BoolInput("B");
        var timer = builder.Bool("T");
        var latch = builder.Bool("L");
        var ok = builder.Bool("OK");
        builder.Timer(TimerKind.OnDelay, timer, builder.Now(a), 2);
        builder.Latch(LatchKind.SetDominant, latch, new AndExpression([builder.Now(a), builder.Now(b)]), new NotExpression(builder.Now(a)));
        builder.Assign(ok, new NotExpression(new AndExpression([builder.Now(timer), new NotExpression(builder.Now(latch))])));
        builder.Property("OK", ok);
        return (ScanSimulator.Compile(builder.Build()), timer, latch, ok);
    }
}
