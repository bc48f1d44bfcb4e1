using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Encoding;

public sealed class ScanEncoderTests
{
    private const int Samples = 300;

    [Theory]
    [InlineData(CounterEncoding.BitVector)]
    [InlineData(CounterEncoding.Integer)]
    public void EncodeScan_WhenEvaluatedOnRandomStatesAndInputs_AgreesWithSimulator(CounterEncoding counters)
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);
        var simulator = ScanSimulator.Compile(model);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, counters);
        var random = new Random(20240611);
        for (var sample = 0; sample < Samples; sample++)
        {
            var state = simulator.CreateState();
            var inputs = simulator.CreateInputs();
            ConcreteScan.Randomize(model, state, random);
            ConcreteScan.Randomize(model, inputs, random);
            var scan = encoder.EncodeScan(ConcreteScan.ToTerms(encoder, state), ConcreteScan.ToTerms(encoder, inputs));

            var values = simulator.CreateValues();
            simulator.Step(state, inputs, values);

            foreach (var cell in model.Cells)
            {
                Assert.Equal(ConcreteScan.CellValue(model, values, cell.Index), ConcreteScan.Value(scan.Cell(cell.Index)));
            }

            foreach (var slot in model.StateSlots)
            {
                Assert.Equal(ConcreteScan.SlotValue(model, state, slot.Index), ConcreteScan.Value(scan.Next[slot.Index]));
            }
        }
    }

    [Fact]
    public void InitialCondition_WhenLatchHasNoDeclaredPowerUp_LeavesItFreeAndFixesTheOthers()
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, CounterEncoding.BitVector);
        var state = encoder.NewState("s");
        using var solver = context.MkSolver();
        solver.Add(encoder.InitialCondition(state));
        foreach (var slot in model.StateSlots)
        {
            var canBeTrue = slot.Kind != StateSlotKind.TimerCounter && slot.Type == SignalType.Bool
                && solver.Check(context.MkEq(state[slot.Index], context.MkTrue())) == Microsoft.Z3.Status.SATISFIABLE;
            var canBeFalse = slot.Kind != StateSlotKind.TimerCounter && slot.Type == SignalType.Bool
                && solver.Check(context.MkEq(state[slot.Index], context.MkFalse())) == Microsoft.Z3.Status.SATISFIABLE;
            if (slot.PowerUp is UnknownPowerUp)
            {
                Assert.True(canBeTrue && canBeFalse, $"unknown power-up slot {slot.Name} must be free");
            }
            else if (slot.PowerUp is KnownBoolPowerUp known)
            {
                Assert.Equal(known.Value, canBeTrue);
                Assert.Equal(!known.Value, canBeFalse);
            }
        }

        Assert.Contains(model.StateSlots, s => s.PowerUp is UnknownPowerUp);
    }

    [Fact]
    public void InputRange_WhenRealInputOutsideDeclaredRange_IsUnsatisfiable()
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);
        using var context = Z3Contexts.Create();
        var encoder = new ScanEncoder(context, model, CounterEncoding.BitVector);
        var inputs = encoder.NewInputs("i");
        var busVoltage = (Microsoft.Z3.ArithExpr)inputs[SchemeLoader.Cell(model, "BUS_V")];
        using var solver = context.MkSolver();
        solver.Add(encoder.InputRange(inputs));

        Assert.Equal(Microsoft.Z3.Status.SATISFIABLE, solver.Check(context.MkEq(busVoltage, context.MkReal(3, 2))));
        Assert.Equal(Microsoft.Z3.Status.UNSATISFIABLE, solver.Check(context.MkGt(busVoltage, context.MkReal(3, 2))));
        Assert.Equal(Microsoft.Z3.Status.UNSATISFIABLE, solver.Check(context.MkLt(busVoltage, context.MkReal(0))));
    }
}
