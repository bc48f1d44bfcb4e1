using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;
using LogicProof.Proof.Tracing;

namespace LogicProof.Proof.Tests.Tracing;

public sealed class JustificationBuilderTests
{
    private const string Scheme = """
        // Quillmere 115 kV substation, breaker QM-7, close permissive that forgot the lockout (fictional)
        scheme QM7_FORGOT;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CLOSE_CMD : bool;
          SYNC_OK   : bool;
          DEAD_LINE : bool;
          LOCKOUT   : bool;
        end
        outputs
          CLOSE_OUT : bool;
        end
        logic
          CLOSE_OUT := CLOSE_CMD AND (SYNC_OK OR DEAD_LINE);
        end
        require NO_CLOSE_IN_LOCKOUT: LOCKOUT -> NOT CLOSE_OUT;
        """;

    [Fact]
    public void Build_WhenCloseEnergisesInLockout_NamesTheTrueTermsOfTheAndAndOnlyTheTrueOnesOfTheOr()
    {
        var model = SchemeLoader.Load(Scheme);
        var steps = Simulate(model, new() { ["CLOSE_CMD"] = true, ["SYNC_OK"] = false, ["DEAD_LINE"] = true, ["LOCKOUT"] = true });
        var property = SchemeLoader.Property(model, "NO_CLOSE_IN_LOCKOUT");

        var root = new JustificationBuilder(model, steps).Build(property.Cell, 0).Root;

        Assert.Equal(TraceValue.Of(false), root.Value);
        Assert.Equal(["LOCKOUT", "CLOSE_OUT"], root.Terms.Select(t => t.Text));
        var closeOut = root.Causes.Single(c => c.Cell == "CLOSE_OUT");
        Assert.Equal(["CLOSE_CMD", "DEAD_LINE"], closeOut.Terms.Select(t => t.Text));
        Assert.All(closeOut.Terms, t => Assert.Equal(TraceValue.Of(true), t.Value));
        Assert.Equal((15, 3), (closeOut.Equation.Line, closeOut.Equation.Column));
        Assert.All(closeOut.Causes, c => Assert.Equal("input", c.Note));
    }

    [Fact]
    public void Build_WhenAndIsFalse_NamesOnlyItsFalseOperands()
    {
        var model = SchemeLoader.Load(Scheme.Replace("LOCKOUT -> NOT CLOSE_OUT", "CLOSE_OUT", StringComparison.Ordinal));
        var steps = Simulate(model, new() { ["CLOSE_CMD"] = true, ["SYNC_OK"] = false, ["DEAD_LINE"] = false, ["LOCKOUT"] = false });
        var property = SchemeLoader.Property(model, "NO_CLOSE_IN_LOCKOUT");

        var root = new JustificationBuilder(model, steps).Build(property.Cell, 0).Root;

        var closeOut = Assert.Single(root.Causes);
        Assert.Equal(["SYNC_OK", "DEAD_LINE"], closeOut.Terms.Select(t => t.Text));
    }

    /// <summary>One scan of the simulator with the given inputs, as a trace row.</summary>
    private static List<TraceStep> Simulate(ScanModel model, Dictionary<string, bool> inputValues)
    {
        var simulator = ScanSimulator.Compile(model);
        var state = simulator.PowerUpState(null);
        var memories = model.StateSlots.Select(s => new NamedValue(s.Index, s.Name, TraceValue.Of(state.GetBool(s.Index)))).ToList();
        var inputs = simulator.CreateInputs();
        foreach (var (name, value) in inputValues)
        {
            inputs.SetBool(SchemeLoader.Cell(model, name), value);
        }

        var values = simulator.CreateValues();
        simulator.Step(state, inputs, values);
        var named = model.Cells.Select(c => new NamedValue(c.Index, c.Name, TraceValue.Of(values.GetBool(c.Index)))).ToList();
        return [new TraceStep(0, 1, 0, [.. named.Where(n => model.Inputs.Contains(n.Index))], [.. named.Where(n => !model.Inputs.Contains(n.Index))], memories)];
    }
}
