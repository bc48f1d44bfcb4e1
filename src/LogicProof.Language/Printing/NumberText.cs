using System.Globalization;
using System.Numerics;
using Fractions;

namespace LogicProof.Language.Printing;

/// <summary>Exact decimal text of a fraction whose decimal expansion terminates (0.25, -1.5, 60), culture-invariant.</summary>
internal static class NumberText
{
    /// <summary>The decimal text, or <paramref name="fallback"/> when the expansion does not terminate (1/3).</summary>
    public static string Format(Fraction value, string fallback) => TryFormat(value) ?? fallback;

    /// <summary>The decimal text, or the fraction's culture-invariant text when the expansion does not terminate.</summary>
    public static string Format(Fraction value) => TryFormat(value) ?? value.ToString(CultureInfo.InvariantCulture);

    public static string? TryFormat(Fraction value)
    {
        var reduced = value.Reduce();
        var denominator = BigInteger.Abs(reduced.Denominator);
        var numerator = reduced.Denominator.Sign < 0 ? -reduced.Numerator : reduced.Numerator;
        var twos = Strip(ref denominator, 2);
        var fives = Strip(ref denominator, 5);
        if (!denominator.IsOne)
        {
            return null;
        }

        var scale = Math.Max(twos, fives);
        var scaled = BigInteger.Abs(numerator) * BigInteger.Pow(10, scale) / (BigInteger.Pow(2, twos) * BigInteger.Pow(5, fives));
        var digits = scaled.ToString(CultureInfo.InvariantCulture).PadLeft(scale + 1, '0');
        var text = scale == 0 ? digits : string.Concat(digits.AsSpan(0, digits.Length - scale), ".", digits.AsSpan(digits.Length - scale));
        return numerator.Sign < 0 ? "-" + text : text;
    }

    private static int Strip(ref BigInteger value, int factor)
    {
        var count = 0;
        while (!value.IsZero && (value % factor).IsZero)
        {
            value /= factor;
            count++;
        }

        return count;
    }
}
