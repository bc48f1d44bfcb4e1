using LogicProof.Model.Graph;
using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Graph;

public sealed class ConeSlicerTests
{
    private const string Bay = DependencyGraphTests.Bay + """

        assume NOT (CMD AND TRIP);
        assume GAS: NOT GAS_LOW OR NOT SPARE;
        assume FALSE_START: ONCE(TRUE);
        require CLOSE_ENDS: NOT HELD(CLOSE, T#600ms);
        require ALARM_OK: ALARM -> GAS_LOW;
        """;

    [Fact]
    public void Slice_WhenRootIsTheCloseOutput_KeepsExactlyItsConeInOriginalOrder()
    {
        var model = BuildModel(DependencyGraphTests.Bay);

        var sliced = ConeSlicer.Slice(model, [model.CellNamed("CLOSE").Index]);

        Assert.Equal(
            ["CMD", "CLOSED", "TRIP", "PERMIT", "SEAL", "FAIL", "CLOSE", "TRIP_OUT", "SEAL.R_TRIG#1"],
            sliced.Cells.Select(c => c.Name));
        Assert.Equal([0, 1, 2], sliced.Inputs);
        Assert.Equal(sliced.Cells.Select(c => model.CellNamed(c.Name).Index), sliced.OriginalCells!);
        Assert.Equal(Enumerable.Range(0, sliced.Cells.Count), sliced.Cells.Select(c => c.Index));
    }

    [Fact]
    public void Slice_Always_KeepsTheWritingStepsInOrderWithTheirSlotsReindexed()
    {
        var model = BuildModel(DependencyGraphTests.Bay);

        var sliced = ConeSlicer.Slice(model, [model.CellNamed("CLOSE").Index]);

        Assert.Equal(
            ["PERMIT", "SEAL.R_TRIG#1", "SEAL", "CLOSE", "FAIL", "TRIP_OUT"],
            sliced.Steps.Select(s => sliced.Cells[s.Target].Name));
        Assert.Equal(sliced.Steps.Count, sliced.EquationStepCount);
        Assert.Equal(
            new[] { "SEAL.R_TRIG#1@edge", "TRIP_OUT@last", "SEAL@last", "FAIL@last", "FAIL@timer" }.Order(),
            sliced.StateSlots.Select(s => s.Name).Order());
        Assert.Equal(Enumerable.Range(0, sliced.StateSlots.Count), sliced.StateSlots.Select(s => s.Index));
        foreach (var slot in sliced.StateSlots)
        {
            var original = model.StateSlots.Single(s => s.Name == slot.Name);
            Assert.Equal(model.Cells[original.Cell].Name, sliced.Cells[slot.Cell].Name);
            Assert.Equal(original.PowerUp, slot.PowerUp);
        }

        var edge = sliced.Steps.OfType<EdgeStep>().Single();
        Assert.Equal("SEAL.R_TRIG#1@edge", sliced.StateSlots[edge.StateSlot].Name);
    }

    [Fact]
    public void Slice_WhenRootIsAProperty_KeepsThatPropertyAndOnlyAssumptionsSharingItsCone()
    {
        var model = BuildModel(Bay);
        var property = model.Properties.Single(p => p.Name == "CLOSE_ENDS");

        var sliced = ConeSlicer.Slice(model, [property.Cell]);

        Assert.Equal(["CLOSE_ENDS"], sliced.Properties.Select(p => p.Name));
        Assert.Equal("CLOSE_ENDS", sliced.Cells[sliced.Properties[0].Cell].Name);

        // CMD AND TRIP shares CMD; the GAS assumption reads only GAS_LOW and SPARE (dropped); ONCE(TRUE) reads no
        // input at all, so it constrains every trace and stays.
        Assert.Equal([null, "FALSE_START"], sliced.Assumptions.Select(a => a.Name));
        Assert.DoesNotContain(sliced.Cells, c => c.Name is "GAS_LOW" or "SPARE" or "ALARM");
        Assert.Contains(sliced.Cells, c => c.Name == "CLOSE_ENDS.HELD#1");
    }

    [Fact]
    public void Slice_WhenAssumptionIsKept_BringsInItsWholeCone()
    {
        var model = BuildModel(Bay);
        var property = model.Properties.Single(p => p.Name == "ALARM_OK");

        var sliced = ConeSlicer.Slice(model, [property.Cell]);

        Assert.Equal(["GAS"], sliced.Assumptions.Where(a => a.Name is not null).Select(a => a.Name).Where(n => n == "GAS"));
        Assert.Contains(sliced.Cells, c => c.Name == "SPARE");
        Assert.DoesNotContain(sliced.Cells, c => c.Name == "CLOSE");
    }

    [Fact]
    public void Slice_WhenSlicedAgain_MapsCellsBackToTheFirstModel()
    {
        var model = BuildModel(DependencyGraphTests.Bay);
        var once = ConeSlicer.Slice(model, [model.CellNamed("CLOSE").Index]);

        var twice = ConeSlicer.Slice(once, [once.CellNamed("PERMIT").Index]);

        Assert.Equal(["CLOSED", "TRIP", "PERMIT", "TRIP_OUT"], twice.Cells.Select(c => c.Name));
        Assert.Equal(twice.Cells.Select(c => model.CellNamed(c.Name).Index), twice.OriginalCells!);
    }

    [Fact]
    public void Slice_WhenTimerIsRoundedAndKept_KeepsItsRoundingOnly()
    {
        var model = BuildModel(Header + """
            inputs A : bool; B : bool; end
            outputs X : bool; Y : bool; end
            logic X := TON(A, T#25ms); Y := TON(B, T#15ms); end
            """);

        var sliced = ConeSlicer.Slice(model, [model.CellNamed("Y").Index]);

        Assert.Equal(2, model.Roundings.Count);
        Assert.Equal(["T#15ms"], sliced.Roundings.Select(r => r.Text));
    }

    [Fact]
    public void Slice_WhenRootIsNotACell_Throws()
    {
        var model = BuildModel(Bay);

        Assert.Throws<ArgumentOutOfRangeException>(() => ConeSlicer.Slice(model, [model.Cells.Count]));
    }
}
