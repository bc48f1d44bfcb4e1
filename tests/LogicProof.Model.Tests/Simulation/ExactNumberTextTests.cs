using Fractions;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

public sealed class ExactNumberTextTests
{
    [Theory]
    [InlineData("0", 0, 1)]
    [InlineData("12.125", 97, 8)]
    [InlineData("-0.5", -1, 2)]
    [InlineData("+3", 3, 1)]
    [InlineData("1/3", 1, 3)]
    [InlineData("-2/6", -1, 3)]
    public void TryParse_WhenValid_GivesExactValue(string text, int numerator, int denominator)
    {
        Assert.True(ExactNumberText.TryParse(text, out var value));
        Assert.Equal(new Fraction(numerator, denominator), value);
    }

    [Theory]
    [InlineData("")]
    [InlineData("1.")]
    [InlineData(".5")]
    [InlineData("1,5")]
    [InlineData("1e3")]
    [InlineData("1/0")]
    [InlineData("1/-2")]
    [InlineData("--1")]
    [InlineData("0x10")]
    [InlineData("١")]
    public void TryParse_WhenMalformed_Fails(string text)
    {
        Assert.False(ExactNumberText.TryParse(text, out _));
    }

    [Theory]
    [InlineData(97, 8, "12.125")]
    [InlineData(-1, 2, "-0.5")]
    [InlineData(1, 3, "1/3")]
    [InlineData(-25, 6, "-25/6")]
    [InlineData(1000, 1, "1000")]
    public void FormatExact_WhenTerminatingOrNot_GivesDecimalOrFraction(int numerator, int denominator, string expected)
    {
        Assert.Equal(expected, ExactNumberText.FormatExact(new Fraction(numerator, denominator)));
    }

    [Theory]
    [InlineData(97, 8, "12.125")]
    [InlineData(25, 6, "4.1667~")]
    [InlineData(-25, 6, "-4.1667~")]
    [InlineData(1, 32, "0.0313~")]
    [InlineData(2, 3, "0.6667~")]
    [InlineData(1, 300000, "0~")]
    public void FormatForDisplay_WhenMoreThanFourDecimals_RoundsAndMarksIt(int numerator, int denominator, string expected)
    {
        Assert.Equal(expected, ExactNumberText.FormatForDisplay(new Fraction(numerator, denominator)));
    }

    [Fact]
    public void Floor_WhenNotTerminating_RoundsDown()
    {
        Assert.Equal(new Fraction(41666, 10000), ExactNumberText.Floor(new Fraction(25, 6), 4));
        Assert.Equal(new Fraction(-41667, 10000), ExactNumberText.Floor(new Fraction(-25, 6), 4));
    }
}
