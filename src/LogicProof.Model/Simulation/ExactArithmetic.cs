using System.Numerics;
using Fractions;

namespace LogicProof.Model.Simulation;

/// <summary>
/// The real operations of <see cref="Scan.ScanExpression"/> on exact rationals. Relay quantities are small
/// fractions, so when both operands have numerator and denominator within 32 bits the work is done in 64-bit
/// integers (no product can overflow) and the result is built already in lowest terms; anything larger goes
/// through <see cref="Fraction"/>'s own BigInteger arithmetic. Both paths give the same exact value.
/// </summary>
internal static class ExactArithmetic
{
    private const long SmallLimit = int.MaxValue;

    public static Fraction Add(Fraction left, Fraction right)
    {
        if (TrySmall(left, out var ln, out var ld) && TrySmall(right, out var rn, out var rd))
        {
            return ld == rd ? Reduced(ln + rn, ld) : Reduced((ln * rd) + (rn * ld), ld * rd);
        }

        return left + right;
    }

    public static Fraction Subtract(Fraction left, Fraction right)
    {
        if (TrySmall(left, out var ln, out var ld) && TrySmall(right, out var rn, out var rd))
        {
            return ld == rd ? Reduced(ln - rn, ld) : Reduced((ln * rd) - (rn * ld), ld * rd);
        }

        return left - right;
    }

    public static Fraction Negate(Fraction operand) =>
        TrySmall(operand, out var n, out var d) ? Reduced(-n, d) : -operand;

    public static Fraction Scale(Fraction factor, Fraction operand)
    {
        if (TrySmall(factor, out var fn, out var fd) && TrySmall(operand, out var on, out var od))
        {
            return Reduced(fn * on, fd * od);
        }

        return factor * operand;
    }

    public static Fraction Abs(Fraction operand) => Compare(operand, Fraction.Zero) < 0 ? Negate(operand) : operand;

    public static Fraction Min(Fraction left, Fraction right) => Compare(left, right) <= 0 ? left : right;

    public static Fraction Max(Fraction left, Fraction right) => Compare(left, right) >= 0 ? left : right;

    public static int Compare(Fraction left, Fraction right)
    {
        if (TrySmall(left, out var ln, out var ld) && TrySmall(right, out var rn, out var rd))
        {
            return (ln * rd).CompareTo(rn * ld);
        }

        return left.CompareTo(right);
    }

    /// <summary>The smallest integer at or above <paramref name="value"/>.</summary>
    public static BigInteger Ceiling(Fraction value)
    {
        var numerator = value.Numerator;
        var denominator = value.Denominator;
        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        var quotient = BigInteger.DivRem(numerator, denominator, out var remainder);
        return remainder.Sign > 0 ? quotient + 1 : quotient;
    }

    private static bool TrySmall(Fraction value, out long numerator, out long denominator)
    {
        var n = value.Numerator;
        var d = value.Denominator;
        if (d.Sign > 0 && d <= SmallLimit && n <= SmallLimit && n >= -SmallLimit)
        {
            numerator = (long)n;
            denominator = (long)d;
            return true;
        }

        numerator = 0;
        denominator = 1;
        return false;
    }

    /// <summary>numerator/denominator in lowest terms; the denominator is positive.</summary>
    private static Fraction Reduced(long numerator, long denominator)
    {
        var a = Math.Abs(numerator);
        var b = denominator;
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        if (a > 1)
        {
            numerator /= a;
            denominator /= a;
        }

        return new Fraction(new BigInteger(numerator), new BigInteger(denominator), false);
    }
}
