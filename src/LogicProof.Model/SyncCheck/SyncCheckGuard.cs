using System.Globalization;

namespace LogicProof.Model.SyncCheck;

internal static class SyncCheckGuard
{
    public static void Positive(double value, string what, string unit)
    {
        Finite(value, what);
        if (value <= 0)
        {
            throw new SyncCheckInputException($"{what} must be greater than zero; got {Show(value)}{WithUnit(unit)}.");
        }
    }

    public static void NonNegative(double value, string what, string unit)
    {
        Finite(value, what);
        if (value < 0)
        {
            throw new SyncCheckInputException($"{what} must not be negative; got {Show(value)}{WithUnit(unit)}.");
        }
    }

    /// <summary>The half-width theta of a window ±theta: a full turn is covered at 180, so more means nothing.</summary>
    public static void AngleWindow(double windowDeg)
    {
        Finite(windowDeg, "the angle window");
        if (windowDeg <= 0 || windowDeg > 180)
        {
            throw new SyncCheckInputException(
                $"the angle window ±theta must have theta greater than 0 and at most 180 degrees; got {Show(windowDeg)} deg.");
        }
    }

    /// <summary>A phase difference between the two voltages: 0 is allowed (in phase), 180 is the largest.</summary>
    public static void PhaseAngle(double angleDeg)
    {
        Finite(angleDeg, "the phase angle");
        if (angleDeg < 0 || angleDeg > 180)
        {
            throw new SyncCheckInputException(
                $"the phase angle must be between 0 and 180 degrees; got {Show(angleDeg)} deg.");
        }
    }

    public static void PowerFrequency(double frequencyHz) => Positive(frequencyHz, "the power frequency", "Hz");

    private static void Finite(double value, string what)
    {
        if (!double.IsFinite(value))
        {
            throw new SyncCheckInputException($"{what} must be a finite number; got {Show(value)}.");
        }
    }

    private static string Show(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string WithUnit(string unit) => unit.Length == 0 ? string.Empty : " " + unit;
}
