using System.Globalization;
using System.Numerics;
using System.Text;
using Fractions;

namespace LogicProof.Model.Simulation;

/// <summary>
/// Exact rationals as text, independent of the culture. Accepted: an optional sign, digits, and an optional
/// decimal point followed by digits (<c>-12.125</c>), or a fraction of two integers (<c>1/3</c>). Written: a decimal
/// when the value has a finite decimal expansion, otherwise <c>p/q</c> in lowest terms (exact); or, for
/// people, at most a given number of decimals with a trailing <c>~</c> when the value had to be rounded.
/// </summary>
public static class ExactNumberText
{
    /// <summary>The marker after a value rounded for display.</summary>
    public const char RoundedMarker = '~';

    public static bool TryParse(ReadOnlySpan<char> text, out Fraction value)
    {
        value = Fraction.Zero;
        var slash = text.IndexOf('/');
        if (slash >= 0)
        {
            if (!TryParseInteger(text[..slash], allowSign: true, out var numerator)
                || !TryParseInteger(text[(slash + 1)..], allowSign: false, out var denominator)
                || denominator.IsZero)
            {
                return false;
            }

            value = new Fraction(numerator, denominator);
            return true;
        }

        var point = text.IndexOf('.');
        var whole = point >= 0 ? text[..point] : text;
        var decimals = point >= 0 ? text[(point + 1)..] : [];
        if (point >= 0 && decimals.IsEmpty)
        {
            return false;
        }

        if (!TryParseInteger(whole, allowSign: true, out var integerPart)
            || (!decimals.IsEmpty && !TryParseInteger(decimals, allowSign: false, out _)))
        {
            return false;
        }

        var negative = whole.Length > 0 && whole[0] == '-';
        var scale = BigInteger.Pow(10, decimals.Length);
        var fractional = decimals.IsEmpty ? BigInteger.Zero : BigInteger.Parse(decimals, NumberStyles.None, CultureInfo.InvariantCulture);
        var magnitude = (BigInteger.Abs(integerPart) * scale) + fractional;
        value = new Fraction(negative ? -magnitude : magnitude, scale);
        return true;
    }

    /// <summary>The exact value: a decimal if it terminates, else <c>p/q</c>.</summary>
    public static string FormatExact(Fraction value)
    {
        var (numerator, denominator) = Reduced(value);
        return TryDecimalDigits(denominator, out var digits)
            ? FormatDecimal(numerator, denominator, digits)
            : numerator.ToString(CultureInfo.InvariantCulture) + "/" + denominator.ToString(CultureInfo.InvariantCulture);
    }

    /// <summary>
    /// The value with at most <paramref name="maxDecimals"/> decimals: exact if it fits, otherwise rounded half
    /// away from zero and followed by <see cref="RoundedMarker"/>.
    /// </summary>
    public static string FormatForDisplay(Fraction value, int maxDecimals = 4)
    {
        var (numerator, denominator) = Reduced(value);
        if (TryDecimalDigits(denominator, out var digits) && digits <= maxDecimals)
        {
            return FormatDecimal(numerator, denominator, digits);
        }

        var scale = BigInteger.Pow(10, maxDecimals);
        var twiceScaled = 2 * BigInteger.Abs(numerator) * scale;
        var rounded = (twiceScaled + denominator) / (2 * denominator);
        var text = FormatDecimal(numerator.Sign < 0 ? -rounded : rounded, scale, maxDecimals);
        return text + RoundedMarker;
    }

    /// <summary>Whether the value has a finite decimal expansion.</summary>
    public static bool IsTerminating(Fraction value) => TryDecimalDigits(Reduced(value).Denominator, out _);

    /// <summary>
    /// The value with at most <paramref name="maxDecimals"/> decimals, rounded toward negative infinity; exact when
    /// the value has that few decimals.
    /// </summary>
    public static Fraction Floor(Fraction value, int maxDecimals)
    {
        var (numerator, denominator) = Reduced(value);
        var scale = BigInteger.Pow(10, maxDecimals);
        var scaled = BigInteger.DivRem(numerator * scale, denominator, out var remainder);
        if (remainder.Sign < 0)
        {
            scaled -= 1;
        }

        return new Fraction(scaled, scale);
    }

    private static (BigInteger Numerator, BigInteger Denominator) Reduced(Fraction value)
    {
        var numerator = value.Numerator;
        var denominator = value.Denominator;
        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        if (denominator.IsZero)
        {
            throw new ArgumentException("not a finite rational value.", nameof(value));
        }

        var divisor = BigInteger.GreatestCommonDivisor(numerator, denominator);
        return divisor.IsOne || divisor.IsZero ? (numerator, denominator) : (numerator / divisor, denominator / divisor);
    }

    private static bool TryDecimalDigits(BigInteger denominator, out int digits)
    {
        var twos = 0;
        var fives = 0;
        while (denominator.IsEven)
        {
            denominator >>= 1;
            twos++;
        }

        while ((denominator % 5).IsZero)
        {
            denominator /= 5;
            fives++;
        }

        digits = Math.Max(twos, fives);
        return denominator.IsOne;
    }

    private static string FormatDecimal(BigInteger numerator, BigInteger denominator, int digits)
    {
        var scaled = BigInteger.Abs(numerator) * BigInteger.Pow(10, digits) / denominator;
        var text = scaled.ToString(CultureInfo.InvariantCulture).PadLeft(digits + 1, '0');
        var builder = new StringBuilder();
        if (numerator.Sign < 0)
        {
            builder.Append('-');
        }

        builder.Append(text, 0, text.Length - digits);
        var fraction = text[^digits..].TrimEnd('0');
        if (fraction.Length > 0)
        {
            builder.Append('.').Append(fraction);
        }

        return builder.ToString();
    }

    private static bool TryParseInteger(ReadOnlySpan<char> text, bool allowSign, out BigInteger value)
    {
        value = BigInteger.Zero;
        var digits = text;
        if (allowSign && digits.Length > 0 && (digits[0] == '-' || digits[0] == '+'))
        {
            digits = digits[1..];
        }

        if (digits.IsEmpty || digits.Length > 400)
        {
            return false;
        }

        foreach (var c in digits)
        {
            if (c is < '0' or > '9')
            {
                return false;
            }
        }

        value = BigInteger.Parse(digits, NumberStyles.None, CultureInfo.InvariantCulture);
        if (text[0] == '-')
        {
            value = -value;
        }

        return true;
    }
}
