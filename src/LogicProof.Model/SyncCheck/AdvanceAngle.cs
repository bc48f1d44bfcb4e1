namespace LogicProof.Model.SyncCheck;

/// <summary>
/// The angle the phase difference moves while the breaker closes: 360·s·t degrees for slip s (Hz) and
/// closing time t (s). A close command given that many degrees early lands the contacts at the target angle.
/// </summary>
public static class AdvanceAngle
{
    public static double Degrees(double slipHz, double closingTimeSeconds)
    {
        // The sign of the slip only says which side runs fast; the angle travelled is the same.
        SyncCheckGuard.NonNegative(slipHz, "the slip frequency (give its magnitude)", "Hz");
        SyncCheckGuard.Positive(closingTimeSeconds, "the breaker closing time", "s");
        return 360 * slipHz * closingTimeSeconds;
    }
}
