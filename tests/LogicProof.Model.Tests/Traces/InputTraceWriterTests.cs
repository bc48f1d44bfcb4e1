using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Traces;

namespace LogicProof.Model.Tests.Traces;

public sealed class InputTraceWriterTests
{
    [Fact]
    public void WriteScans_WhenInputsChangeRarely_WritesOnlyTheChanges()
    {
        var model = TraceTestModel.Build();
        var scans = Scans(model, [(false, false, "0"), (true, false, "0"), (true, false, "0"), (true, true, "1/3")]);
        var writer = new StringWriter();

        InputTraceWriter.WriteScans(writer, model, scans, ["QM-7 close into lockout"]);

        Assert.Equal(
            "# QM-7 close into lockout\n" +
            "time_ms,CLOSE_CMD,LOCKOUT_86,SLIP_HZ\n" +
            "0,0,0,0\n" +
            "2,1\n" +
            "6,,1,1/3\n" +
            "8,END\n",
            writer.ToString());
    }

    [Theory]
    [InlineData(2, 1)]
    [InlineData(25, 6)]
    [InlineData(1, 3)]
    public void WriteScans_ThenRead_ReproducesEveryScansInputs(int scanNumerator, int scanDenominator)
    {
        var scanMs = new Fraction(scanNumerator, scanDenominator);
        var model = TraceTestModel.Build(scanMs);
        var random = new Random(20240611);
        var slips = new[] { "0", "-0.25", "1/3", "2", "-2", "0.1" };
        var rows = Enumerable.Range(0, 400)
            .Select(_ => (random.Next(4) == 0, random.Next(6) == 0, slips[random.Next(slips.Length)]))
            .ToList();
        var scans = Scans(model, rows);
        var writer = new StringWriter();

        InputTraceWriter.WriteScans(writer, model, scans);
        var result = InputTraceReader.Read(new SourceText("round.csv", writer.ToString()), model);

        Assert.NotNull(result.Trace);
        Assert.DoesNotContain(result.Diagnostics, d => d.Code == TraceCodes.RowNeverInForce);
        var trace = result.Trace!;
        Assert.Equal(scans.Count, trace.ScanCount());
        Assert.Equal(scans, trace.InputsPerScan(trace.ScanCount()).ToList());
    }

    [Fact]
    public void Write_WhenRowsAtArbitraryTimes_ReadsBackTheSameRows()
    {
        var model = TraceTestModel.Build();
        var rows = Scans(model, [(false, false, "0"), (true, false, "0.5"), (true, false, "0.5"), (false, false, "0.5")])
            .Select((inputs, i) => new InputTraceRow(new Fraction(10 * i + 1, 3), inputs))
            .ToList();
        var writer = new StringWriter();

        InputTraceWriter.Write(writer, model, rows, endMs: new Fraction(50));
        var trace = InputTraceReader.Read(new SourceText("rows.csv", writer.ToString()), model).Trace!;

        Assert.Equal([new Fraction(1, 3), new Fraction(11, 3), new Fraction(31, 3)], trace.Rows.Select(row => row.TimeMs));
        Assert.Equal(new Fraction(50), trace.EndMs);
        Assert.Equal(rows[3].Inputs, trace.Rows[2].Inputs);
    }

    [Fact]
    public void ScanStartText_WhenScanStartHasNoFiniteDecimal_FallsWithinThatScansInterval()
    {
        var timing = new ScanTiming(60, new Fraction(25, 6));
        Assert.Equal("4.1666", InputTraceWriter.ScanStartText(timing, 1));
        Assert.Equal("12.5", InputTraceWriter.ScanStartText(timing, 3));
        Assert.Equal("0", InputTraceWriter.ScanStartText(timing, 0));
    }

    private static List<ScanInputs> Scans(ScanModel model, IEnumerable<(bool Close, bool Lockout, string Slip)> rows) =>
        rows.Select(row =>
        {
            var inputs = new ScanInputs(model);
            inputs.SetBool(TraceTestModel.CloseCmd, row.Close);
            inputs.SetBool(TraceTestModel.Lockout, row.Lockout);
            Assert.True(ExactNumberText.TryParse(row.Slip, out var slip));
            inputs.SetReal(TraceTestModel.Slip, slip);
            return inputs;
        }).ToList();
}
