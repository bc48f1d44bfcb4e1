using LogicProof.Proof.Results;
using static LogicProof.Proof.Tests.Rules.RequirementProofHarness;
using static LogicProof.Proof.Tests.Rules.RuleProofHarness;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// The failure options of the breaker model exercise paths a healthy breaker never takes: each seeded fault is
/// proved against the healthy breaker and caught, with a replayed trace, once the option is on; the correct scheme is
/// proved with the option on. Invented schemes of the Quillmere 115 kV substation, bay 8 (fictional), 2 ms scans.
/// </summary>
public sealed class BreakerFailureProofTests
{
    private const string Header = """
        // Quillmere 115 kV substation, bay 8, breaker QM-8 (fictional)
        scheme QM8_BREAKER;
        frequency 60 Hz;
        scan 2 ms;

        """;

    private static string Breaker(string options) =>
        $"breaker_model closing_time = T#4ms .. T#8ms; opening_time = T#2ms .. T#4ms; {options} end\n";

    /// <summary>A close seal-in that drops on 52a or a trip and, in the correct scheme, when the close-fail timer runs out.</summary>
    private static string CloseFailScheme(string failEnds, string options) => Header + $"""
        inputs CS_CLOSE : bool; PROT_TRIP : bool; BRK_52A : bool; BRK_52B : bool; end
        locals CLOSE_SEAL : bool init FALSE; CLOSE_FAIL : bool init FALSE; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; end
        logic
          TRIP_OUT := PROT_TRIP;
          CLOSE_SEAL := ((CS_CLOSE AND BRK_52B AND NOT BRK_52A) OR CLOSE_SEAL) AND NOT BRK_52A AND NOT TRIP_OUT{failEnds};
          CLOSE_FAIL := TON(IN := CLOSE_SEAL, PT := T#20ms);
          CLOSE_OUT := CLOSE_SEAL{failEnds};
        end
        {Breaker(options)}
        require COIL_PROTECTED: NOT HELD(CLOSE_OUT, T#30ms);
        roles close_output = CLOSE_OUT; close_command = CS_CLOSE; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; end
        """;

