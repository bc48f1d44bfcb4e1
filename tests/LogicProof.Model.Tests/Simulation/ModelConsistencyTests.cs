using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

public sealed class ModelConsistencyTests
{
    [Fact]
    public void Compile_WhenCellReadInCurrentScanBeforeItsWriter_Throws()
    {
        var builder = new TestModelBuilder();
        builder.BoolInput("IN");
        var a = builder.Bool("A");
        var b = builder.Bool("B");
        builder.Assign(b, builder.Now(a));
        builder.Assign(a, new BoolConstantExpression(true));
        var error = Assert.Throws<ArgumentException>(() => ScanSimulator.Compile(builder.Build()));
        Assert.Contains("'A'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Compile_WhenPreviousReadHasNoSlot_Throws()
    {
        var builder = new TestModelBuilder();
        builder.BoolInput("IN");
        var a = builder.Bool("A");
        builder.Assign(a, new CellReadExpression(a, ReadTiming.Previous, SignalType.Bool));
        Assert.Throws<ArgumentException>(() => ScanSimulator.Compile(builder.Build()));
    }

    [Fact]
    public void Compile_WhenCellWrittenTwice_Throws()
    {
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var a = builder.Bool("A");
        builder.Assign(a, builder.Now(input));
        builder.Assign(a, builder.Now(input));
        Assert.Throws<ArgumentException>(() => ScanSimulator.Compile(builder.Build()));
    }

    [Fact]
    public void Compile_WhenTimerSlotDisagreesWithPreset_Throws()
    {
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var q = builder.Bool("Q");
        var slot = builder.AddRawSlot(new StateSlot(0, StateSlotKind.TimerCounter, "Q@timer", new KnownCounterPowerUp(0)) { Cell = q, CounterMax = 4 });
        builder.AddStep(new TimerStep(TimerKind.OnDelay, q, builder.Now(input), 5, slot, SourceSpan.None));
        Assert.Throws<ArgumentException>(() => ScanSimulator.Compile(builder.Build()));
    }

    [Fact]
    public void Compile_WhenAssignedValueHasWrongType_Throws()
    {
        var builder = new TestModelBuilder();
        builder.BoolInput("IN");
        var a = builder.Bool("A");
        builder.Assign(a, new RealConstantExpression(Fraction.One));
        Assert.Throws<ArgumentException>(() => ScanSimulator.Compile(builder.Build()));
    }

    [Fact]
    public void Compile_WhenManySteps_SplitsIntoSeveralChunksAndStillComputesInOrder()
    {
        // A chain X0 := IN; Xi := NOT X(i-1): long enough to be cut into several compiled chunks.
        var builder = new TestModelBuilder();
        var input = builder.BoolInput("IN");
        var previous = builder.Bool("X0");
        builder.Assign(previous, builder.Now(input));
        for (var i = 1; i <= 9000; i++)
        {
            var cell = builder.Bool("X" + i.ToString(System.Globalization.CultureInfo.InvariantCulture));
            builder.Assign(cell, new NotExpression(builder.Now(previous)));
            previous = cell;
        }

        var simulator = ScanSimulator.Compile(builder.Build());
        var inputs = simulator.CreateInputs();
        inputs.SetBool(input, true);
        var values = simulator.CreateValues();
        simulator.Step(simulator.PowerUpState(null), inputs, values);

        Assert.True(simulator.CompiledChunkCount > 1);
        Assert.True(values.GetBool(previous), "an even number of inversions of TRUE");
    }
}
