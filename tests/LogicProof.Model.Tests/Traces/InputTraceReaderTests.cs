using System.Globalization;
using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Traces;

namespace LogicProof.Model.Tests.Traces;

public sealed class InputTraceReaderTests
{
    [Fact]
    public void Read_WhenWellFormed_GivesRowsWithEveryInputsValue()
    {
        var trace = TraceTestModel.ReadValid("""
            # Quillmere 115 kV substation, breaker QM-7 (invented): close during a sync window
            time_ms, CLOSE_CMD, LOCKOUT_86, SLIP_HZ

            0,       0,         FALSE,      0.25
            # the operator closes
            "100",   "1",       ,           -0.05
            140,     false
            """);

        Assert.Equal(3, trace.Rows.Count);
        Assert.Equal([Fraction.Zero, new Fraction(100), new Fraction(140)], trace.Rows.Select(row => row.TimeMs));
        Assert.Equal([4, 6, 7], trace.Rows.Select(row => row.Line));
        var closing = trace.Rows[1].Inputs;
        Assert.True(closing.GetBool(TraceTestModel.CloseCmd));
        Assert.False(closing.GetBool(TraceTestModel.Lockout));
        Assert.Equal(new Fraction(-5, 100), closing.GetReal(TraceTestModel.Slip));
        var released = trace.Rows[2].Inputs;
        Assert.False(released.GetBool(TraceTestModel.CloseCmd));
        Assert.Equal(new Fraction(-5, 100), released.GetReal(TraceTestModel.Slip));
        Assert.Null(trace.EndMs);
    }

    [Fact]
    public void InputsPerScan_WhenRowFallsBetweenScans_TakesEffectAtTheNextScanStart()
    {
        // 2 ms scans start at 0, 2, 4, 6 ms: the row at 3 ms is first seen by the scan starting at 4 ms.
        var trace = TraceTestModel.ReadValid("time_ms,CLOSE_CMD\n0,0\n3,1\n6,0\n");
        var scans = trace.InputsPerScan(trace.ScanCount()).Select(inputs => inputs.GetBool(TraceTestModel.CloseCmd)).ToList();
        Assert.Equal([false, false, true, false], scans);
    }

    [Theory]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n3,1\n", null, 3)]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n4,1\n", null, 3)]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n3,1\n10,END\n", null, 5)]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n3,1\n9,END\n", null, 5)]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n3,1\n10,END\n", "7", 4)]
    [InlineData("time_ms,CLOSE_CMD\n0,0\n", "1000", 500)]
    public void ScanCount_WhenEndRowUntilOrNeither_CountsTheScansOfTheRun(string text, string? until, long expected)
    {
        // END at E: the scans starting before E. No END: through the scan where the last row takes effect.
        var trace = TraceTestModel.ReadValid(text);
        var untilMs = until is not null && ParseExact(until) is { } parsed ? parsed : (Fraction?)null;
        Assert.Equal(expected, trace.ScanCount(untilMs));
    }

    [Fact]
    public void Read_WhenInputHasNoColumn_WarnsAndUsesFalseOrZero()
    {
        var result = TraceTestModel.Read("time_ms,CLOSE_CMD\n0,1\n");
        var warning = Assert.Single(result.Diagnostics);
        Assert.Equal(TraceCodes.MissingInputColumn, warning.Code);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.EndsWith(": LOCKOUT_86, SLIP_HZ = 0.", warning.Message, StringComparison.Ordinal);
        var inputs = result.Trace!.Rows[0].Inputs;
        Assert.False(inputs.GetBool(TraceTestModel.Lockout));
        Assert.Equal(Fraction.Zero, inputs.GetReal(TraceTestModel.Slip));
    }

    [Fact]
    public void Read_WhenUnderTurkishCulture_NamesAndWordsStillMatch()
    {
        // Under tr-TR a culture-aware comparison maps 'i' and 'I' differently; names must compare ordinally.
        var previous = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("tr-TR");
            var trace = TraceTestModel.ReadValid("TIME_MS,close_cmd,lockout_86,slip_hz\n0,true,False,1.5\n2.5,TRUE\n");
            Assert.True(trace.Rows[0].Inputs.GetBool(TraceTestModel.CloseCmd));
            Assert.Equal(new Fraction(3, 2), trace.Rows[0].Inputs.GetReal(TraceTestModel.Slip));
            Assert.Equal(new Fraction(5, 2), trace.Rows[1].TimeMs);
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }
    }

    [Fact]
    public void Read_WhenWindowsLineEndings_ReadsTheSame()
    {
        var trace = TraceTestModel.ReadValid("# comment\r\ntime_ms,CLOSE_CMD\r\n0,1\r\n\r\n4,0\r\n");
        Assert.Equal([3, 5], trace.Rows.Select(row => row.Line));
        Assert.False(trace.Rows[1].Inputs.GetBool(TraceTestModel.CloseCmd));
    }

    [Fact]
    public void Read_WhenEndRowPresent_RecordsEndAndKeepsRowsBeforeIt()
    {
        var trace = TraceTestModel.ReadValid("time_ms,CLOSE_CMD,LOCKOUT_86\n0,1,0\n50,end\n");
        Assert.Single(trace.Rows);
        Assert.Equal(new Fraction(50), trace.EndMs);
    }

    [Fact]
    public void Read_WhenRealOutsideZeroRangeMissing_DefaultsToNearestRangeEnd()
    {
        var builder = new Simulation.TestModelBuilder();
        builder.RealInput("BUS_V", 1, 2);
        var result = InputTraceReader.Read(new SourceText("t.csv", "time_ms\n0\n"), builder.Build());
        Assert.Equal(Fraction.One, result.Trace!.Rows[0].Inputs.GetReal(0));
        Assert.Contains(result.Diagnostics, d => d.Code == TraceCodes.MissingInputColumn && d.Message.EndsWith("BUS_V = 1.", StringComparison.Ordinal));
    }

    [Fact]
    public void ReadFile_WhenFileMissing_ReportsUnreadableWithoutThrowing()
    {
        var (result, source) = InputTraceReader.ReadFile(Path.Combine(Path.GetTempPath(), "no-such-dir-lp", "missing.csv"), TraceTestModel.Build());
        Assert.Null(result.Trace);
        Assert.Null(source);
        Assert.Equal(TraceCodes.FileUnreadable, Assert.Single(result.Diagnostics).Code);
    }

    private static Fraction? ParseExact(string text) =>
        LogicProof.Model.Simulation.ExactNumberText.TryParse(text, out var value) ? value : null;
}
