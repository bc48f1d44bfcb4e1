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

    /// <summary>True for one or more ASCII digits, optionally followed by a point and one or more digits.</summary>
    public static bool IsWellFormed(ReadOnlySpan<char> text)
    {
        var dot = text.IndexOf('.');
        var whole = dot < 0 ? text : text[..dot];
        var fraction = dot < 0 ? "1".AsSpan() : text[(dot + 1)..];
        return whole.Length > 0 && fraction.Length > 0 && AllDigits(whole) && AllDigits(fraction);
    }

    private static bool AllDigits(ReadOnlySpan<char> text)
    {
        foreach (var c in text)
        {
            if (c is < '0' or > '9')
            {
                return false;
            }
        }

        return true;
    }
}
