using Fractions;
using LogicProof.Language.Parsing;
using LogicProof.Language.Syntax;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Parsing;

public class DurationTests
{
    // IEC 61131-3, duration literals (from memory): units d, h, m, s, ms, us; T# or TIME# prefix in any letter
    // case; underscores between digits and between components; a decimal part on the last component only; only
    // the most significant unit may overflow.
    [Theory]
    [InlineData("T#500ms", 500, 1)]
    [InlineData("T#1s200ms", 1200, 1)]
    [InlineData("TIME#1.5s", 1500, 1)]
    [InlineData("T#2m", 120_000, 1)]
    [InlineData("T#1h", 3_600_000, 1)]
    [InlineData("T#10us", 1, 100)]
    [InlineData("T#1d", 86_400_000, 1)]
    [InlineData("t#1h_2m_3s_4ms_5us", 3_723_004_005, 1000)]
    [InlineData("T#1_000ms", 1000, 1)]
    [InlineData("T#0.25s", 250, 1)]
    [InlineData("T#1m0.5s", 60_500, 1)]
    [InlineData("time#25h15m", 90_900_000, 1)]
    [InlineData("T#14ms", 14, 1)]
    [InlineData("T#1.5us", 3, 2000)]
    [InlineData("T#90s", 90_000, 1)]
    [InlineData("T#0ms", 0, 1)]
    [InlineData("T#1S200MS", 1200, 1)]
    public void ParseIec_WhenLiteralIsValid_GivesExactMilliseconds(string literal, long numerator, long denominator)
    {
        var (milliseconds, error) = DurationParser.ParseIec(literal);

        Assert.Null(error);
        Assert.Equal(new Fraction(numerator, denominator), milliseconds);
    }

    [Theory]
    [InlineData("T#5")]
    [InlineData("T#5x")]
    [InlineData("T#ms")]
    [InlineData("T#1.5s200ms")]
    [InlineData("T#200ms1s")]
    [InlineData("T#1s1s")]
    [InlineData("T#1h75m")]
    [InlineData("T#1s1000ms")]
    [InlineData("T#1__000ms")]
    [InlineData("T#_1s")]
    [InlineData("T#1s_")]
    [InlineData("T#1.s")]
    [InlineData("T#.5s")]
    [InlineData("T#1..5s")]
    [InlineData("T#1min")]
    [InlineData("T#1ns")]
    public void ParseIec_WhenLiteralIsInvalid_GivesAnErrorAndNoValue(string literal)
    {
        var (milliseconds, error) = DurationParser.ParseIec(literal);

        Assert.Null(milliseconds);
        Assert.NotNull(error);
        Assert.Contains(literal, error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("2", "ms", 2, 1, false)]
    [InlineData("0.5", "s", 500, 1, false)]
    [InlineData("0.5", "S", 500, 1, false)]
    [InlineData("1.25", "ms", 5, 4, false)]
    [InlineData("30", "cyc", 30, 1, true)]
    [InlineData("0.25", "CYC", 1, 4, true)]
    [InlineData("1", "cycle", 1, 1, true)]
    [InlineData("2.5", "Cycles", 5, 2, true)]
    public void ParseWithUnit_WhenUnitIsKnown_GivesExactMillisecondsOrCycles(string number, string unit, long numerator, long denominator, bool inCycles)
    {
        var (milliseconds, cycles, error) = DurationParser.ParseWithUnit(number, unit);

        Assert.Null(error);
        Assert.Equal(new Fraction(numerator, denominator), inCycles ? cycles : milliseconds);
        Assert.Null(inCycles ? milliseconds : cycles);
    }

    [Theory]
    [InlineData("min")]
    [InlineData("us")]
    [InlineData("sec")]
    [InlineData("hz")]
    public void ParseWithUnit_WhenUnitIsUnknown_GivesAnError(string unit)
    {
        var (milliseconds, cycles, error) = DurationParser.ParseWithUnit("5", unit);

        Assert.Null(milliseconds);
        Assert.Null(cycles);
        Assert.Contains(unit, error, StringComparison.Ordinal);
    }

    [Fact]
    public void Load_WhenDurationsAreWritten_KeepsTheirTextAndExactValue()
    {
        var result = Scheme.Load("scheme T;\nfrequency 60 Hz;\nscan 0.25 cyc;\nsettings\n  A : time = T#1s200ms;\n  B : time = 0.5   s;\nend\n");

        Assert.Equal(new Fraction(1, 4), result.Syntax!.ScanInterval.Cycles);
        Assert.Null(result.Syntax.ScanInterval.Milliseconds);
        var a = Assert.IsType<DurationLiteralSyntax>(result.Syntax.Settings[0].Value).Duration;
        var b = Assert.IsType<DurationLiteralSyntax>(result.Syntax.Settings[1].Value).Duration;
        Assert.Equal(("T#1s200ms", new Fraction(1200)), (a.Text, a.Milliseconds!.Value));
        Assert.Equal(("0.5 s", new Fraction(500)), (b.Text, b.Milliseconds!.Value));
    }
}
