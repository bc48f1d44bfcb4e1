using LogicProof.Model.Rules;
using LogicProof.Model.Tests.Simulation;

namespace LogicProof.Model.Tests.Rules;

/// <summary>
/// The rule formulas on small hand-made traces in the simulator: the close output and the commands are driven
/// directly, so each waveform (one character per 2 ms scan) shows exactly when a rule holds ('1') or fails ('0').
/// </summary>
public sealed class RuleFormulaTraceTests
{
    // The no-pumping form first suggested for the rule, checked beside the catalog's form.
    private const string PumpingScheme = RuleHarness.Header + """
        inputs CO_IN : bool; CMD : bool; end
        outputs CO : bool; end
        logic CO := CO_IN; end
        require SUGGESTED: ROSE(CO) AND PREV(ONCE(CO)) -> PREV((NOT ROSE(CO)) SINCE (NOT CMD));
        roles close_output = CO; close_command = CMD; end
        """;

    private const string SealScheme = RuleHarness.Header + """
        inputs CO_IN : bool; B52A : bool; TRIP_IN : bool; end
        outputs CO : bool; TRIP : bool; end
        logic CO := CO_IN; TRIP := TRIP_IN; end
        roles close_output = CO; close_fail_time = T#8ms; breaker_closed = B52A; trip_output = TRIP; end
        """;

    [Theory]
    // A standing command: the second close is pumping; both forms see it at scan 7.
    [InlineData("1111111111", "0111000110", "1111111011", "1111111011")]
    // The command is released (scans 4 and 5) between the closes: no pumping for either form.
    [InlineData("1111001111", "0110000110", "1111111111", "1111111111")]
    // A momentary command, and later a new one: no pumping.
    [InlineData("0100000100", "0111000111", "1111111111", "1111111111")]
    // The command is released at scan 2 and pressed again at scan 3 while the first close is still on, then held:
    // a 94 seal picks up again and blocks the second close. The suggested form misses it.
    [InlineData("0101111111", "0111110011", "1111111101", "1111111111")]
    // The command arrives the scan after the close started (by a close source not bound as a role) and is held:
    // the suggested form misses this too.
    [InlineData("0011111111", "0111000110", "1111111011", "1111111111")]
    public void NoPumping_WhenSimulatedOnSmallTraces_FailsExactlyAtASecondCloseOnAStandingCommand(
        string command, string closeOutput, string rule, string suggested)
    {
        var model = RuleHarness.Model(PumpingScheme, new RuleSelection(["no-pumping"], []));

        var waves = SimulationHarness.Run(model, new Dictionary<string, string> { ["CMD"] = command, ["CO_IN"] = closeOutput }, "no-pumping", "SUGGESTED");

        Assert.Equal(rule, waves["no-pumping"]);
        Assert.Equal(suggested, waves["SUGGESTED"]);
    }

    [Theory]
    // On for exactly the close-fail time (4 scans of 2 ms = 8 ms), then off: both rules hold.
    [InlineData("0111100", "0000000", "0000000", "1111111", "1111111")]
    // On one scan longer: the coil is held on too long at scan 5; the seal-in rule has nothing to object to.
    [InlineData("01111100", "00000000", "00000000", "11111111", "11111011")]
    // Off after 3 scans with no reason: the seal was lost at scan 4.
    [InlineData("0111000", "0000000", "0000000", "1111011", "1111111")]
    // Off after 2 scans because 52a reports closed, or because the trip output is on: legitimate ends.
    [InlineData("011000", "000100", "000000", "111111", "111111")]
    [InlineData("011000", "000000", "000100", "111111", "111111")]
    public void SealedInAndNotHeldOn_WhenSimulated_AcceptExactlyTheCloseFailTime(
        string closeOutput, string breakerClosed, string trip, string sealedIn, string notHeldOn)
    {
        var model = RuleHarness.Model(SealScheme, new RuleSelection(["close-sealed-in", "close-not-held-on"], []));

        var waves = SimulationHarness.Run(
            model,
            new Dictionary<string, string> { ["CO_IN"] = closeOutput, ["B52A"] = breakerClosed, ["TRIP_IN"] = trip },
            "close-sealed-in",
            "close-not-held-on");

        Assert.Equal(sealedIn, waves["close-sealed-in"]);
        Assert.Equal(notHeldOn, waves["close-not-held-on"]);
    }
}
