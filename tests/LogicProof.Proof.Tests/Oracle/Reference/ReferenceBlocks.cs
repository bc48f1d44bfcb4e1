namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// The IEC 61131-3 standard function blocks, one scan each, written from the standard's own description (not from
/// the product's lowering). Elapsed time ET is counted in whole scans; the scan at which a timer starts has ET = 0.
/// Every block updates only its own memory, passed by reference.
/// </summary>
internal static class ReferenceBlocks
{
    /// <summary>
    /// TON (IEC 61131-3 ed.3 §6.6.3.5.4, on-delay timer): while IN is TRUE, ET runs from 0 at the scan IN became
    /// TRUE and stops at PT; Q is TRUE when ET has reached PT; IN FALSE resets ET to 0 and Q to FALSE.
    /// </summary>
    public static bool OnDelay(bool input, ref bool wasOn, ref int elapsed, int preset)
    {
        elapsed = input && wasOn ? Math.Min(elapsed + 1, preset) : 0;
        wasOn = input;
        return input && elapsed >= preset;
    }

    /// <summary>
    /// TOF (IEC 61131-3 ed.3 §6.6.3.5.4, off-delay timer): Q is TRUE while IN is TRUE; when IN becomes FALSE, ET runs
    /// from 0 and stops at PT, and Q stays TRUE until ET reaches PT. At power-up Q is FALSE (the timer is expired).
    /// </summary>
    public static bool OffDelay(bool input, ref bool wasOn, ref int elapsed, int preset)
    {
        elapsed = input || wasOn ? 0 : Math.Min(elapsed + 1, preset);
        wasOn = input;
        return input || elapsed < preset;
    }

    /// <summary>
    /// TP (IEC 61131-3 ed.3 §6.6.3.5.4, pulse timer): a rising edge of IN while the timer is idle (ET = 0) starts a
    /// pulse: Q is TRUE while ET runs from 0 to PT, whatever IN does (not retriggerable). When ET reaches PT, Q falls;
    /// ET then stays at PT while IN is TRUE and returns to 0 (idle) when IN is FALSE.
    /// </summary>
    public static bool Pulse(bool input, ref bool wasOn, ref bool pulsing, ref int elapsed, int preset)
    {
        var rising = input && !wasOn;
        wasOn = input;
        if (pulsing)
        {
            elapsed++;
            if (elapsed >= preset)
            {
                pulsing = false;
                elapsed = preset;
            }
        }
        else if (elapsed == 0 && rising && preset > 0)
        {
            pulsing = true;
        }

        if (!pulsing && !input)
        {
            elapsed = 0;
        }

        return pulsing;
    }

    /// <summary>R_TRIG (IEC 61131-3 ed.3 §6.6.3.5.3): Q := CLK AND NOT M; M := CLK, with M FALSE at power-up.</summary>
    public static bool RisingEdge(bool clock, ref bool memory)
    {
        var output = clock && !memory;
        memory = clock;
        return output;
    }

    /// <summary>
    /// F_TRIG (IEC 61131-3 ed.3 §6.6.3.5.3): Q := NOT CLK AND NOT M; M := NOT CLK, with M FALSE at power-up, so a
    /// CLK that is FALSE at the first scan gives Q TRUE at that scan (the standard's first-scan behaviour).
    /// </summary>
    public static bool FallingEdge(bool clock, ref bool memory)
    {
        var output = !clock && !memory;
        memory = !clock;
        return output;
    }

    /// <summary>SR (IEC 61131-3 ed.3 §6.6.3.5.2, set dominant): Q1 := S1 OR (NOT R AND Q1).</summary>
    public static bool SetDominant(bool set, bool reset, ref bool q1)
    {
        q1 = set || (!reset && q1);
        return q1;
    }

    /// <summary>RS (IEC 61131-3 ed.3 §6.6.3.5.2, reset dominant): Q1 := NOT R1 AND (S OR Q1).</summary>
    public static bool ResetDominant(bool set, bool reset, ref bool q1)
    {
        q1 = !reset && (set || q1);
        return q1;
    }
}
