using LogicProof.Model.Rules;
using LogicProof.Proof.Results;
using static LogicProof.Proof.Tests.Rules.RuleProofHarness;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// Every built-in rule proved on a correct scheme, and broken by a seeded fault with the counterexample checked
/// (the faults issue 4 names, and one more for each other rule). Counterexamples have been replayed in the simulator
/// by the portfolio before they reach these checks.
/// </summary>
public sealed class RuleVerdictTests
{
    public static TheoryData<string> RuleIds => [.. RuleCatalog.All.Select(r => r.Id)];

    [Theory]
    [MemberData(nameof(RuleIds))]
    public async Task Rule_WhenTheSchemeIsCorrect_IsProved(string id)
    {
        Assert.IsType<Proved>(await CheckAsync(RuleProofSchemes.Correct, id));
    }

    [Theory]
    [InlineData("trip-not-blocked")]
    [InlineData("lockout-trips")]
    [InlineData("low-gas-philosophy")]
    public async Task TripRule_WhenLowGasBlocksTheTripAsDeclared_IsProved(string id)
    {
        Assert.IsType<Proved>(await CheckAsync(RuleProofSchemes.BlockTrip, id));
    }

    [Fact]
    public async Task CloseBlockedInLockout_WhenTheLockoutContactIsRemoved_FailsWithCloseDuringLockout()
    {
        var faulty = Replace(Replace(RuleProofSchemes.Correct, " OR LOCKOUT OR LOW_GAS", " OR LOW_GAS"), " AND NOT LOCKOUT AND NOT TRIP_OUT", " AND NOT TRIP_OUT");

        var trace = await ViolationAsync(faulty, "close-blocked-in-lockout");

        Assert.True(AtFailure(trace, "LOCKOUT"));
        Assert.True(AtFailure(trace, "CLOSE_OUT"));
    }

