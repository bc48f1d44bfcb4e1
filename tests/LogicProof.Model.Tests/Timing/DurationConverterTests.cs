using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using LogicProof.Model.Scan;
using LogicProof.Model.Timing;

namespace LogicProof.Model.Tests.Timing;

public sealed class DurationConverterTests
{
    private static readonly SourceSpan At = new("bay.lpl", 10, 5, 2, 7);

    // Scan intervals common in protection relays: a quarter or half power cycle, or 1, 2 or 4 ms ("common practice").
    private static readonly ScanTiming QuarterCycle60Hz = new(new Fraction(60), new Fraction(1000, 240));
    private static readonly ScanTiming TwoMilliseconds = new(new Fraction(60), new Fraction(2));

    private static DurationSyntax Ms(Fraction ms) => DurationSyntax.FromMilliseconds(ms, ms.ToString(System.Globalization.CultureInfo.InvariantCulture) + " ms", At);

    [Fact]
    public void Convert_When25msAtQuarterCycleScan60Hz_IsExactlySixScansNotRounded()
    {
        var rounding = new DurationConverter(QuarterCycle60Hz).Convert(Ms(new Fraction(25)), new DiagnosticBag())!;

        // 25 ms / (1/240 s) = 25 * 240 / 1000 = 6 exactly, although 1/240 s = 4.1667 ms is not a terminating decimal.
        Assert.Equal(new Fraction(6), rounding.ExactScans);
        Assert.Equal(6, rounding.Scans);
        Assert.False(rounding.WasRounded);
    }

    [Fact]
    public void Convert_When25msAt2msScan_IsTwelveAndAHalfRoundedUpToThirteen()
    {
        var rounding = new DurationConverter(TwoMilliseconds).Convert(Ms(new Fraction(25)), new DiagnosticBag())!;

        Assert.Equal(new Fraction(25, 2), rounding.ExactScans);
        Assert.Equal(13, rounding.Scans);
        Assert.True(rounding.WasRounded);
        Assert.Equal(At, rounding.Span);
    }

    // Common scan intervals ("common practice"): quarter cycle, half cycle, 1 ms, 2 ms, 4 ms; 100 ms at each.
    [Theory]
    [InlineData(1, 4, 60, 24)]
    [InlineData(1, 2, 60, 12)]
    [InlineData(1, 4, 50, 20)]
    [InlineData(1, 2, 50, 10)]
    public void Convert_When100msAtCycleFractionScans_IsExact(int cyclesNumerator, int cyclesDenominator, int hertz, int expectedScans)
    {
        var frequency = new Fraction(hertz);
        var scanMs = DurationConverter.ToMilliseconds(
            DurationSyntax.FromCycles(new Fraction(cyclesNumerator, cyclesDenominator), "scan", At), frequency);
        var rounding = new DurationConverter(new ScanTiming(frequency, scanMs)).Convert(Ms(new Fraction(100)), new DiagnosticBag())!;

        Assert.Equal(expectedScans, rounding.Scans);
        Assert.False(rounding.WasRounded);
    }

    [Theory]
    [InlineData(1, 100)]
    [InlineData(2, 50)]
    [InlineData(4, 25)]
    public void Convert_When100msAtMillisecondScans_IsExact(int scanMs, int expectedScans)
    {
        var timing = new ScanTiming(new Fraction(60), new Fraction(scanMs));
        var rounding = new DurationConverter(timing).Convert(Ms(new Fraction(100)), new DiagnosticBag())!;

        Assert.Equal(expectedScans, rounding.Scans);
    }

    [Fact]
    public void Convert_WhenPresetInCycles_UsesThePowerFrequency()
    {
        var thirtyCycles = DurationSyntax.FromCycles(new Fraction(30), "30 cyc", At);

        var rounding = new DurationConverter(TwoMilliseconds).Convert(thirtyCycles, new DiagnosticBag())!;

        // 30 cycles at 60 Hz = 500 ms = 250 scans of 2 ms.
        Assert.Equal(250, rounding.Scans);
        Assert.False(rounding.WasRounded);
    }

    [Fact]
    public void Convert_WhenOneCycleAt2msScan_RoundsTheExactThirdUp()
    {
        var oneCycle = DurationSyntax.FromCycles(Fraction.One, "1 cyc", At);

        var rounding = new DurationConverter(TwoMilliseconds).Convert(oneCycle, new DiagnosticBag())!;

        // 1/60 s = 50/3 ms = 25/3 scans of 2 ms = 8.33..., used as 9.
        Assert.Equal(new Fraction(25, 3), rounding.ExactScans);
        Assert.Equal(9, rounding.Scans);
    }

    [Fact]
    public void Convert_WhenZero_IsZeroScansNotRounded()
    {
        var rounding = new DurationConverter(TwoMilliseconds).Convert(Ms(Fraction.Zero), new DiagnosticBag())!;

        Assert.Equal(0, rounding.Scans);
        Assert.False(rounding.WasRounded);
    }

    [Fact]
    public void Convert_WhenLongerThanACounterHolds_ReportsPresetTooLongAtTheDuration()
    {
        var diagnostics = new DiagnosticBag();
        var oneYear = Ms(new Fraction(365L * 24 * 3600 * 1000));

        var rounding = new DurationConverter(TwoMilliseconds).Convert(oneYear, diagnostics);

        Assert.Null(rounding);
        var error = Assert.Single(diagnostics);
        Assert.Equal(ModelCodes.PresetTooLong, error.Code);
        Assert.Equal(Severity.Error, error.Severity);
        Assert.Equal((2, 7), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Convert_WhenExactlyTheLargestCount_IsAccepted()
    {
        var longest = Ms(new Fraction(2L * DurationConverter.MaxPresetScans));

        var rounding = new DurationConverter(TwoMilliseconds).Convert(longest, new DiagnosticBag());

        Assert.Equal(DurationConverter.MaxPresetScans, rounding!.Scans);
    }
}
