namespace LogicProof.Model.SyncCheck;

/// <summary>
/// Slip against the angle window and qualifying time of a synchronism check: at slip s the phase difference
/// moves 360·s degrees a second, and it must stay inside the window ±theta (a span of 2·theta) for the whole
/// qualifying time T before the check passes, so slip_max = 2·theta / (360·T).
/// </summary>
public static class SlipLimit
{
    public static double MaximumSlipHz(double windowDeg, double qualifyingTimeSeconds)
    {
        SyncCheckGuard.AngleWindow(windowDeg);
        SyncCheckGuard.Positive(qualifyingTimeSeconds, "the qualifying time", "s");
        return 2 * windowDeg / (360 * qualifyingTimeSeconds);
    }

    /// <summary>The longest qualifying time that still lets a slip of <paramref name="slipHz"/> pass: T = 2·theta / (360·s).</summary>
    public static double MaximumQualifyingTimeSeconds(double windowDeg, double slipHz)
    {
        SyncCheckGuard.AngleWindow(windowDeg);
        SyncCheckGuard.Positive(slipHz, "the slip frequency", "Hz");
        return 2 * windowDeg / (360 * slipHz);
    }
}
