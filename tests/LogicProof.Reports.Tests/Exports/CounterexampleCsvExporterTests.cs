using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Traces;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;
using LogicProof.Reports.Exports;
using LogicProof.Reports.Tests.Check;

namespace LogicProof.Reports.Tests.Exports;

public sealed class CounterexampleCsvExporterTests
{
    [Fact]
    public void Export_ReadBackWithTheTraceReader_GivesTheTraceInputsAtEveryScan()
    {
        AssertReplays(ReportSamples.Model, ReportSamples.Violation());
    }

    [Fact]
    public void Export_ScanWithoutFiniteDecimal_StillGivesTheTraceInputsAtEveryScan()
    {
        // A quarter cycle at 60 Hz: 25/6 ms, so the row times are fractions.
        var model = ReportSamples.Model with { Timing = new ScanTiming(new Fraction(60), new Fraction(25, 6)) };
        var violated = new Violated(Retimed(ReportSamples.Counterexample(), model.Timing), "bmc");
        var view = CheckReportBuilder.ViewOf(model, model.Properties[1], violated);

        var csv = AssertReplays(model, view);

        Assert.Contains("\n25/6,1\n25/3,0,,-1/3\n", csv, StringComparison.Ordinal);
    }

    [Fact]
    public void Export_WhenTraceStartsUnknownLatch_NamesThePowerUpOption()
    {
        var csv = Export(ReportSamples.Model, ReportSamples.Violation());

        Assert.Contains("# Replay with --powerup SEAL=TRUE", csv, StringComparison.Ordinal);
    }

    [Fact]
    public void Export_SampleTrace_WritesOnlyChangesAndHoldTimes()
    {
        var lines = Export(ReportSamples.Model, ReportSamples.Violation()).Split('\n', StringSplitOptions.RemoveEmptyEntries);

        var data = lines.SkipWhile(line => line.StartsWith('#')).ToList();
        Assert.Equal(["time_ms,CLOSE_CMD,LOCKOUT_86,SLIP_HZ,BKR_52A", "0,0,0,0.25,0", "2,1", "4,0,,-1/3", "504,1", "506,END"], data);
        Assert.Contains("#   from 4 ms, hold 500 ms", lines);
    }

    [Fact]
    public void Export_TraceOfAnotherModel_Throws()
    {
        var other = ReportSamples.Model with { Inputs = [ReportSamples.CloseCmd] };
        var cells = other.Cells.Select(cell => cell.Index == ReportSamples.Lockout ? cell with { Kind = CellKind.Variable } : cell).ToList();

        Assert.Throws<ArgumentException>(() => Export(other with { Cells = cells }, ReportSamples.Violation()));
    }

    private static string AssertReplays(ScanModel model, CounterexampleView view)
    {
        var csv = Export(model, view);

        var read = InputTraceReader.Read(new SourceText("exported.csv", csv), model);

        Assert.DoesNotContain(read.Diagnostics, d => d.IsError);
        var trace = read.Trace!;
        Assert.Equal(view.Trace.TotalScans, trace.ScanCount());
        var expected = ExpectedInputsPerScan(model, view.Trace).ToList();
        var actual = trace.InputsPerScan(trace.ScanCount()).ToList();
        Assert.Equal(expected.Count, actual.Count);
        for (var scan = 0; scan < expected.Count; scan++)
        {
            Assert.True(expected[scan].Equals(actual[scan]), $"inputs differ at scan {scan}");
        }

        return csv;
    }

    private static IEnumerable<ScanInputs> ExpectedInputsPerScan(ScanModel model, Counterexample trace)
    {
        foreach (var step in trace.Steps)
        {
            var inputs = InputTrace.DefaultInputs(model);
            foreach (var input in step.Inputs)
            {
                if (input.Value is BoolTraceValue b)
                {
                    inputs.SetBool(input.Index, b.Value);
                }
                else
                {
                    inputs.SetReal(input.Index, ((RealTraceValue)input.Value).Value);
                }
            }

            for (var scan = 0L; scan < step.ScanCount; scan++)
            {
                yield return inputs;
            }
        }
    }

    private static Counterexample Retimed(Counterexample trace, ScanTiming timing) =>
        trace with { Steps = [.. trace.Steps.Select(step => step with { StartMilliseconds = timing.TimeOfScan(step.FirstScan) })] };

    private static string Export(ScanModel model, CounterexampleView view)
    {
        var writer = new StringWriter();
        CounterexampleCsvExporter.Export(model, view, writer);
        return writer.ToString();
    }
}
