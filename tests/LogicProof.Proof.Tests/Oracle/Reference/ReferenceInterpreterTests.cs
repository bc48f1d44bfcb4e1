using Fractions;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// The reference interpreter against the standard and the brief, scan by scan. Each scheme watches one signal Q
/// through <c>require WATCH: NOT Q</c>; the wave is Q at each scan ('1' TRUE), under one input wave per scan.
/// </summary>
public sealed class ReferenceInterpreterTests
{
    [Theory]
    // IEC 61131-3 ed.3 §6.6.3.5.4, TON: Q once IN has been TRUE for PT (3 scans of 1 ms), reset when IN falls.
    [InlineData("TON(IN, T#3ms)", "1111101111", "0001100001")]
    // IEC 61131-3 ed.3 §6.6.3.5.4, TOF: Q while IN, then PT longer; FALSE at power-up with IN FALSE.
    [InlineData("TOF(IN, T#2ms)", "0110001000", "0111101110")]
    // IEC 61131-3 ed.3 §6.6.3.5.4, TP: a PT-long pulse on a rising edge; an edge during the pulse does not retrigger it.
    [InlineData("TP(IN, T#3ms)", "1010101000", "1110111000")]
    // IEC 61131-3 ed.3 §6.6.3.5.4, TP: a pulse ends after PT even when IN stays TRUE, and a new one needs IN to fall first.
    [InlineData("TP(IN, T#2ms)", "1111011000", "1100011000")]
    // IEC 61131-3 ed.3 §6.6.3.5.3, R_TRIG: M starts FALSE, so an IN already TRUE at the first scan is an edge.
    [InlineData("R_TRIG(IN)", "1101", "1001")]
    // IEC 61131-3 ed.3 §6.6.3.5.3, F_TRIG: M starts FALSE, so an IN FALSE at the first scan gives Q TRUE there.
    [InlineData("F_TRIG(IN)", "0010", "1001")]
    // IEC 61131-3 ed.3 §6.6.3.5.2, SR is set dominant and RS reset dominant (set and reset both TRUE at scan 1).
    [InlineData("SR(S1 := IN, R := IN AND Q)", "1100", "1111")]
    [InlineData("RS(S := IN, R1 := IN AND Q)", "1100", "1000")]
    public void Step_WhenABlockRuns_FollowsTheStandardsTiming(string block, string input, string expected)
    {
        var source = Scheme($"Q := {block};");

        Assert.Equal(expected, Wave(source, input));
    }

    [Fact]
    public void Step_WhenAPresetIsNotAWholeNumberOfScans_RoundsItUp()
    {
        // Brief: a preset is converted to scans and rounded up. 3 ms at a 2 ms scan is 1.5 scans, used as 2.
        var source = Scheme("Q := TON(IN, T#3ms);", scan: "2 ms");

        Assert.Equal("00111", Wave(source, "11111"));
    }

    [Fact]
    public void Step_WhenANameIsReadBeforeItsEquation_GivesLastScansValue()
    {
        // Brief: equations run in the order written; a name read before its equation gives the previous scan's value.
        var source = Scheme("Q := LATER; LATER := IN;", extraLocal: "LATER");

        Assert.Equal("0101", Wave(source, "1010"));
    }

    [Theory]
    // Brief: HELD(x, d) has the timing of a TON with preset d; WITHIN(x, d) that of a TOF with preset d.
    [InlineData("HELD(IN, T#2ms)", "1110111", "0010001")]
    [InlineData("WITHIN(IN, T#2ms)", "0100000", "0111000")]
    [InlineData("ONCE(IN)", "0010", "0011")]
    [InlineData("HISTORICALLY(IN)", "1101", "1100")]
    [InlineData("ROSE(IN)", "1011", "1010")]
    [InlineData("FELL(IN)", "0110", "0001")]
    [InlineData("PREV(IN)", "1100", "0110")]
    [InlineData("(NOT IN SINCE FELL(IN))", "1001", "0110")]
    public void Step_WhenAFormulaUsesAPastTimeOperator_FollowsTheBrief(string formula, string input, string expected)
    {
        var source = Scheme("Q := IN;", requirement: $"NOT {formula}");

        Assert.Equal(expected, Wave(source, input));
    }

    [Fact]
    public void Step_WhenRealsAreCompared_UsesExactRationals()
    {
        // Brief: reals are exact rationals. 0.1 * 3 is exactly 0.3 (in binary floating point it is not).
        var source = """
            // Quillmere test bay, exact reals (invented)
            scheme REFERENCE_REALS;
            frequency 50 Hz;
            scan 1 ms;
            inputs X : real; end
            locals Q : bool; end
            logic Q := X * 3 = 0.3 AND ABS(-X) + MIN(X, 1) - MAX(X, 0) = 0.1; end
            require WATCH: NOT Q;
            """;
        var interpreter = new ReferenceInterpreter(ReferenceProgram.FromSource(source));
        var properties = new bool[1];
        var state = interpreter.PowerUpStates().Single();

        interpreter.Step(state, new ReferenceInputs([false], [new Fraction(1, 10)]), properties, out _);

        Assert.False(properties[0]);
    }

    [Fact]
    public void PowerUpStates_WhenASealInHasNoInit_GivesBothValues()
    {
        // Brief: a latch (here a seal-in loop) without init has an unknown power-up: every value must be explored.
        var source = Scheme("SEAL := (IN OR SEAL) AND NOT Q; Q := FALSE;", extraLocal: "SEAL");

        Assert.Equal(2, new ReferenceInterpreter(ReferenceProgram.FromSource(source)).PowerUpStates().Count());
    }

    private static string Wave(string source, string input)
    {
        var interpreter = new ReferenceInterpreter(ReferenceProgram.FromSource(source));
        var properties = new bool[interpreter.Properties.Count];
        var state = interpreter.PowerUpStates().First();
        var wave = new char[input.Length];
        for (var scan = 0; scan < input.Length; scan++)
        {
            interpreter.Step(state, new ReferenceInputs([input[scan] == '1'], [Fraction.Zero]), properties, out state);
            wave[scan] = properties[0] ? '0' : '1';
        }

        return new string(wave);
    }

    private static string Scheme(string logic, string? extraLocal = null, string scan = "1 ms", string requirement = "NOT Q") => $"""
        // Quillmere test bay, reference interpreter (invented)
        scheme REFERENCE_WAVE;
        frequency 50 Hz;
        scan {scan};
        inputs IN : bool; end
        locals Q : bool init FALSE;{(extraLocal is null ? string.Empty : $" {extraLocal} : bool;")} end
        logic {logic} end
        require WATCH: {requirement};
        """;
}
