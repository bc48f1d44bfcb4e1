namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// An invented bay (Quillmere 115 kV substation, bay 5, breaker QM-5) whose close-and-trip logic meets every built-in
/// rule, with every role bound. Timers are a few 2 ms scans so that proofs are quick. Tests seed one fault at a
/// time by replacing a piece of it.
/// </summary>
internal static class RuleProofSchemes
{
    public const string Correct = """
        // Quillmere 115 kV substation, bay 5, breaker QM-5 (fictional): close supervision for the rule tests.
        scheme QM5_RULES;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CS_CLOSE : bool; REMOTE_CLOSE : bool;
          PROT_TRIP : bool; PROT_TRIP_86 : bool; CS_TRIP : bool;
          RESET_LOCAL : bool; RESET_REMOTE : bool;
          BRK_52A : bool; BRK_52B : bool;
          SYNC_OK : bool; DEAD_LINE_OK : bool;
          LOW_GAS : bool; SPRING_OK : bool;
          TCS_OK : bool;
        end
        locals
          CLOSE_CMD : bool;
          CLOSE_START : bool;
          CLOSE_SEAL : bool init FALSE;
          CLOSE_FAIL : bool init FALSE;
          ANTI_PUMP : bool init TRUE;
          TRIP_REQ : bool;
        end
        outputs
          CLOSE_OUT : bool;
          TRIP_OUT : bool;
          LOCKOUT : bool init TRUE;
          TCS_ALARM : bool;
        end
        logic
          LOCKOUT := SR(S1 := PROT_TRIP_86, R := RESET_LOCAL);
          TRIP_REQ := PROT_TRIP OR PROT_TRIP_86 OR CS_TRIP OR LOCKOUT OR LOW_GAS;
          TRIP_OUT := TRIP_REQ;
          CLOSE_CMD := CS_CLOSE OR REMOTE_CLOSE;
          CLOSE_START := CLOSE_CMD AND (SYNC_OK OR DEAD_LINE_OK) AND NOT LOW_GAS AND SPRING_OK
                         AND BRK_52B AND NOT BRK_52A AND NOT LOCKOUT AND NOT TRIP_OUT AND NOT ANTI_PUMP;
          CLOSE_SEAL := (CLOSE_START OR CLOSE_SEAL) AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL;
          CLOSE_FAIL := TON(CLOSE_SEAL, T#8ms);
          CLOSE_OUT := CLOSE_SEAL AND NOT CLOSE_FAIL;
          ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT) AND CLOSE_CMD;
          TCS_ALARM := TON(NOT TCS_OK, T#4ms);
        end
        roles
          close_output = CLOSE_OUT;
          close_command = CS_CLOSE, REMOTE_CLOSE;
          lockout = LOCKOUT;
          lockout_reset_local = RESET_LOCAL;
          lockout_reset_remote = RESET_REMOTE;
          lockout_reset_policy = local_only;
          breaker_closed = BRK_52A;
          breaker_open = BRK_52B;
          sync_permissive = SYNC_OK;
          dead_permissive = DEAD_LINE_OK;
          low_gas = LOW_GAS;
          low_gas_policy = trip;
          spring_charged = SPRING_OK;
          trip_command = PROT_TRIP, PROT_TRIP_86, CS_TRIP;
          trip_output = TRIP_OUT;
          close_fail_time = T#8ms;
          trip_circuit_healthy = TCS_OK;
          trip_circuit_alarm = TCS_ALARM;
          trip_circuit_alarm_time = T#6ms;
        end
        """;

    /// <summary>The same bay with the block-trip low-gas philosophy: low gas blocks the trip output instead of tripping.</summary>
    public static string BlockTrip =>
        RuleProofHarness.Replace(
            RuleProofHarness.Replace(
                RuleProofHarness.Replace(Correct, "OR LOCKOUT OR LOW_GAS;", "OR LOCKOUT;"),
                "TRIP_OUT := TRIP_REQ;",
                "TRIP_OUT := TRIP_REQ AND NOT LOW_GAS;"),
            "low_gas_policy = trip;",
            "low_gas_policy = block_trip;");
}
