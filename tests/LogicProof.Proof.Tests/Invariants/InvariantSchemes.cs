using System.Globalization;
using System.Text;

namespace LogicProof.Proof.Tests.Invariants;

/// <summary>Invented schemes for the invariant generator's tests (fictional places and names).</summary>
internal static class InvariantSchemes
{
    /// <summary>
    /// An SR lockout whose output is also read before it is written (so it has a last-scan slot), and a rising edge on
    /// the close output, which is also read before it is written.
    /// </summary>
    public static string Lockout(bool declareInit) => $$"""
        // Quillmere 115 kV substation, breaker QM-7, lockout 86 (fictional)
        scheme QM7_LOCKOUT;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          PROT_TRIP : bool;
          RESET     : bool;
          CLOSE_CMD : bool;
        end
        locals
          WAS_CLOSING : bool;
          CLOSE_OUT : bool;
          LOCKOUT   : bool{{(declareInit ? " init FALSE" : string.Empty)}};
          CLOSE_EDGE : bool;
        end
        logic
          WAS_CLOSING := CLOSE_OUT;
          CLOSE_OUT := CLOSE_CMD AND NOT LOCKOUT;
          LOCKOUT := SR(S1 := PROT_TRIP, R := RESET);
          CLOSE_EDGE := R_TRIG(CLOSE_OUT);
        end
        require NO_CLOSE_IN_LOCKOUT: LOCKOUT -> NOT CLOSE_OUT;
        """;

    /// <summary>
    /// A seal-in read one and two scans late: with the assumption that the reset never operates, the seal once set
    /// stays set, so its value two scans ago implies its value one scan ago; without the assumption it does not.
    /// </summary>
    public static string AssumedNoReset(bool assume) => $$"""
        // Quillmere 115 kV substation, breaker QM-7, trip memory (fictional)
        scheme QM7_MEMORY;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          TRIP  : bool;
          RESET : bool;
        end
        locals
          SEEN : bool init FALSE;
          WAS_SEEN : bool;
          OLDER : bool;
        end
        logic
          OLDER := WAS_SEEN;
          WAS_SEEN := SEEN;
          SEEN := (TRIP OR SEEN) AND NOT RESET;
        end
        require MEMORY_KEPT: OLDER -> WAS_SEEN;
        {{(assume ? "assume NEVER_RESET: NOT RESET;" : string.Empty)}}
        """;

    /// <summary>
    /// About 200 state slots: 40 bays, each with an on-delay and an off-delay timer, an SR latch, an edge and a
    /// seal-in, chained through read-before-write.
    /// </summary>
    public static string ManyBays(int bays)
    {
        var text = new StringBuilder();
        text.AppendLine("// Quillmere 400 kV switching station, 40 bays (fictional)");
        text.AppendLine("scheme BRACKENFORD_BAYS;");
        text.AppendLine("frequency 50 Hz;");
        text.AppendLine("scan 2 ms;");
        text.AppendLine("inputs");
        text.AppendLine("  CMD_A : bool;");
        text.AppendLine("  CMD_B : bool;");
        text.AppendLine("  RESET : bool;");
        text.AppendLine("end");
        text.AppendLine("locals");
        for (var b = 0; b < bays; b++)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  ARM_{b} : bool;");
            text.AppendLine(CultureInfo.InvariantCulture, $"  ON_{b} : bool;");
            text.AppendLine(CultureInfo.InvariantCulture, $"  OFF_{b} : bool;");
            text.AppendLine(CultureInfo.InvariantCulture, $"  LATCH_{b} : bool init FALSE;");
            text.AppendLine(CultureInfo.InvariantCulture, $"  EDGE_{b} : bool;");
            text.AppendLine(CultureInfo.InvariantCulture, $"  SEAL_{b} : bool init FALSE;");
        }

        text.AppendLine("end");
        text.AppendLine("logic");
        for (var b = 0; b < bays; b++)
        {
            var command = b % 2 == 0 ? "CMD_A" : "CMD_B";
            var next = (b + 1) % bays;
            text.AppendLine(CultureInfo.InvariantCulture, $"  ARM_{b} := {command} AND NOT SEAL_{next};");
            text.AppendLine(CultureInfo.InvariantCulture, $"  ON_{b} := TON(ARM_{b}, T#{10 * (1 + (b % 5))}ms);");
            text.AppendLine(CultureInfo.InvariantCulture, $"  OFF_{b} := TOF(ARM_{b}, T#20ms);");
            text.AppendLine(CultureInfo.InvariantCulture, $"  LATCH_{b} := SR(S1 := ON_{b}, R := RESET);");
            text.AppendLine(CultureInfo.InvariantCulture, $"  EDGE_{b} := R_TRIG(LATCH_{b});");
            text.AppendLine(CultureInfo.InvariantCulture, $"  SEAL_{b} := (EDGE_{b} OR SEAL_{b}) AND NOT RESET;");
        }

        text.AppendLine("end");
        text.AppendLine("require FIRST_BAY: ON_0 -> OFF_0;");
        return text.ToString();
    }
}
