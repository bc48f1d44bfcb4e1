using System.Numerics;
using Fractions;

namespace LogicProof.Reports.Exports;

/// <summary>
/// The time unit of a value change dump: the largest of 1 s, 100 ms, 10 ms, ... 1 ns in which every time given
/// is a whole number, so the dump is exact. When none is (a scan of 25/6 ms, say), 1 ns with every time rounded
/// to the nearest nanosecond (halves up), and <see cref="Rounded"/> set so the dump can say so.
/// </summary>
public sealed record VcdTimescale(string Text, Fraction UnitMilliseconds, bool Rounded)
{
    private static readonly (string Text, Fraction Ms)[] Units =
    [
        ("1 s", new Fraction(1000)),
        ("100 ms", new Fraction(100)),
        ("10 ms", new Fraction(10)),
        ("1 ms", new Fraction(1)),
        ("100 us", new Fraction(1, 10)),
        ("10 us", new Fraction(1, 100)),
        ("1 us", new Fraction(1, 1000)),
        ("100 ns", new Fraction(1, 10_000)),
        ("10 ns", new Fraction(1, 100_000)),
        ("1 ns", new Fraction(1, 1_000_000)),
    ];

    public static VcdTimescale Choose(IEnumerable<Fraction> timesMs)
    {
        ArgumentNullException.ThrowIfNull(timesMs);
        var times = timesMs.ToList();
        foreach (var (text, ms) in Units)
        {
            if (times.All(time => IsWhole(time / ms)))
            {
                return new VcdTimescale(text, ms, Rounded: false);
            }
        }

        var (finest, finestMs) = Units[^1];
        return new VcdTimescale(finest, finestMs, Rounded: true);
    }

    /// <summary>The time in units: exact when the unit allows, else rounded to the nearest unit, halves up.</summary>
    public BigInteger Ticks(Fraction timeMs)
    {
        var units = timeMs / UnitMilliseconds;
        var numerator = units.Numerator;
        var denominator = units.Denominator;
        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        return BigInteger.Divide((2 * numerator) + denominator, 2 * denominator);
    }

    private static bool IsWhole(Fraction value) => (value.Numerator % value.Denominator).IsZero;
}
