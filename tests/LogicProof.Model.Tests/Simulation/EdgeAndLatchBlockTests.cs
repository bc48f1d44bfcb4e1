using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>
/// R_TRIG, F_TRIG, SR and RS against IEC 61131-3 ed.2 §2.5.2.3.1 (bistables) and §2.5.2.3.2 (edge detection).
/// Waveforms: one character per scan, '1' TRUE and '0' FALSE.
/// </summary>
public sealed class EdgeAndLatchBlockTests
{
    [Fact]
    public void RisingEdge_WhenClockTrueAtFirstScan_OutputTrueAtFirstScan()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.2, R_TRIG body: Q := CLK AND NOT M; M := CLK; M initially FALSE.
        Assert.Equal("1000100", RunEdge(EdgeKind.Rising, "1100110"));
    }

    [Fact]
    public void FallingEdge_WhenClockFalseAtFirstScan_OutputTrueAtFirstScan()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.2, F_TRIG body: Q := NOT CLK AND NOT M; M := NOT CLK; M initially FALSE.
        // So Q is TRUE at the first scan when CLK is FALSE there, although CLK never fell.
        Assert.Equal("1000100", RunEdge(EdgeKind.Falling, "0011001"));
    }

    [Fact]
    public void FallingEdge_WhenClockTrueAtFirstScan_OutputOnlyAtTheFall()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.2, F_TRIG body as above.
        Assert.Equal("0010", RunEdge(EdgeKind.Falling, "1100"));
    }

    [Fact]
    public void SetDominant_WhenSetAndResetBothTrue_OutputTrue()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.1, SR bistable: Q1 := S1 OR (NOT R AND Q1), set dominant.
        Assert.Equal("1100111", RunLatch(LatchKind.SetDominant, "1000100", "0010100", powerUp: false));
    }

    [Fact]
    public void ResetDominant_WhenSetAndResetBothTrue_OutputFalse()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.1, RS bistable: Q1 := NOT R1 AND (S OR Q1), reset dominant.
        Assert.Equal("1100000", RunLatch(LatchKind.ResetDominant, "1000100", "0010100", powerUp: false));
    }

    [Theory]
    [InlineData(LatchKind.SetDominant, true, "1110")]
    [InlineData(LatchKind.SetDominant, false, "0000")]
    [InlineData(LatchKind.ResetDominant, true, "1110")]
    [InlineData(LatchKind.ResetDominant, false, "0000")]
    public void Latch_WhenNoSetOrReset_HoldsItsPowerUpValue(LatchKind kind, bool powerUp, string expected)
    {
        // IEC 61131-3 ed.2 §2.5.2.3.1: with S and R FALSE both bistables keep Q1; reset at the last scan.
        Assert.Equal(expected, RunLatch(kind, "0000", "0001", powerUp));
    }

    private static string RunEdge(EdgeKind kind, string clock)
    {
        var builder = new TestModelBuilder();
        var clk = builder.BoolInput("CLK");
        var q = builder.Bool("Q");
        builder.Edge(kind, q, builder.Now(clk));
        return SimulationHarness.Run(builder.Build(), q, clock);
    }

    private static string RunLatch(LatchKind kind, string set, string reset, bool powerUp)
    {
        var builder = new TestModelBuilder();
        var s = builder.BoolInput("S");
        var r = builder.BoolInput("R");
        var q = builder.Bool("Q1");
        var slot = builder.Latch(kind, q, builder.Now(s), builder.Now(r));
        return SimulationHarness.Run(builder.Build(), q, new Dictionary<int, bool> { [slot] = powerUp }, set, reset);
    }
}
