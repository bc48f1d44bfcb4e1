using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>
/// TON, TOF and TP against IEC 61131-3 ed.2 §2.5.2.3.3 (timers, timing diagrams), with time counted in whole scans
/// as documented on <see cref="TimerStep"/>. Waveforms: one character per scan, '1' TRUE and '0' FALSE.
/// </summary>
public sealed class TimerBlockTests
{
    private const int PresetScans = 3;

    [Fact]
    public void OnDelay_WhenInputHeld_OutputRisesOnlyAfterPreset()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TON timing diagram: Q rises when ET reaches PT while IN stays TRUE, falls with IN.
        // IN rises at scan 1; three scan intervals later (scan 4) ET = PT and Q rises.
        Assert.Equal("0000111000", RunTimer(TimerKind.OnDelay, "0111111000"));
    }

    [Fact]
    public void OnDelay_WhenInputDropsBeforePreset_OutputStaysOffAndTimingRestarts()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TON timing diagram: IN FALSE resets ET to 0, so a short pulse never gives Q.
        Assert.Equal("000000010", RunTimer(TimerKind.OnDelay, "011011110"));
    }

    [Fact]
    public void OnDelay_WhenPresetIsZero_OutputFollowsInput()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3: with PT = 0 the condition ET >= PT holds at once.
        Assert.Equal("0110", RunTimer(TimerKind.OnDelay, "0110", presetScans: 0));
    }

    [Fact]
    public void OffDelay_WhenInputFalls_OutputHoldsOnForPreset()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TOF timing diagram: Q follows IN up, and stays TRUE until ET reaches PT after IN falls.
        Assert.Equal("1111110000", RunTimer(TimerKind.OffDelay, "1110000000"));
    }

    [Fact]
    public void OffDelay_WhenInputReturnsDuringHoldOn_HoldOnRestartsFromTheLastFall()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TOF timing diagram: IN TRUE resets ET, so the hold-on counts from the last fall.
        Assert.Equal("11111100", RunTimer(TimerKind.OffDelay, "10100000"));
    }

    [Fact]
    public void OffDelay_AtPowerUpWithInputFalse_OutputIsFalse()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3: a TOF that never saw IN TRUE has Q FALSE (the timer starts expired).
        Assert.Equal("0011", RunTimer(TimerKind.OffDelay, "0011"));
    }

    [Fact]
    public void Pulse_WhenInputShorterThanPreset_PulseLastsExactlyPreset()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TP timing diagram: Q is a pulse of duration PT from the rising edge of IN.
        Assert.Equal("0111000000", RunTimer(TimerKind.Pulse, "0110000000"));
    }

    [Fact]
    public void Pulse_WhenInputRisesAgainDuringPulse_PulseIsNotExtended()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TP timing diagram: a rising edge of IN during the pulse does not retrigger it.
        // A retriggerable pulse would last to scan 5 here; TP ends at scan 3.
        Assert.Equal("0111000000", RunTimer(TimerKind.Pulse, "0101000000"));
    }

    [Fact]
    public void Pulse_WhenInputHeldPastPulse_NewPulseNeedsInputFalseFirst()
    {
        // IEC 61131-3 ed.2 §2.5.2.3.3, TP timing diagram: after the pulse, ET holds at PT while IN stays TRUE;
        // only IN FALSE resets ET, so the next pulse starts at the next rising edge.
        Assert.Equal("01110001110", RunTimer(TimerKind.Pulse, "01111101100"));
    }

    [Fact]
    public void Pulse_WhenPresetIsZero_NeverPulses()
    {
        // Documented on TimerStep: TP with n = 0 stays idle (a pulse of zero length is no pulse).
        Assert.Equal("0000", RunTimer(TimerKind.Pulse, "0110", presetScans: 0));
    }

    private static string RunTimer(TimerKind kind, string input, int presetScans = PresetScans)
    {
        var builder = new TestModelBuilder();
        var inCell = builder.BoolInput("IN");
        var q = builder.Bool("Q", isOutput: true);
        builder.Timer(kind, q, builder.Now(inCell), presetScans);
        return SimulationHarness.Run(builder.Build(), q, input);
    }
}
