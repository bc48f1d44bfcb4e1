using System.Numerics;
using Fractions;
using LogicProof.Language.Syntax;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// Durations as whole scans, as the brief says: a duration is divided by the scan interval and rounded up (a preset
/// is never shortened). Cycles are turned into time with the power frequency, 1000 / f ms each.
/// </summary>
internal sealed class ReferenceTiming(SchemeSyntax scheme)
{
    private readonly Fraction _scanMilliseconds = Milliseconds(scheme.ScanInterval, scheme.FrequencyHz);

    public int Scans(DurationSyntax duration)
    {
        var exact = Milliseconds(duration, scheme.FrequencyHz) / _scanMilliseconds;
        var numerator = exact.Numerator;
        var denominator = exact.Denominator;
        if (denominator.Sign < 0)
        {
            (numerator, denominator) = (-numerator, -denominator);
        }

        var whole = BigInteger.DivRem(numerator, denominator, out var remainder);
        return (int)(remainder.Sign > 0 ? whole + 1 : whole);
    }

    private static Fraction Milliseconds(DurationSyntax duration, Fraction frequencyHz) =>
        duration.Milliseconds ?? duration.Cycles!.Value * new Fraction(1000) / frequencyHz;
}
