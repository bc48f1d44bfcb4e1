using System.Globalization;
using System.Numerics;
using Fractions;

namespace LogicProof.Language.Parsing;

/// <summary>Exact decimal text (<c>12</c>, <c>0.25</c>) to a fraction, digit by digit; never through binary floating point.</summary>
internal static class DecimalNumber
{
    /// <summary>Parses digits with at most one decimal point; the caller has checked the shape.</summary>
    public static Fraction Parse(string text)
    {
        var dot = text.IndexOf('.', StringComparison.Ordinal);
        if (dot < 0)
        {
            return new Fraction(BigInteger.Parse(text, NumberStyles.None, CultureInfo.InvariantCulture));
        }

        var digits = string.Concat(text.AsSpan(0, dot), text.AsSpan(dot + 1));
        var numerator = BigInteger.Parse(digits, NumberStyles.None, CultureInfo.InvariantCulture);
        return new Fraction(numerator, BigInteger.Pow(10, text.Length - dot - 1));
    }
}
