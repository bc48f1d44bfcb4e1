using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>Equations run in the order written; a name read before its equation gives the previous scan's value.</summary>
public sealed class ScanOrderTests
{
    [Fact]
    public void Step_WhenReaderFollowsWriter_SeesValueOfSameScan()
    {
        // A := IN; B := A;  -- B follows IN in the same scan.
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var a = builder.Bool("A");
        var b = builder.Bool("B");
        builder.Assign(a, builder.Now(input));
        builder.Assign(b, builder.Now(a));
        Assert.Equal("0110", SimulationHarness.Run(builder.Build(), b, "0110"));
    }

    [Fact]
    public void Step_WhenReaderPrecedesWriter_SeesValueOfPreviousScan()
    {
        // B := A; A := IN;  -- the same equations in the other order: B lags IN by one scan (A starts FALSE).
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var a = builder.Bool("A");
        var b = builder.Bool("B");
        builder.Assign(b, builder.Prev(a));
        builder.Assign(a, builder.Now(input));
        Assert.Equal("0011", SimulationHarness.Run(builder.Build(), b, "0110"));
    }

    [Fact]
    public void Step_WhenEquationReadsItsOwnName_SeesItsPreviousValue()
    {
        // X := NOT X;  -- reads X of the previous scan, so X toggles every scan from its power-up FALSE.
        var builder = new TestModelBuilder();
        builder.BoolInput("UNUSED");
        var x = builder.Bool("X");
        builder.Assign(x, new NotExpression(builder.Prev(x)));
        Assert.Equal("1010", SimulationHarness.Run(builder.Build(), x, "0000"));
    }

    [Theory]
    [InlineData(true, "1110")]
    [InlineData(false, "0110")]
    public void Step_WhenSealInHasUnknownPowerUp_StartsFromTheGivenValue(bool powerUp, string expected)
    {
        // SEAL := (CLOSE OR SEAL) AND NOT STOP;  -- a seal-in loop: the latch without a de-energised state.
        var builder = new TestModelBuilder();
        var close = builder.BoolInput("CLOSE");
        var stop = builder.BoolInput("STOP");
        var seal = builder.Bool("SEAL");
        var previous = builder.Prev(seal, new UnknownPowerUp());
        builder.Assign(seal, new AndExpression([new OrExpression([builder.Now(close), previous]), new NotExpression(builder.Now(stop))]));
        var slot = builder.PreviousSlotOf(seal);
        Assert.Equal(expected, SimulationHarness.Run(builder.Build(), seal, new Dictionary<int, bool> { [slot] = powerUp }, "0100", "0001"));
    }
}
