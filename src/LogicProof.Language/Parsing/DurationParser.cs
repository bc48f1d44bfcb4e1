using Fractions;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Duration literals to exact milliseconds or cycles.
/// IEC 61131-3 form (the standard's duration literals, cited from memory): <c>T#</c> or <c>TIME#</c>, then
/// components with units d, h, m, s, ms, us in that order, each at most once; only the last may have a decimal
/// part; underscores may separate digits and components; only the most significant component may overflow
/// (<c>T#25h15m</c> but not <c>T#1h75m</c>). Number-and-unit form (ours): a decimal number and ms, s, or
/// cyc/cycle/cycles, any letter case.
/// </summary>
internal static class DurationParser
{
    private static readonly (string Unit, Fraction Milliseconds, int Limit)[] IecUnits =
    [
        ("d", new Fraction(86_400_000), 0),
        ("h", new Fraction(3_600_000), 24),
        ("m", new Fraction(60_000), 60),
        ("s", new Fraction(1_000), 60),
        ("ms", Fraction.One, 1_000),
        ("us", new Fraction(1, 1_000), 1_000),
    ];

    /// <summary>Milliseconds of an IEC literal such as <c>T#1s200ms</c>, or an error message.</summary>
    public static (Fraction? Milliseconds, string? Error) ParseIec(string literal)
    {
        var hash = literal.IndexOf('#', StringComparison.Ordinal);
        var body = literal[(hash + 1)..].ToLowerInvariant();
        var total = Fraction.Zero;
        var position = 0;
        var lastUnitIndex = -1;
        var first = true;
        while (position < body.Length)
        {
            var numberStart = position;
            if (!ReadNumber(body, ref position, out var digits))
            {
                return (null, $"'{literal}' is not a duration: expected a number at '{body[numberStart..]}'");
            }

            var unitIndex = ReadUnit(body, ref position);
            if (unitIndex < 0)
            {
                var rest = body[position..];
                return (null, rest.Length == 0
                    ? $"'{literal}' is not a duration: the number {digits} has no unit (d, h, m, s, ms or us)"
                    : $"'{literal}' is not a duration: unknown unit at '{rest}' (use d, h, m, s, ms or us)");
            }

            var unit = IecUnits[unitIndex];
            if (unitIndex <= lastUnitIndex)
            {
                return (null, $"'{literal}' is not a duration: units must appear once each, largest first (d, h, m, s, ms, us)");
            }

            var value = DecimalNumber.Parse(digits);
            var atEnd = position == body.Length;
            if (digits.Contains('.', StringComparison.Ordinal) && !atEnd)
            {
                return (null, $"'{literal}' is not a duration: only the last component may have a decimal part");
            }

            if (!first && value >= new Fraction(unit.Limit))
            {
                return (null, $"'{literal}' is not a duration: {digits}{unit.Unit} overflows into the next larger unit; only the first component may do so");
            }

            total += value * unit.Milliseconds;
            lastUnitIndex = unitIndex;
            first = false;
            if (!atEnd && body[position] == '_')
            {
                position++;
                if (position == body.Length)
                {
                    return (null, $"'{literal}' is not a duration: it ends with an underscore");
                }
            }
        }

        return first ? (null, $"'{literal}' is not a duration: nothing follows '#'") : (total, null);
    }

    /// <summary>A number with a unit (<c>2 ms</c>, <c>0.5 s</c>, <c>30 cyc</c>): milliseconds or cycles, or an error.</summary>
    public static (Fraction? Milliseconds, Fraction? Cycles, string? Error) ParseWithUnit(string number, string unit)
    {
        var value = DecimalNumber.Parse(number);
        return unit.ToLowerInvariant() switch
        {
            "ms" => (value, null, null),
            "s" => (value * 1000, null, null),
            "cyc" or "cycle" or "cycles" => (null, value, null),
            _ => (null, null, $"'{unit}' is not a time unit: write ms, s or cyc after the number, or an IEC duration such as T#{number}s"),
        };
    }

    /// <summary>Digits with optional single underscores between them and an optional decimal part.</summary>
    private static bool ReadNumber(string body, ref int position, out string digits)
    {
        var builder = new System.Text.StringBuilder();
        var sawDot = false;
        while (position < body.Length)
        {
            var c = body[position];
            if (char.IsAsciiDigit(c))
            {
                builder.Append(c);
                position++;
            }
            else if (c == '_' && builder.Length > 0 && char.IsAsciiDigit(builder[^1]) && position + 1 < body.Length && char.IsAsciiDigit(body[position + 1]))
            {
                position++;
            }
            else if (c == '.' && !sawDot && builder.Length > 0 && position + 1 < body.Length && char.IsAsciiDigit(body[position + 1]))
            {
                sawDot = true;
                builder.Append(c);
                position++;
            }
            else
            {
                break;
            }
        }

        digits = builder.ToString();
        return digits.Length > 0;
    }

    private static int ReadUnit(string body, ref int position)
    {
        // Two-letter units first, so "ms" is not read as minutes followed by "s".
        foreach (var index in new[] { 4, 5, 0, 1, 2, 3 })
        {
            var unit = IecUnits[index].Unit;
            if (string.CompareOrdinal(body, position, unit, 0, unit.Length) == 0)
            {
                position += unit.Length;
                return index;
            }
        }

        return -1;
    }
}
