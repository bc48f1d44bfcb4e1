using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Encoding;

public sealed class TimeAccelerationTests
{
    [Theory]
    [InlineData(CounterEncoding.BitVector)]
    [InlineData(CounterEncoding.Integer)]
    public void EncodeStep_WhenStrideIsAllowed_EqualsThatManyHeldScansInTheSimulator(CounterEncoding counters)
    {
        var model = SchemeLoader.Load(Schemes.EveryBlockWithPresets("T#20ms", "T#30ms", "T#16ms"));
        var simulator = ScanSimulator.Compile(model);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, counters);
        var random = new Random(7);
        var accelerated = 0;
        for (var sample = 0; sample < 200; sample++)
        {
            var (state, inputs) = SettledPoint(model, simulator, random);
            var start = ConcreteScan.ToTerms(encoder, state);
            var held = ConcreteScan.ToTerms(encoder, inputs);
            for (var stride = 1; stride <= encoder.LargestStride + 1; stride++)
            {
                var step = encoder.EncodeStep(start, held, encoder.CounterConstant(stride));
                if (ConcreteScan.Value(step.Allowed) != "TRUE")
                {
                    Assert.NotEqual(1, stride);
                    continue;
                }

                accelerated += stride > 1 ? 1 : 0;
                var simulated = state.Clone();
                var values = simulator.CreateValues();
                for (var scan = 0; scan < stride; scan++)
                {
                    simulator.Step(simulated, inputs, values);
                    foreach (var cell in model.Cells)
                    {
                        Assert.Equal(ConcreteScan.CellValue(model, values, cell.Index), ConcreteScan.Value(step.Scan.Cell(cell.Index)));
                    }
                }

                foreach (var slot in model.StateSlots)
                {
                    Assert.Equal(ConcreteScan.SlotValue(model, simulated, slot.Index), ConcreteScan.Value(step.Next[slot.Index]));
                }
            }
        }

        Assert.True(accelerated >= 20, $"only {accelerated} accelerated steps were exercised");
    }

    [Fact]
    public void EncodeStep_WhenOnDelayCountsFromZero_AllowsStridesUpToThePresetOnly()
    {
        var model = SchemeLoader.Load(Schemes.DeepTimer);
        var simulator = ScanSimulator.Compile(model);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, CounterEncoding.BitVector);
        var inputs = simulator.CreateInputs();
        inputs.SetBool(SchemeLoader.Cell(model, "GAS_LOW"), true);
        var start = ConcreteScan.ToTerms(encoder, simulator.PowerUpState(null));
        var held = ConcreteScan.ToTerms(encoder, inputs);

        // 10 s at 2 ms per scan is 5,000 scans (the preset rounds to a whole number of scans).
        Assert.Equal(5000, encoder.LargestStride);
        Assert.Equal("TRUE", ConcreteScan.Value(encoder.EncodeStep(start, held, encoder.CounterConstant(5000)).Allowed));
        Assert.Equal("FALSE", ConcreteScan.Value(encoder.EncodeStep(start, held, encoder.CounterConstant(5001)).Allowed));
        var counter = model.StateSlots.Single(s => s.Kind == StateSlotKind.TimerCounter).Index;
        Assert.Equal("5000", ConcreteScan.Value(encoder.EncodeStep(start, held, encoder.CounterConstant(5000)).Next[counter]));
    }

    [Fact]
    public void EncodeStep_WhenANonCounterMemoryChanges_AllowsOneScanOnly()
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);
        var simulator = ScanSimulator.Compile(model);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, CounterEncoding.BitVector);
        var state = simulator.PowerUpStateDefaultingUnknownToFalse(null).State;
        var inputs = simulator.CreateInputs();

        // At power-up with CMD TRUE the R_TRIG memory moves from FALSE to TRUE: not a fixpoint.
        inputs.SetBool(SchemeLoader.Cell(model, "CMD"), true);
        var step = encoder.EncodeStep(ConcreteScan.ToTerms(encoder, state), ConcreteScan.ToTerms(encoder, inputs), encoder.CounterConstant(2));

        Assert.Equal("FALSE", ConcreteScan.Value(step.Allowed));
    }

    /// <summary>A state reached by random inputs that then stay the same for a few scans, and those inputs.</summary>
    private static (ScanState State, ScanInputs Inputs) SettledPoint(ScanModel model, ScanSimulator simulator, Random random)
    {
        var state = simulator.CreateState();
        ConcreteScan.Randomize(model, state, random);
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var scans = random.Next(0, 12);
        for (var scan = 0; scan < scans; scan++)
        {
            if (scan == 0 || random.Next(3) == 0)
            {
                ConcreteScan.Randomize(model, inputs, random);
            }

            simulator.Step(state, inputs, values);
        }

        // Holding the last inputs for a scan or two settles most memories, so strides above 1 become possible.
        for (var hold = random.Next(0, 3); hold > 0; hold--)
        {
            simulator.Step(state, inputs, values);
        }

        return (state, inputs);
    }
}
