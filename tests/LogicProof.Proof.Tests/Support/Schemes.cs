namespace LogicProof.Proof.Tests.Support;

/// <summary>Invented test schemes (demo data, fictional places and names).</summary>
internal static class Schemes
{
    /// <summary>Every function block, reals with ranges, a previous-value read and a seal-in loop.</summary>
    public static string EveryBlock => EveryBlockWithPresets("T#6ms", "T#8ms", "T#4ms");

    /// <summary><see cref="EveryBlock"/> with the TP, TON and TOF presets given.</summary>
    public static string EveryBlockWithPresets(string pulse, string onDelay, string offDelay) => $$"""
        // Quillmere 33 kV switchboard, feeder BF-4 (fictional)
        scheme BF4_ALL;
        frequency 50 Hz;
        scan 2 ms;
        inputs
          CMD     : bool;
          RESET   : bool;
          TRIP    : bool;
          LOAD_I  : real range -2 .. 2;
          BUS_V   : real range 0 .. 1.5;
        end
        locals
          EDGE_UP : bool;
          EDGE_DN : bool;
          LO      : bool;
          HOLD    : bool;
          PULSE   : bool;
          DELAYED : bool;
          AFTER   : bool;
          SEAL    : bool;
          MARGIN  : real;
          HIGH    : bool;
          PREV_HIGH : bool;
        end
        logic
          EDGE_UP := R_TRIG(CMD);
          EDGE_DN := F_TRIG(TRIP);
          LO := SR(S1 := TRIP AND NOT RESET, R := RESET);
          HOLD := RS(S := EDGE_UP, R1 := TRIP);
          PULSE := TP(CMD OR EDGE_DN, {{pulse}});
          DELAYED := TON(CMD AND NOT LO, {{onDelay}});
          AFTER := TOF(HOLD, {{offDelay}});
          SEAL := (CMD OR SEAL) AND NOT TRIP;
          MARGIN := MAX(ABS(LOAD_I) - 1.2, MIN(BUS_V, 1.1)) * 2 + LOAD_I / 4;
          HIGH := MARGIN > 0.5 XOR PREV_HIGH;
          PREV_HIGH := HIGH AND NOT DELAYED;
        end
        require NO_LOCKED_CLOSE: LO -> NOT (SEAL AND PULSE);
        require SEAL_NEEDS_NO_TRIP: SEAL -> NOT TRIP;
        """;

    /// <summary>A close output that a TON lets through after 10 scans of a standing command (2 ms scan, 20 ms).</summary>
    public const string ShortDelay = """
        // Quillmere 115 kV substation, breaker QM-7 (fictional)
        scheme QM7_DELAY;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CLOSE_CMD : bool;
        end
        outputs
          CLOSE_OUT : bool;
        end
        logic
          CLOSE_OUT := TON(CLOSE_CMD, T#20ms);
        end
        require NEVER_CLOSES: NOT CLOSE_OUT;
        require CLOSES_ONLY_ON_COMMAND: CLOSE_OUT -> CLOSE_CMD;
        """;

    /// <summary><see cref="ShortDelay"/> with an assumption that rules the command out, so the close never happens.</summary>
    public const string ShortDelayAssumingNoCommand = ShortDelay + "\nassume NO_COMMAND: NOT CLOSE_CMD;\n";

    /// <summary>
    /// A 10 s alarm timer at a 2 ms scan (5,000 scans): the alarm is reachable only after 5,000 scans of a standing
    /// fault, and it always implies the fault.
    /// </summary>
    public const string DeepTimer = """
        // Quillmere 115 kV substation, breaker QM-7, gas supervision (fictional)
        scheme QM7_GAS;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          GAS_LOW : bool;
          BLOCK   : bool;
        end
        locals
          GAS_ALARM : bool;
          LOCKED    : bool;
        end
        logic
          GAS_ALARM := TON(GAS_LOW AND NOT BLOCK, T#10s);
          LOCKED := GAS_ALARM AND NOT BLOCK;
        end
        require NO_GAS_LOCK: NOT LOCKED;
        require LOCK_NEEDS_GAS: LOCKED -> GAS_LOW;
        """;

    /// <summary>
    /// A violation reachable two ways: by holding A for 10 s (2 accelerated steps, 5,000 scans) or by B TRUE, FALSE,
    /// TRUE (3 steps, 3 scans). The shortest trace in scans is the second.
    /// </summary>
    public const string QuickOrSlow = """
        // Quillmere 115 kV substation, breaker QM-7, close command supervision (fictional)
        scheme QM7_DIP;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          A : bool;
          B : bool;
        end
        locals
          SLOW     : bool;
          DIP      : bool;
          WAS_B    : bool;
          SEEN_DIP : bool init FALSE;
          BAD      : bool;
        end
        logic
          SLOW := TON(A, T#10s);
          DIP := WAS_B AND NOT B;
          WAS_B := B;
          SEEN_DIP := SR(S1 := DIP, R := FALSE);
          BAD := SLOW OR SEEN_DIP AND B;
        end
        require NOT_BAD: NOT BAD;
        """;

    /// <summary>
    /// Two on-delays of one input; SLOW implies FAST only through a relation between their counters: FAST's counter is
    /// min(SLOW's counter, 2500) at every reachable state.
    /// </summary>
    public const string TwoTimers = """
        // Quillmere 115 kV substation, breaker QM-7, two-stage gas alarm (fictional)
        scheme QM7_STAGES;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          GAS_LOW : bool;
        end
        locals
          FAST : bool;
          SLOW : bool;
        end
        logic
          FAST := TON(GAS_LOW, T#5s);
          SLOW := TON(GAS_LOW, T#10s);
        end
        require SLOW_AFTER_FAST: SLOW -> FAST;
        """;

    /// <summary>A seal-in with and without a declared power-up value.</summary>
    public static string SealIn(bool declareInit) => $$"""
        // Quillmere 115 kV substation, breaker QM-7, close seal-in (fictional)
        scheme QM7_SEAL;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CLOSE_CMD : bool;
          TRIP_CMD  : bool;
        end
        locals
          SEAL : bool{{(declareInit ? " init FALSE" : string.Empty)}};
        end
        logic
          SEAL := (CLOSE_CMD OR SEAL) AND NOT TRIP_CMD;
        end
        require NO_CLOSE_WITHOUT_COMMAND: SEAL -> CLOSE_CMD OR PREV(SEAL);
        require SEAL_NEEDS_COMMAND_FIRST: SEAL -> ONCE(CLOSE_CMD);
        """;
}
