using System.Globalization;

namespace LogicProof.Model.SyncCheck;

/// <summary>Reads and writes numbers the same way whatever the machine's culture: '.' as the decimal separator.</summary>
public static class SyncCheckNumber
{
    public const int DefaultSignificantDigits = 5;

    public static double Parse(string text, string what)
    {
        ArgumentNullException.ThrowIfNull(text);
        var trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            throw new SyncCheckInputException($"{what} has no number.");
        }

        if (!double.TryParse(trimmed, NumberStyles.Float, CultureInfo.InvariantCulture, out var value)
            || !double.IsFinite(value))
        {
            var hint = trimmed.Contains(',') ? " (use '.' as the decimal separator)" : string.Empty;
            throw new SyncCheckInputException($"{what} '{trimmed}' is not a number{hint}.");
        }

        return value;
    }

    /// <summary>
    /// Rounds to <paramref name="significantDigits"/> significant digits and drops trailing zeros, so that
    /// 0.347296 prints as 0.3473 and 3.6000000000000005 as 3.6; very large or small values use an exponent.
    /// </summary>
    public static string Format(double value, int significantDigits = DefaultSignificantDigits)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(significantDigits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(significantDigits, 15);
        if (value == 0)
        {
            return "0";
        }

        var magnitude = Math.Abs(value);
        if (!double.IsFinite(value) || magnitude < 1e-6 || magnitude >= 1e15)
        {
            return value.ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        }

        var decimals = significantDigits - 1 - (int)Math.Floor(Math.Log10(magnitude));
        var rounded = decimals >= 0
            ? Math.Round(value, Math.Min(decimals, 15), MidpointRounding.AwayFromZero)
            : Math.Round(value / Math.Pow(10, -decimals), MidpointRounding.AwayFromZero) * Math.Pow(10, -decimals);
        return rounded.ToString("0.###############", CultureInfo.InvariantCulture);
    }
}
