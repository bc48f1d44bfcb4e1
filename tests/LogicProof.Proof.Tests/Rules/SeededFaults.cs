using static LogicProof.Proof.Tests.Rules.RuleProofSchemes;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// The seeded faults whose counterexamples are checked by waveform endings and values at the failing scan alone,
/// by name; faults that need more checks are facts of <see cref="RuleVerdictTests"/>.
/// </summary>
internal static class SeededFaults
{
    public static readonly IReadOnlyDictionary<string, SeededFault> ByName = new Dictionary<string, SeededFault>(StringComparer.Ordinal)
    {
        ["close-blocked-in-lockout: the lockout contact is removed"] = new(
            "close-blocked-in-lockout",
            Correct,
            [(" OR LOCKOUT OR LOW_GAS", " OR LOW_GAS"), (" AND NOT LOCKOUT AND NOT TRIP_OUT", " AND NOT TRIP_OUT")],
            [],
            [("LOCKOUT", true), ("CLOSE_OUT", true)]),
        ["close-starts-breaker-open: the breaker status sense is inverted"] = new(
            "close-starts-breaker-open",
            Correct,
            [
                ("AND BRK_52B AND NOT BRK_52A AND NOT LOCKOUT", "AND BRK_52A AND NOT BRK_52B AND NOT LOCKOUT"),
                ("AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL", "AND NOT BRK_52B AND NOT TRIP_OUT AND NOT CLOSE_FAIL"),
            ],
            [("CLOSE_OUT", "01")],
            [("BRK_52A", true), ("BRK_52B", false)]),
        ["close-starts-in-sync: the sync permissive is bypassed"] = new(
            "close-starts-in-sync",
            Correct,
            [("CLOSE_CMD AND (SYNC_OK OR DEAD_LINE_OK) AND", "CLOSE_CMD AND")],
            [("CLOSE_OUT", "01")],
            [("SYNC_OK", false), ("DEAD_LINE_OK", false)]),
        ["close-starts-healthy: the spring check is left out"] = new(
            "close-starts-healthy",
            Correct,
            [("AND NOT LOW_GAS AND SPRING_OK", "AND NOT LOW_GAS")],
            [("CLOSE_OUT", "01")],
            [("SPRING_OK", false)]),
        ["close-sealed-in: the seal-in is lost, so the close ends with a momentary command"] = new(
            "close-sealed-in",
            Correct,
            [("CLOSE_SEAL := (CLOSE_START OR CLOSE_SEAL)", "CLOSE_SEAL := CLOSE_START")],
            [("CLOSE_OUT", "10")],
            [("CLOSE_CMD", false), ("BRK_52A", false), ("TRIP_OUT", false)]),

        // 8 ms is 4 scans: an output that drops only when last scan's close-fail timer is seen stays on a fifth scan.
        ["close-not-held-on: the coil drops one scan late"] = new(
            "close-not-held-on",
            Correct,
            [("CLOSE_OUT := CLOSE_SEAL AND NOT CLOSE_FAIL;", "CLOSE_OUT := CLOSE_SEAL;")],
            [("CLOSE_OUT", "011111")],
            []),
        ["trip-wins: the seal ignores the trip, so both coils are on"] = new(
            "trip-wins",
            Correct,
            [("AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL", "AND NOT BRK_52A AND NOT CLOSE_FAIL")],
            [],
            [("CLOSE_OUT", true), ("TRIP_OUT", true)]),
        ["lockout-trips: the lockout is not in the trip path"] = new(
            "lockout-trips",
            Correct,
            [(" OR LOCKOUT OR LOW_GAS", " OR LOW_GAS")],
            [],
            [("LOCKOUT", true), ("BRK_52A", true), ("TRIP_OUT", false)]),

        // Stated 6 ms (3 scans): the rule looks at the fourth scan of lost continuity; an 8 ms delay alarms at the fifth.
        ["trip-circuit-supervised: the alarm delay is longer than stated"] = new(
            "trip-circuit-supervised",
            Correct,
            [("TON(NOT TCS_OK, T#4ms)", "TON(NOT TCS_OK, T#8ms)")],
            [("TCS_OK", "0000"), ("BRK_52A", "1111")],
            [("TCS_ALARM", false)]),
        ["low-gas-philosophy: low gas does not trip under the trip policy"] = new(
            "low-gas-philosophy",
            Correct,
            [(" OR LOCKOUT OR LOW_GAS;", " OR LOCKOUT;")],
            [],
            [("LOW_GAS", true), ("BRK_52A", true), ("TRIP_OUT", false)]),
        ["low-gas-philosophy: low gas does not block the trip under the block-trip policy"] = new(
            "low-gas-philosophy",
            BlockTrip,
            [("TRIP_OUT := TRIP_REQ AND NOT LOW_GAS;", "TRIP_OUT := TRIP_REQ;")],
            [],
            [("LOW_GAS", true), ("TRIP_OUT", true)]),
    };
}
