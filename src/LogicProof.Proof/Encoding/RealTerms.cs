using System.Globalization;
using System.Numerics;
using Fractions;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>Exact conversions between <see cref="Fraction"/> and Z3 real numerals (no binary floating point).</summary>
internal static class RealTerms
{
    public static RatNum Constant(Context context, Fraction value)
    {
        var reduced = value.Reduce();
        var magnitude = string.Create(
            CultureInfo.InvariantCulture,
            $"{BigInteger.Abs(reduced.Numerator)}/{reduced.Denominator}");
        var numeral = (RatNum)context.MkReal(magnitude);
        return reduced.Numerator.Sign < 0 ? (RatNum)context.MkUnaryMinus(numeral).Simplify() : numeral;
    }

    public static Fraction Read(Expr numeral) => numeral switch
    {
        RatNum rational => new Fraction(rational.BigIntNumerator, rational.BigIntDenominator),
        IntNum integer => new Fraction(integer.BigInteger),
        _ => throw new InvalidOperationException($"Expected a real numeral, got '{numeral}'."),
    };
}
