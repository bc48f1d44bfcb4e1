namespace LogicProof.Proof.Tests.Engines;

/// <summary>Invented schemes for the PDR engine's tests (fictional places and names).</summary>
internal static class PdrSchemes
{
    /// <summary>
    /// A ripple counter of <paramref name="bits"/> seal-in bits counting every scan; the requirement fails only when
    /// every bit is set, after 2^bits - 1 scans: far beyond what any engine reaches, so a run only ends by a limit.
    /// The bits are written from the highest down, so each reads the lower bits' values of the previous scan.
    /// </summary>
    public static string Counter(int bits)
    {
        var names = Enumerable.Range(0, bits).Select(b => $"B{b}").ToList();
        var text = new System.Text.StringBuilder();
        text.AppendLine("// Quillmere 115 kV substation, operations counter (fictional)");
        text.AppendLine("scheme QM7_COUNTER;");
        text.AppendLine("frequency 60 Hz;");
        text.AppendLine("scan 2 ms;");
        text.AppendLine("inputs");
        text.AppendLine("  UNUSED : bool;");
        text.AppendLine("end");
        text.AppendLine("locals");
        names.ForEach(n => text.AppendLine($"  {n} : bool init FALSE;"));
        text.AppendLine("end");
        text.AppendLine("logic");
        for (var b = bits - 1; b >= 0; b--)
        {
            var carry = b == 0 ? "TRUE" : string.Join(" AND ", names.Take(b));
            text.AppendLine($"  B{b} := B{b} XOR ({carry});");
        }

        text.AppendLine("end");
        text.AppendLine($"require NOT_FULL: NOT ({string.Join(" AND ", names)});");
        return text.ToString();
    }

    /// <summary>A close output that a TON lets through after 10 scans of a standing command (2 ms scan, 20 ms).</summary>
    public static string ShortDelay(bool assumeNoCommand) => $$"""
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
        {{(assumeNoCommand ? "assume NO_COMMAND: NOT CLOSE_CMD;" : string.Empty)}}
        """;

    /// <summary>A 10 s gas alarm at a 2 ms scan: the lock is reachable only after 5,000 scans of standing low gas.</summary>
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

    /// <summary>A close seal-in, with or without a declared power-up value.</summary>
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
        require SEAL_NEEDS_COMMAND_FIRST: SEAL -> ONCE(CLOSE_CMD);
        """;

    /// <summary>Two TONs on one input; SLOW implies FAST only through FAST's counter being min(SLOW's, 2500).</summary>
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

    /// <summary>No memory at all, and a real input with a range.</summary>
    public const string Combinational = """
        // Quillmere 115 kV substation, bus voltage check (fictional)
        scheme QM7_LIVE;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          BUS_V : real range 0 .. 1.5;
          ENABLE : bool;
        end
        locals
          LIVE : bool;
        end
        logic
          LIVE := ENABLE AND BUS_V >= 0.8;
        end
        require LIVE_MEANS_VOLTAGE: LIVE -> BUS_V > 0.75;
        require NEVER_LIVE: NOT LIVE;
        """;
}
