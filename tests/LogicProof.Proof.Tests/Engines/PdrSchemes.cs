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