    [Fact]
    public async Task CoilProtection_WhenTheSealEndsOnlyOn52a_IsProvedForAHealthyBreakerButFailsWhenItFailsToClose()
    {
        // Common practice: the close coil is rated for short duty, so a close that does not end in 52a must be ended
        // by the close-fail timer; a seal-in that waits for 52a alone burns the coil of a breaker that fails to close.
        Assert.IsType<Proved>(await RequirementAsync(CloseFailScheme(string.Empty, string.Empty), "COIL_PROTECTED"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(CloseFailScheme(string.Empty, "fails_to_close = TRUE;"), "COIL_PROTECTED")).Trace;

        var close = Wave(trace, "CLOSE_OUT");
        var on = close.IndexOf('1', StringComparison.Ordinal);
        Assert.True(close.Length - on >= 16, close); // 30 ms is 15 scans, held at the 16th
        Assert.DoesNotContain('0', close[on..]);
        Assert.DoesNotContain('1', Wave(trace, "BRK_52A"));
        Assert.DoesNotContain('1', Wave(trace, "TRIP_OUT"));
        Assert.Equal('1', Wave(trace, "BRK_52B")[on]);
    }

    [Fact]
    public async Task CoilProtection_WhenTheCloseFailTimerEndsTheSeal_IsProvedForABreakerThatMayFailToClose()
    {
        var verdict = await RequirementAsync(CloseFailScheme(" AND NOT CLOSE_FAIL", "fails_to_close = TRUE;"), "COIL_PROTECTED");

        Assert.IsType<Proved>(verdict);
    }

    /// <summary>A trip output (held, or in the seeded fault a fixed pulse) and a breaker-failure timer started by the trip output with 52a.</summary>
    private static string BreakerFailureScheme(string tripOutput, string options) => Header + $"""
        inputs CS_CLOSE : bool; PROT_TRIP : bool; BRK_52A : bool; BRK_52B : bool; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; BF_TRIP : bool; end
        logic
          TRIP_OUT := {tripOutput};
          CLOSE_OUT := CS_CLOSE AND BRK_52B AND NOT PROT_TRIP;
          BF_TRIP := TON(IN := TRIP_OUT AND BRK_52A, PT := T#20ms);
        end
        {Breaker("trip_free = TRUE; " + options)}
        require BF_OPERATES: HELD(PROT_TRIP AND BRK_52A, T#30ms) -> BF_TRIP;
        roles close_output = CLOSE_OUT; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; end
        """;

    [Fact]
    public async Task BreakerFailure_WhenTheTripIsAFixedPulse_IsProvedForAHealthyBreakerButFailsWhenItFailsToTrip()
    {
        // Common practice: breaker-failure protection times a trip that is still standing with the breaker still
        // closed; a trip output that ends by itself stops the timer of a breaker that failed to open.
        const string pulse = "TP(IN := PROT_TRIP, PT := T#8ms)";
        Assert.IsType<Proved>(await RequirementAsync(BreakerFailureScheme(pulse, string.Empty), "BF_OPERATES"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(BreakerFailureScheme(pulse, "fails_to_trip = TRUE;"), "BF_OPERATES")).Trace;

        Assert.EndsWith(new string('1', 16), Wave(trace, "PROT_TRIP"), StringComparison.Ordinal);
        Assert.EndsWith(new string('1', 16), Wave(trace, "BRK_52A"), StringComparison.Ordinal);
        Assert.Contains('1', Wave(trace, "TRIP_OUT"));
        Assert.Equal('0', Wave(trace, "TRIP_OUT")[^1]);
        Assert.False(AtFailure(trace, "BF_TRIP"));
    }

    [Fact]
    public async Task BreakerFailure_WhenTheTripIsHeld_IsProvedForABreakerThatMayFailToTrip()
    {
        var verdict = await RequirementAsync(BreakerFailureScheme("PROT_TRIP", "fails_to_trip = TRUE;"), "BF_OPERATES");

        Assert.IsType<Proved>(verdict);
    }

    /// <summary>A close seal-in with a close-fail alarm; the correct scheme starts a close only on a charged spring.</summary>
    private static string SpringScheme(string springPermissive, string options) => Header + $"""
        inputs CS_CLOSE : bool; PROT_TRIP : bool; BRK_52A : bool; BRK_52B : bool; SPRING_CHARGED : bool; end
        locals CLOSE_SEAL : bool init FALSE; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; CLOSE_FAIL_ALARM : bool; end
        logic
          TRIP_OUT := PROT_TRIP;
          CLOSE_SEAL := ((CS_CLOSE AND BRK_52B AND NOT BRK_52A{springPermissive}) OR CLOSE_SEAL) AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL_ALARM;
          CLOSE_FAIL_ALARM := TON(IN := CLOSE_SEAL, PT := T#20ms);
          CLOSE_OUT := CLOSE_SEAL AND NOT CLOSE_FAIL_ALARM;
        end
        {Breaker(options)}
        require NO_FALSE_CLOSE_FAIL: NOT CLOSE_FAIL_ALARM;
        roles close_output = CLOSE_OUT; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; spring_charged = SPRING_CHARGED; end
        """;

    [Fact]
    public async Task CloseFailAlarm_WhenTheCloseIgnoresTheSpring_IsFalselyRaisedOnlyWhenTheSpringIsModelled()
    {
        // Common practice: a close on a discharged spring does not move the breaker (the spring limit switch blocks
        // the close coil until the motor has recharged it), so the close-fail alarm comes on a healthy breaker.
        Assert.IsType<Proved>(await RequirementAsync(SpringScheme(string.Empty, string.Empty), "NO_FALSE_CLOSE_FAIL"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(SpringScheme(string.Empty, "spring_recharge_time = T#30ms .. T#60ms;"), "NO_FALSE_CLOSE_FAIL")).Trace;

        // The close that fails is the last one; the spring was not charged when it started. The scheme never reads
        // SPRING_CHARGED, so the trace shows the model's own spring, which drives it.
        var close = Wave(trace, "CLOSE_OUT");
        var start = close.LastIndexOf("01", StringComparison.Ordinal) + 1;
        Assert.Equal('0', Wave(trace, "BKM_SPRING")[start]);
        Assert.DoesNotContain('1', Wave(trace, "BRK_52A"));
        Assert.True(AtFailure(trace, "CLOSE_FAIL_ALARM"));
    }

    [Fact]
    public async Task CloseFailAlarm_WhenTheCloseStartsOnlyOnAChargedSpring_IsNeverFalselyRaised()
    {
        var verdict = await RequirementAsync(SpringScheme(" AND SPRING_CHARGED", "spring_recharge_time = T#30ms .. T#60ms;"), "NO_FALSE_CLOSE_FAIL");

        Assert.IsType<Proved>(verdict);
    }

    /// <summary>A breaker status alarm: the contacts agreeing (both TRUE or both FALSE) for the alarm time.</summary>
    private static string DiscrepancyScheme(string alarmInput, string alarmTime, string options) => Header + $"""
        inputs CS_CLOSE : bool; PROT_TRIP : bool; BRK_52A : bool; BRK_52B : bool; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; STATUS_ALARM : bool; end
        logic
          TRIP_OUT := PROT_TRIP;
          CLOSE_OUT := CS_CLOSE AND BRK_52B AND NOT BRK_52A AND NOT TRIP_OUT;
          STATUS_ALARM := TON(IN := {alarmInput}, PT := {alarmTime});
        end
        {Breaker(options)}
        require DISCREPANCY_ALARMED: HELD(NOT (BRK_52A XOR BRK_52B), T#50ms) -> STATUS_ALARM;
        require NO_FALSE_STATUS_ALARM: NOT STATUS_ALARM;
        roles close_output = CLOSE_OUT; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; end
        """;

    private const string BothClosed = "BRK_52A AND BRK_52B";
    private const string Agree = "NOT (BRK_52A XOR BRK_52B)";

    [Fact]
    public async Task DiscrepancyAlarm_WhenItWatchesOnlyBothClosed_MissesAContactStuckOpen()
    {
        // Common practice: 52a and 52b that agree for longer than any travel mean a failed auxiliary switch or wiring;
        // both open (intermediate) is as wrong as both closed.
        Assert.IsType<Proved>(await RequirementAsync(DiscrepancyScheme(BothClosed, "T#40ms", string.Empty), "DISCREPANCY_ALARMED"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(DiscrepancyScheme(BothClosed, "T#40ms", "aux_contact_fault = TRUE;"), "DISCREPANCY_ALARMED")).Trace;

        Assert.EndsWith(new string('0', 26), Wave(trace, "BRK_52A"), StringComparison.Ordinal); // 50 ms is 25 scans
        Assert.EndsWith(new string('0', 26), Wave(trace, "BRK_52B"), StringComparison.Ordinal);
        Assert.False(AtFailure(trace, "STATUS_ALARM"));
    }

    [Fact]
    public async Task DiscrepancyAlarm_WhenItWatchesBothAgreeing_IsProvedToComeForAFailedContact()
    {
        var verdict = await RequirementAsync(DiscrepancyScheme(Agree, "T#40ms", "aux_contact_fault = TRUE;"), "DISCREPANCY_ALARMED");

        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task DiscrepancyAlarm_WhenShorterThanTheTravel_IsFalselyRaisedByContactsThatOverlapInTravel()
    {
        // Common practice: the status alarm is delayed beyond the longest travel, as auxiliary contacts switch at
        // different points of the stroke.
        Assert.IsType<Proved>(await RequirementAsync(DiscrepancyScheme(BothClosed, "T#4ms", string.Empty), "NO_FALSE_STATUS_ALARM"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(DiscrepancyScheme(BothClosed, "T#4ms", "travel_contacts_free = TRUE;"), "NO_FALSE_STATUS_ALARM")).Trace;

        Assert.EndsWith("111", Wave(trace, "BRK_52A"), StringComparison.Ordinal);
        Assert.EndsWith("111", Wave(trace, "BRK_52B"), StringComparison.Ordinal);
        Assert.True(AtFailure(trace, "STATUS_ALARM"));
    }

    [Fact]
    public async Task DiscrepancyAlarm_WhenLongerThanTheTravel_IsNeverRaisedForAHealthyBreaker()
    {
        var verdict = await RequirementAsync(DiscrepancyScheme(Agree, "T#20ms", "travel_contacts_free = TRUE;"), "NO_FALSE_STATUS_ALARM");

        Assert.IsType<Proved>(verdict);
    }
}
