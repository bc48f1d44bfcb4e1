using System.Globalization;
using System.Numerics;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;
using LogicProof.Reports.Exports;
using LogicProof.Reports.Tests.Check;

namespace LogicProof.Reports.Tests.Exports;

/// <summary>Structure per IEEE 1364-2005 §18.2 (value change dump format), from memory.</summary>
public sealed class VcdExporterTests
{
    [Fact]
    public void Export_SampleTrace_HasHeaderDeclarationsAndIncreasingTimestamps()
    {
        var lines = Export(ReportSamples.Violation()).Split('\n', StringSplitOptions.RemoveEmptyEntries);

        var definitionsEnd = Array.IndexOf(lines, "$enddefinitions $end");
        Assert.True(definitionsEnd > 0);
        var header = lines[..definitionsEnd];
        Assert.Contains("$timescale 1 ms $end", header);
        Assert.Contains("$scope module QM7_CLOSE $end", header);
        Assert.DoesNotContain(header, line => line.StartsWith("$date", StringComparison.Ordinal));
        var codes = header.Where(line => line.StartsWith("$var ", StringComparison.Ordinal))
            .Select(line => line.Split(' ')[3])
            .ToList();
        Assert.Equal(8, codes.Count);
        Assert.Equal(codes.Count, codes.Distinct(StringComparer.Ordinal).Count());

        var body = lines[(definitionsEnd + 1)..];
        var times = body.Where(line => line.StartsWith('#')).Select(line => BigInteger.Parse(line[1..], CultureInfo.InvariantCulture)).ToList();
        Assert.Equal([0, 2, 4, 504, 506], times.Select(t => (int)t));
        foreach (var change in body.Where(line => !line.StartsWith('#') && !line.StartsWith('$')))
        {
            var code = change.StartsWith('r') ? change.Split(' ')[1] : change[1..];
            Assert.Contains(code, codes);
        }
    }

    [Fact]
    public void Export_SampleTrace_DeclaresBoolsAsWiresAndRealsAsReals()
    {
        var text = Export(ReportSamples.Violation());

        Assert.Contains("$var wire 1 ! CLOSE_CMD $end", text, StringComparison.Ordinal);
        Assert.Contains("$var real 64 # SLIP_HZ $end", text, StringComparison.Ordinal);
        Assert.Contains("r-0.333333333333 #", text, StringComparison.Ordinal);
        Assert.DoesNotContain("@timer", text, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("2", "1 ms")]
    [InlineData("0.5", "100 us")]
    [InlineData("0.25", "10 us")]
    [InlineData("1000", "1 s")]
    [InlineData("0.0005", "100 ns")]
    public void Choose_ScanInterval_TakesTheLargestExactUnit(string scanMs, string expected)
    {
        var scan = Fraction.FromString(scanMs, CultureInfo.InvariantCulture);

        var timescale = VcdTimescale.Choose(Enumerable.Range(0, 5).Select(k => scan * k));

        Assert.Equal(expected, timescale.Text);
        Assert.False(timescale.Rounded);
    }

    [Fact]
    public void Choose_QuarterCycleScan_FallsBackToRoundedNanoseconds()
    {
        var scan = new Fraction(25, 6);

        var timescale = VcdTimescale.Choose([Fraction.Zero, scan, scan * 2]);

        Assert.Equal("1 ns", timescale.Text);
        Assert.True(timescale.Rounded);
        Assert.Equal(new BigInteger(4_166_667), timescale.Ticks(scan));
        Assert.Equal(new BigInteger(8_333_333), timescale.Ticks(scan * 2));
    }

    [Fact]
    public void Export_QuarterCycleScan_SaysTimesAreRounded()
    {
        var model = ReportSamples.Model with { Timing = new ScanTiming(new Fraction(60), new Fraction(25, 6)) };
        var trace = ReportSamples.Counterexample();
        trace = trace with { Steps = [.. trace.Steps.Select(s => s with { StartMilliseconds = model.Timing.TimeOfScan(s.FirstScan) })] };
        var view = CheckReportBuilder.ViewOf(model, model.Properties[1], new Violated(trace, "bmc"));

        var text = Export(view);

        Assert.Contains("rounded to the nearest nanosecond", text, StringComparison.Ordinal);
        Assert.Contains("$timescale 1 ns $end", text, StringComparison.Ordinal);
        Assert.Contains("\n#4166667\n", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Code_ManyVariables_AreDistinctPrintableIdentifiers()
    {
        var codes = Enumerable.Range(0, 20_000).Select(VcdExporter.Code).ToList();

        Assert.Equal(codes.Count, codes.Distinct(StringComparer.Ordinal).Count());
        Assert.All(codes, code => Assert.All(code, c => Assert.InRange(c, '!', '~')));
    }

    private static string Export(CounterexampleView view)
    {
        var writer = new StringWriter();
        VcdExporter.Export(view, writer);
        return writer.ToString();
    }
}
