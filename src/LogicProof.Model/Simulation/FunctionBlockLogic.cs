namespace LogicProof.Model.Simulation;

/// <summary>
/// One scan of each IEC 61131-3 function block, exactly as documented on <see cref="Scan.TimerStep"/>,
/// <see cref="Scan.EdgeStep"/> and <see cref="Scan.LatchStep"/>. Each returns the block's output Q for this scan and
/// updates the block's own memory in place; no other step reads that memory, so updating it within the scan is
/// the same as updating it at the end.
/// </summary>
internal static class FunctionBlockLogic
{
    /// <summary>TON: Q = IN and c &gt;= n; c' = IN ? min(c + 1, n) : 0.</summary>
    public static bool OnDelay(bool input, int[] counters, int position, int preset)
    {
        var count = counters[position];
        counters[position] = input ? Math.Min(count + 1, preset) : 0;
        return input && count >= preset;
    }

    /// <summary>TOF: Q = IN or c &lt; n; c' = IN ? 0 : min(c + 1, n).</summary>
    public static bool OffDelay(bool input, int[] counters, int position, int preset)
    {
        var count = counters[position];
        counters[position] = input ? 0 : Math.Min(count + 1, preset);
        return input || count < preset;
    }

    /// <summary>TP: idle (c = 0) starts a pulse on IN; pulsing (0 &lt; c &lt; n) counts on; done (c = n) waits for IN FALSE.</summary>
    public static bool Pulse(bool input, int[] counters, int position, int preset)
    {
        var count = counters[position];
        if (count == 0)
        {
            var starts = input && preset > 0;
            counters[position] = starts ? 1 : 0;
            return starts;
        }

        if (count < preset)
        {
            counters[position] = count + 1;
            return true;
        }

        counters[position] = input ? preset : 0;
        return false;
    }

    /// <summary>R_TRIG: Q = CLK and not M; M' = CLK.</summary>
    public static bool RisingEdge(bool clock, bool[] memories, int position)
    {
        var output = clock && !memories[position];
        memories[position] = clock;
        return output;
    }

    /// <summary>F_TRIG: Q = not CLK and not M; M' = not CLK.</summary>
    public static bool FallingEdge(bool clock, bool[] memories, int position)
    {
        var output = !clock && !memories[position];
        memories[position] = !clock;
        return output;
    }

    /// <summary>SR: Q1 = S1 or (not R and Q1 previous); the memory takes Q1.</summary>
    public static bool SetDominantLatch(bool set, bool reset, bool[] memories, int position)
    {
        var output = set || (!reset && memories[position]);
        memories[position] = output;
        return output;
    }

    /// <summary>RS: Q1 = not R1 and (S or Q1 previous); the memory takes Q1.</summary>
    public static bool ResetDominantLatch(bool set, bool reset, bool[] memories, int position)
    {
        var output = !reset && (set || memories[position]);
        memories[position] = output;
        return output;
    }
}
