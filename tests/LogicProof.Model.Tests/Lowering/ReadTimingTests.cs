using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Lowering;

public sealed class ReadTimingTests
{
    private const string Declarations = Header + """
        inputs CMD : bool; end
        locals PERMIT : bool; end
        outputs CLOSE : bool; end

        """;

    [Fact]
    public void Build_WhenWriterComesFirst_ReadsTheValueOfThisScan()
    {
        var model = BuildModel(Declarations + "logic PERMIT := CMD; CLOSE := PERMIT; end\n");

        var read = Assert.IsType<CellReadExpression>(Assert.IsType<AssignStep>(model.WriterOf("CLOSE")).Value);
        Assert.Equal((model.CellNamed("PERMIT").Index, ReadTiming.Current), (read.Cell, read.Timing));
        Assert.False(model.HasPreviousSlot("PERMIT"));
    }

    [Fact]
    public void Build_WhenWriterComesLater_ReadsLastScansValueFromAFalseSlot()
    {
        var model = BuildModel(Declarations + "logic CLOSE := PERMIT; PERMIT := CMD; end\n");

        var read = Assert.IsType<CellReadExpression>(Assert.IsType<AssignStep>(model.WriterOf("CLOSE")).Value);
        Assert.Equal((model.CellNamed("PERMIT").Index, ReadTiming.Previous), (read.Cell, read.Timing));
        var slot = model.PreviousSlotOf("PERMIT");
        Assert.Equal(new KnownBoolPowerUp(false), slot.PowerUp);
        Assert.Equal(SignalType.Bool, slot.Type);
    }

    [Fact]
    public void Build_WhenInputIsRead_AlwaysReadsThisScan()
    {
        var model = BuildModel(Declarations + "logic CLOSE := CMD AND PERMIT; PERMIT := CMD; end\n");

        var reads = ReadsOf(model.WriterOf("CLOSE"));
        Assert.Equal(
            [(model.CellNamed("CMD").Index, ReadTiming.Current), (model.CellNamed("PERMIT").Index, ReadTiming.Previous)],
            reads.Select(r => (r.Cell, r.Timing)));
    }

    [Fact]
    public void Build_WhenEquationReadsItsOwnTarget_ReadsLastScan()
    {
        var model = BuildModel(Declarations + "logic PERMIT := CMD; CLOSE := PERMIT OR CLOSE; end\n");

        var reads = ReadsOf(model.WriterOf("CLOSE"));
        Assert.Equal(ReadTiming.Previous, reads.Single(r => r.Cell == model.CellNamed("CLOSE").Index).Timing);
    }

    [Fact]
    public void Build_WhenFunctionBlockInputIsWrittenLater_ReadsLastScan()
    {
        var model = BuildModel(Declarations + "logic CLOSE := TON(PERMIT, T#10ms); PERMIT := CMD; end\n");

        var timer = Assert.IsType<TimerStep>(model.WriterOf("CLOSE"));
        var read = Assert.IsType<CellReadExpression>(timer.Input);
        Assert.Equal(ReadTiming.Previous, read.Timing);
    }

    [Fact]
    public void Build_WhenNoEquationWritesAVariable_HoldsItsPowerUpWithAHoldStepReadAtTheLastScan()
    {
        var model = BuildModel(Header + """
            inputs CMD : bool; end
            locals BLOCKED : bool init TRUE; SPARE : real; end
            outputs CLOSE : bool; end
            logic CLOSE := CMD AND NOT BLOCKED; end
            """);

        var hold = Assert.IsType<AssignStep>(model.WriterOf("BLOCKED"));
        var self = Assert.IsType<CellReadExpression>(hold.Value);
        Assert.Equal((model.CellNamed("BLOCKED").Index, ReadTiming.Previous), (self.Cell, self.Timing));
        Assert.Equal(new KnownBoolPowerUp(true), model.PreviousSlotOf("BLOCKED").PowerUp);
        Assert.Equal(new KnownRealPowerUp(Fractions.Fraction.Zero), model.PreviousSlotOf("SPARE").PowerUp);
        Assert.Equal(ReadTiming.Previous, ReadsOf(model.WriterOf("CLOSE")).Single(r => r.Cell == self.Cell).Timing);

        // Hold steps come first, before the equations.
        Assert.True(model.WriterOfCell[self.Cell] < model.WriterOfCell[model.CellNamed("CLOSE").Index]);
    }

    [Fact]
    public void Build_WhenFormulaReadsAnyName_ReadsThisScan()
    {
        var model = BuildModel(Declarations + "logic CLOSE := PERMIT; PERMIT := CMD; end\nrequire R: CLOSE -> PERMIT;\n");

        var reads = ReadsOf(model.WriterOf("R"));
        Assert.All(reads, r => Assert.Equal(ReadTiming.Current, r.Timing));
    }
}