    [Fact]
    public async Task LockoutResetOnly_WhenTheRemoteResetAlsoClearsTheLockout_FailsUnderLocalOnlyAndHoldsUnderLocalOrRemote()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "R := RESET_LOCAL)", "R := RESET_LOCAL OR RESET_REMOTE)");

        var trace = await ViolationAsync(faulty, "lockout-reset-only");
        var allowed = await CheckAsync(Replace(faulty, "lockout_reset_policy = local_only;", "lockout_reset_policy = local_or_remote;"), "lockout-reset-only");

        Assert.EndsWith("10", Wave(trace, "LOCKOUT"), StringComparison.Ordinal);
        Assert.True(AtFailure(trace, "RESET_REMOTE"));
        Assert.False(AtFailure(trace, "RESET_LOCAL"));
        Assert.IsType<Proved>(allowed);
    }

    [Fact]
    public async Task CloseStartsBreakerOpen_WhenTheBreakerStatusSenseIsInverted_FailsWithACloseIntoAClosedBreaker()
    {
        var faulty = Replace(
            Replace(RuleProofSchemes.Correct, "AND BRK_52B AND NOT BRK_52A AND NOT LOCKOUT", "AND BRK_52A AND NOT BRK_52B AND NOT LOCKOUT"),
            "AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL",
            "AND NOT BRK_52B AND NOT TRIP_OUT AND NOT CLOSE_FAIL");

        var trace = await ViolationAsync(faulty, "close-starts-breaker-open");

        Assert.EndsWith("01", Wave(trace, "CLOSE_OUT"), StringComparison.Ordinal);
        Assert.True(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "BRK_52B"));
    }

    [Fact]
    public async Task CloseStartsInSync_WhenTheSyncPermissiveIsBypassed_FailsWithACloseWithoutAnyPermissive()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "CLOSE_CMD AND (SYNC_OK OR DEAD_LINE_OK) AND", "CLOSE_CMD AND");

        var trace = await ViolationAsync(faulty, "close-starts-in-sync");

        Assert.EndsWith("01", Wave(trace, "CLOSE_OUT"), StringComparison.Ordinal);
        Assert.False(AtFailure(trace, "SYNC_OK"));
        Assert.False(AtFailure(trace, "DEAD_LINE_OK"));
    }

    [Fact]
    public async Task CloseStartsHealthy_WhenTheSpringCheckIsLeftOut_FailsWithACloseOnADischargedSpring()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "AND NOT LOW_GAS AND SPRING_OK", "AND NOT LOW_GAS");

        var trace = await ViolationAsync(faulty, "close-starts-healthy");

        Assert.EndsWith("01", Wave(trace, "CLOSE_OUT"), StringComparison.Ordinal);
        Assert.False(AtFailure(trace, "SPRING_OK"));
    }

    [Fact]
    public async Task CloseSealedIn_WhenTheSealInIsLost_FailsWhenAMomentaryCommandEnds()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "CLOSE_SEAL := (CLOSE_START OR CLOSE_SEAL)", "CLOSE_SEAL := CLOSE_START");

        var trace = await ViolationAsync(faulty, "close-sealed-in");

        Assert.EndsWith("10", Wave(trace, "CLOSE_OUT"), StringComparison.Ordinal);
        Assert.False(AtFailure(trace, "CLOSE_CMD"));
        Assert.False(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "TRIP_OUT"));
    }

    [Fact]
    public async Task CloseNotHeldOn_WhenTheCoilDropsOneScanLate_FailsAfterFourScansOfCloseOutput()
    {
        // 8 ms is 4 scans: an output that drops only when last scan's close-fail timer is seen stays on a fifth scan.
        var faulty = Replace(RuleProofSchemes.Correct, "CLOSE_OUT := CLOSE_SEAL AND NOT CLOSE_FAIL;", "CLOSE_OUT := CLOSE_SEAL;");

        var trace = await ViolationAsync(faulty, "close-not-held-on");

        Assert.EndsWith("011111", Wave(trace, "CLOSE_OUT"), StringComparison.Ordinal);
    }

    [Fact]
    public async Task NoPumping_WhenTheAntiPumpResetsOnTheWrongSignal_FailsWithASecondCloseOnAStandingCommand()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT) AND CLOSE_CMD;", "ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT) AND NOT BRK_52B;");

        var trace = await ViolationAsync(faulty, "no-pumping");

        var close = Wave(trace, "CLOSE_OUT");
        var command = Wave(trace, "CLOSE_CMD");
        var firstClose = close.IndexOf('1', StringComparison.Ordinal);
        Assert.EndsWith("01", close, StringComparison.Ordinal);
        Assert.True(firstClose < close.Length - 1, close);
        Assert.DoesNotContain('0', command[firstClose..]);
    }

    [Fact]
    public async Task TripNotBlocked_WhenTheTripIsSupervisedByAClosePermissive_FailsWithATripCommandThatDoesNotTrip()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "TRIP_OUT := TRIP_REQ;", "TRIP_OUT := TRIP_REQ AND SPRING_OK;");

        var trace = await ViolationAsync(faulty, "trip-not-blocked");

        Assert.True(AtFailure(trace, "PROT_TRIP") || AtFailure(trace, "PROT_TRIP_86") || AtFailure(trace, "CS_TRIP"));
        Assert.True(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "SPRING_OK"));
        Assert.False(AtFailure(trace, "TRIP_OUT"));
    }

    [Fact]
    public async Task TripWins_WhenTheSealIgnoresTheTrip_FailsWithBothCoilsOn()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL", "AND NOT BRK_52A AND NOT CLOSE_FAIL");

        var trace = await ViolationAsync(faulty, "trip-wins");

        Assert.True(AtFailure(trace, "CLOSE_OUT"));
        Assert.True(AtFailure(trace, "TRIP_OUT"));
    }

    [Fact]
    public async Task LockoutTrips_WhenTheLockoutIsNotInTheTripPath_FailsWithALockedOutClosedBreaker()
    {
        var faulty = Replace(RuleProofSchemes.Correct, " OR LOCKOUT OR LOW_GAS", " OR LOW_GAS");

        var trace = await ViolationAsync(faulty, "lockout-trips");

        Assert.True(AtFailure(trace, "LOCKOUT"));
        Assert.True(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "TRIP_OUT"));
    }

    [Fact]
    public async Task TripCircuitSupervised_WhenTheAlarmDelayIsLongerThanStated_FailsAfterTheStatedTime()
    {
        // Stated 6 ms (3 scans): the rule looks at the fourth scan of lost continuity; an 8 ms delay alarms at the fifth.
        var faulty = Replace(RuleProofSchemes.Correct, "TON(NOT TCS_OK, T#4ms)", "TON(NOT TCS_OK, T#8ms)");

        var trace = await ViolationAsync(faulty, "trip-circuit-supervised");

        Assert.EndsWith("0000", Wave(trace, "TCS_OK"), StringComparison.Ordinal);
        Assert.EndsWith("1111", Wave(trace, "BRK_52A"), StringComparison.Ordinal);
        Assert.False(AtFailure(trace, "TCS_ALARM"));
    }

    [Fact]
    public async Task LowGasPhilosophy_WhenLowGasDoesNotTripUnderTheTripPolicy_Fails()
    {
        var faulty = Replace(RuleProofSchemes.Correct, " OR LOCKOUT OR LOW_GAS;", " OR LOCKOUT;");

        var trace = await ViolationAsync(faulty, "low-gas-philosophy");

        Assert.True(AtFailure(trace, "LOW_GAS"));
        Assert.True(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "TRIP_OUT"));
    }

    [Fact]
    public async Task LowGasPhilosophy_WhenLowGasDoesNotBlockUnderTheBlockTripPolicy_Fails()
    {
        var faulty = Replace(RuleProofSchemes.BlockTrip, "TRIP_OUT := TRIP_REQ AND NOT LOW_GAS;", "TRIP_OUT := TRIP_REQ;");

        var trace = await ViolationAsync(faulty, "low-gas-philosophy");

        Assert.True(AtFailure(trace, "LOW_GAS"));
        Assert.True(AtFailure(trace, "TRIP_OUT"));
    }
}
