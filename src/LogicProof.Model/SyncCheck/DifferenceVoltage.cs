namespace LogicProof.Model.SyncCheck;

/// <summary>
/// The magnitude of the phasor difference V1 − V2 for a phase angle d between them, by the law of cosines:
/// |dV| = sqrt(V1² + V2² − 2·V1·V2·cos d), and back: d = arccos((V1² + V2² − dV²) / (2·V1·V2)).
/// Voltages in per unit or any one unit; |dV| comes out in that unit.
/// </summary>
public static class DifferenceVoltage
{
    // Lets a |dV| that is a rounding error past either end (such as 2·sin 90° computed as 2.0000000000000004)
    // count as that end rather than as an impossible value.
    private const double Tolerance = 1e-12;

    public static double Magnitude(double angleDeg, double v1, double v2)
    {
        SyncCheckGuard.PhaseAngle(angleDeg);
        CheckVoltages(v1, v2);

        // The same law of cosines rewritten as (V1 − V2)² + 4·V1·V2·sin²(d/2): no cancellation at small angles,
        // where 1 − cos d loses most of its digits.
        var halfSine = Math.Sin(angleDeg * Math.PI / 360);
        var difference = v1 - v2;
        return Math.Sqrt((difference * difference) + (4 * v1 * v2 * halfSine * halfSine));
    }

    public static double AngleDegrees(double dvMagnitude, double v1, double v2)
    {
        if (!double.IsFinite(dvMagnitude))
        {
            throw new SyncCheckInputException(
                $"the difference voltage |dV| must be a finite number; got {Show(dvMagnitude)}.");
        }

        CheckVoltages(v1, v2);
        var smallest = Math.Abs(v1 - v2);
        var largest = v1 + v2;
        if (dvMagnitude < 0 || dvMagnitude < smallest * (1 - Tolerance) || dvMagnitude > largest * (1 + Tolerance))
        {
            throw new SyncCheckInputException(
                $"no phase angle gives |dV| = {Show(dvMagnitude)} with V1 = {Show(v1)} and V2 = {Show(v2)}: "
                + $"|dV| can only be from |V1 - V2| = {Show(smallest)} (in phase) to V1 + V2 = {Show(largest)} (180 deg apart).");
        }

        // arccos((V1² + V2² − dV²) / (2·V1·V2)) written as 2·atan2(sin(d/2), cos(d/2)) with
        // sin²(d/2) = (dV² − (V1 − V2)²) / (4·V1·V2) and cos²(d/2) = ((V1 + V2)² − dV²) / (4·V1·V2): arccos
        // loses half its digits near 0 and 180 degrees, this form does not, so angle → |dV| → angle round-trips.
        var sinePart = Math.Sqrt(Math.Max(0, (dvMagnitude - smallest) * (dvMagnitude + smallest)));
        var cosinePart = Math.Sqrt(Math.Max(0, (largest - dvMagnitude) * (largest + dvMagnitude)));
        return 2 * Math.Atan2(sinePart, cosinePart) * 180 / Math.PI;
    }

    private static void CheckVoltages(double v1, double v2)
    {
        SyncCheckGuard.Positive(v1, "the voltage V1", "");
        SyncCheckGuard.Positive(v2, "the voltage V2", "");
    }

    private static string Show(double value) => SyncCheckNumber.Format(value, 6);
}
