namespace LogicProof.Model.SyncCheck;

/// <summary>The calculations with their formulas and inputs gathered into a <see cref="SyncCalcResult"/> for display.</summary>
public static class SyncCalculator
{
    public static SyncCalcResult MaximumSlip(double windowDeg, TimeSetting qualifyingTime, double frequencyHz)
    {
        SyncCheckGuard.PowerFrequency(frequencyHz);
        var seconds = qualifyingTime.ToSeconds(frequencyHz);
        var slip = SlipLimit.MaximumSlipHz(windowDeg, seconds);
        return new SyncCalcResult(
            "slip",
            "slip_max = 2*theta / (360*T)",
            [new("theta", windowDeg, "deg"), Time("T", seconds, qualifyingTime, frequencyHz)],
            new("slip_max", slip, "Hz"));
    }

    public static SyncCalcResult AdvanceAngle(double slipHz, TimeSetting closingTime, double frequencyHz)
    {
        SyncCheckGuard.PowerFrequency(frequencyHz);
        var seconds = closingTime.ToSeconds(frequencyHz);
        var angle = SyncCheck.AdvanceAngle.Degrees(slipHz, seconds);
        return new SyncCalcResult(
            "advance",
            "advance = 360*s*t",
            [new("s", slipHz, "Hz"), Time("t", seconds, closingTime, frequencyHz)],
            new("advance", angle, "deg"));
    }

    public static SyncCalcResult DifferenceVoltageFromAngle(double angleDeg, double v1, double v2, string voltageUnit)
    {
        var dv = DifferenceVoltage.Magnitude(angleDeg, v1, v2);
        return new SyncCalcResult(
            "voltage",
            "|dV| = sqrt(V1^2 + V2^2 - 2*V1*V2*cos(d))",
            [new("d", angleDeg, "deg"), new("V1", v1, voltageUnit), new("V2", v2, voltageUnit)],
            new("|dV|", dv, voltageUnit));
    }

    public static SyncCalcResult AngleFromDifferenceVoltage(double dvMagnitude, double v1, double v2, string voltageUnit)
    {
        var angle = DifferenceVoltage.AngleDegrees(dvMagnitude, v1, v2);
        return new SyncCalcResult(
            "voltage",
            "d = arccos((V1^2 + V2^2 - dV^2) / (2*V1*V2))",
            [new("|dV|", dvMagnitude, voltageUnit), new("V1", v1, voltageUnit), new("V2", v2, voltageUnit)],
            new("d", angle, "deg"));
    }

    private static SyncCalcQuantity Time(string symbol, double seconds, TimeSetting entered, double frequencyHz)
    {
        var given = entered.Unit switch
        {
            TimeUnit.Seconds => null,
            TimeUnit.Cycles => $"{entered} at {SyncCheckNumber.Format(frequencyHz, 15)} Hz",
            _ => entered.ToString(),
        };
        return new SyncCalcQuantity(symbol, seconds, "s", given);
    }
}
