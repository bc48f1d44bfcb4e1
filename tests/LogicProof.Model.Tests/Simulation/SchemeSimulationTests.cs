using Fractions;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>The simulator on models lowered from <c>.lpl</c> source: the language's semantics end to end.</summary>
public sealed class SchemeSimulationTests
{
    private const string Header = """
        scheme QM7_TEST "Quillmere 115 kV substation, breaker QM-7 (invented)";
        frequency 60 Hz;
        scan 2 ms;
        """;

    [Fact]
    public void Simulate_WhenEquationsInWritingOrder_ReaderSeesSameScan()
    {
        var text = Header + """
            inputs IN : bool; end
            locals A : bool; end
            outputs B : bool; end
            logic
                A := IN;
                B := A;
            end
            """;
        Assert.Equal("0110", SchemeFixture.Run(text, "B", new Dictionary<string, string> { ["IN"] = "0110" }));
    }

    [Fact]
    public void Simulate_WhenReaderWrittenBeforeWriter_ReaderLagsOneScan()
    {
        // The same two equations in the other order: B reads A before A's equation, so A of the previous scan.
        var text = Header + """
            inputs IN : bool; end
            locals A : bool; end
            outputs B : bool; end
            logic
                B := A;
                A := IN;
            end
            """;
        Assert.Equal("0011", SchemeFixture.Run(text, "B", new Dictionary<string, string> { ["IN"] = "0110" }));
    }

    [Fact]
    public void Simulate_WhenTimerPresetInMilliseconds_CountsWholeScans()
    {
        // 6 ms at 2 ms scans = 3 scans: Q rises at the fourth consecutive scan with IN TRUE (IEC 61131-3 ed.2 §2.5.2.3.3).
        var text = Header + """
            inputs IN : bool; end
            outputs Q : bool; end
            logic
                Q := TON(IN := IN, PT := T#6ms);
            end
            """;
        Assert.Equal("00001100", SchemeFixture.Run(text, "Q", new Dictionary<string, string> { ["IN"] = "01111100" }));
    }

    [Fact]
    public void Simulate_WhenTimerPresetNotWholeScans_RoundsUp()
    {
        // 5 ms at 2 ms scans = 2.5 scans, rounded up to 3: same waveform as 6 ms.
        var text = Header + """
            inputs IN : bool; end
            outputs Q : bool; end
            logic
                Q := TON(IN := IN, PT := T#5ms);
            end
            """;
        Assert.Equal("00001100", SchemeFixture.Run(text, "Q", new Dictionary<string, string> { ["IN"] = "01111100" }));
    }

    [Fact]
    public void Simulate_WhenSealInClosesOnMomentaryCommand_HoldsUntilBreakerCloses()
    {
        var text = Header + """
            inputs CLOSE_CMD : bool; BRK_52A : bool; end
            outputs CLOSE_OUT : bool init FALSE; end
            logic
                CLOSE_OUT := (CLOSE_CMD OR CLOSE_OUT) AND NOT BRK_52A;
            end
            """;
        var waves = new Dictionary<string, string> { ["CLOSE_CMD"] = "0100000", ["BRK_52A"] = "0000110" };
        Assert.Equal("0111000", SchemeFixture.Run(text, "CLOSE_OUT", waves));
    }

    [Theory]
    [InlineData(false, "00011000")]
    [InlineData(true, "11111000")]
    public void Simulate_WhenLatchWithoutInit_StartsFromTheChosenValue(bool start, string expected)
    {
        // LOCKOUT := SR(S1 := TRIP, R := RESET) without init: unknown power-up, set at scan 3, reset at scan 5.
        var text = Header + """
            inputs TRIP : bool; RESET : bool; end
            outputs LOCKOUT : bool; end
            logic
                LOCKOUT := SR(S1 := TRIP, R := RESET);
            end
            """;
        var waves = new Dictionary<string, string> { ["TRIP"] = "00010000", ["RESET"] = "00000100" };
        Assert.Equal(expected, SchemeFixture.Run(text, "LOCKOUT", waves, start));
    }

    [Fact]
    public void Simulate_WhenRealsCompared_ExactDecimalsCompareEqual()
    {
        var text = Header + """
            inputs A : real range 0 .. 1; B : real range 0 .. 1; end
            outputs EQUAL : bool; end
            logic
                EQUAL := A + B = 0.3;
            end
            """;
        var simulator = SchemeFixture.Simulator(text);
        var model = simulator.Model;
        var inputs = simulator.CreateInputs();
        inputs.SetReal(model.Cell("A"), new Fraction(1, 10));
        inputs.SetReal(model.Cell("B"), new Fraction(2, 10));
        var values = simulator.CreateValues();
        simulator.Step(simulator.PowerUpState(null), inputs, values);
        Assert.True(values.GetBool(model.Cell("EQUAL")));
    }

    [Fact]
    public void Simulate_WhenRequirementBroken_PropertyCellIsFalseAtThatScan()
    {
        var text = Header + """
            inputs CLOSE_CMD : bool; LOCKOUT_86 : bool; end
            outputs CLOSE_OUT : bool; end
            logic
                CLOSE_OUT := CLOSE_CMD;
            end
            require NO_CLOSE_IN_LOCKOUT: NOT (CLOSE_OUT AND LOCKOUT_86);
            """;
        var simulator = SchemeFixture.Simulator(text);
        var model = simulator.Model;
        var property = model.Properties.Single(p => p.Name.Equals("NO_CLOSE_IN_LOCKOUT", StringComparison.OrdinalIgnoreCase));
        var start = simulator.PowerUpState(null);
        var sequence = new[] { (false, true), (true, false), (true, true) }.Select(pair =>
        {
            var scanInputs = simulator.CreateInputs();
            scanInputs.SetBool(model.Cell("CLOSE_CMD"), pair.Item1);
            scanInputs.SetBool(model.Cell("LOCKOUT_86"), pair.Item2);
            return scanInputs;
        });
        var replay = simulator.Replay(start, sequence);
        Assert.Equal([true, true, false], replay.Select(values => values.GetBool(property.Cell)));
    }

    [Fact]
    public void Simulate_WhenPastTimeOperatorsInRequirement_MonitorsFollowTheirDefinitions()
    {
        // FELL(x) = NOT x AND PREV(x); ONCE(x): x at some scan so far (documented on TemporalOperator).
        var text = Header + """
            inputs X : bool; end
            outputs Y : bool; end
            logic
                Y := X;
            end
            require NOT_FELL: NOT FELL(Y);
            require NEVER_ONCE: NOT ONCE(Y);
            """;
        var waves = new Dictionary<string, string> { ["X"] = "0110100" };
        var simulator = SchemeFixture.Simulator(text);
        var model = simulator.Model;
        var notFell = model.Properties.Single(p => p.Name.Equals("NOT_FELL", StringComparison.OrdinalIgnoreCase)).Cell;
        var neverOnce = model.Properties.Single(p => p.Name.Equals("NEVER_ONCE", StringComparison.OrdinalIgnoreCase)).Cell;
        var inputs = waves["X"].Select(c =>
        {
            var scan = simulator.CreateInputs();
            scan.SetBool(model.Cell("X"), c == '1');
            return scan;
        });
        var replay = simulator.Replay(simulator.PowerUpState(null), inputs);
        Assert.Equal("1110101", new string(replay.Select(v => v.GetBool(notFell) ? '1' : '0').ToArray()));
        Assert.Equal("1000000", new string(replay.Select(v => v.GetBool(neverOnce) ? '1' : '0').ToArray()));
    }
}
