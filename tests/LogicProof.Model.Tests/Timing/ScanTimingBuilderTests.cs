using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language;
using LogicProof.Language.Syntax;
using LogicProof.Model.Timing;

namespace LogicProof.Model.Tests.Timing;

public sealed class ScanTimingBuilderTests
{
    private static readonly SourceSpan At = new("bay.lpl", 40, 8, 3, 6);

    [Fact]
    public void Build_WhenQuarterCycleAt60Hz_IsExactlyOne240thOfASecond()
    {
        var scan = DurationSyntax.FromCycles(new Fraction(1, 4), "0.25 cyc", At);

        var timing = ScanTimingBuilder.Build(new Fraction(60), scan, SourceSpan.None, new DiagnosticBag())!;

        // A quarter cycle at 60 Hz: 1/240 s = 25/6 ms (about 4.1667 ms), kept exact.
        Assert.Equal(new Fraction(25, 6), timing.ScanMilliseconds);
        Assert.Equal(new Fraction(60), timing.FrequencyHz);
    }

    [Fact]
    public void Build_WhenHalfCycleAt50Hz_IsTenMilliseconds()
    {
        var scan = DurationSyntax.FromCycles(new Fraction(1, 2), "0.5 cyc", At);

        var timing = ScanTimingBuilder.Build(new Fraction(50), scan, SourceSpan.None, new DiagnosticBag())!;

        Assert.Equal(new Fraction(10), timing.ScanMilliseconds);
    }

    [Fact]
    public void Build_WhenScanInMilliseconds_KeepsIt()
    {
        var scan = DurationSyntax.FromMilliseconds(new Fraction(2), "2 ms", At);

        var timing = ScanTimingBuilder.Build(new Fraction(60), scan, SourceSpan.None, new DiagnosticBag())!;

        Assert.Equal(new Fraction(2), timing.ScanMilliseconds);
    }

    [Fact]
    public void Build_WhenScanIntervalIsZeroInAFile_ReportsScanIntervalNotPositiveAtTheInterval()
    {
        // The front end rejects this file too, but still gives its syntax tree; the model's own check must hold.
        var front = FrontEnd.LoadText("bay.lpl", "scheme T;\nfrequency 60 Hz;\nscan 0 ms;\n");
        var diagnostics = new DiagnosticBag();

        var timing = ScanTimingBuilder.Build(front.Syntax!, diagnostics);

        Assert.Null(timing);
        var error = Assert.Single(diagnostics);
        Assert.Equal(ModelCodes.ScanIntervalNotPositive, error.Code);
        Assert.Equal((3, 6), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Build_WhenFrequencyIsZero_ReportsFrequencyNotPositiveAtTheGivenPlace()
    {
        var scan = DurationSyntax.FromCycles(new Fraction(1, 4), "0.25 cyc", At);
        var diagnostics = new DiagnosticBag();
        var header = new SourceSpan("bay.lpl", 0, 6, 1, 1);

        var timing = ScanTimingBuilder.Build(Fraction.Zero, scan, header, diagnostics);

        Assert.Null(timing);
        var error = Assert.Single(diagnostics);
        Assert.Equal(ModelCodes.FrequencyNotPositive, error.Code);
        Assert.Equal((1, 1), (error.Span.Line, error.Span.Column));
    }
}
