using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

public sealed class CheckReportBuilderTests
{
    [Fact]
    public void ForFile_WithViolation_GroupsTraceSignalsByRole()
    {
        var view = ReportSamples.Violation();

        Assert.Equal(
            [
                TraceSignalRole.Input, TraceSignalRole.Input, TraceSignalRole.Input, TraceSignalRole.Input,
                TraceSignalRole.Output, TraceSignalRole.Internal, TraceSignalRole.Internal, TraceSignalRole.Timer, TraceSignalRole.Property,
            ],
            view.Signals.Select(signal => signal.Role));
        Assert.Equal(["CLOSE_CMD", "LOCKOUT_86", "SLIP_HZ", "BKR_52A", "CLOSE_OUT", "SEAL", "CLOSE_FAIL", "CLOSE_FAIL@timer", "NO_DOUBLE_CLOSE"], view.Signals.Select(s => s.Name));
        Assert.Equal(TraceSignalType.Real, view.Signals.Single(s => s.Name == "SLIP_HZ").Type);
        Assert.Equal(TraceSignalType.Counter, view.Signals.Single(s => s.Role == TraceSignalRole.Timer).Type);
    }

    [Fact]
    public void ForFile_WhenTraceStartsUnknownLatch_NotesItByTheCellItKeeps()
    {
        var file = ReportSamples.File();

        var note = Assert.Single(file.PowerUpNotes);
        Assert.Equal(new PowerUpNote("NO_DOUBLE_CLOSE", "SEAL", "SEAL@last", true), note);
    }

    [Fact]
    public void ForFile_WithSampleResults_KeepsNamesOriginsSpansAndElapsed()
    {
        var file = ReportSamples.File(breakerModelled: true);

        Assert.Equal("QM7_CLOSE", file.SchemeName);
        Assert.Equal("scan 2 ms, 60 Hz", file.ScanTimingText);
        Assert.True(file.BreakerModelled);
        Assert.Equal(["CLOSE_BLOCKED_IN_LOCKOUT", "NO_DOUBLE_CLOSE", "SLIP_WITHIN_WINDOW"], file.Properties.Select(p => p.Name));
        Assert.Equal(PropertyOrigin.Rule, file.Properties[0].Origin);
        Assert.Equal(31, file.Properties[1].Span.Line);
        Assert.Equal(TimeSpan.FromMilliseconds(340), file.Properties[1].Elapsed);
        Assert.Null(file.Properties[0].Counterexample);
        Assert.Null(file.Properties[2].Counterexample);
    }

    [Fact]
    public void ForRun_WithSampleFile_CountsVerdictsAndDiagnostics()
    {
        var summary = ReportSamples.Report().Summary;

        Assert.Equal(new CheckRunSummary(1, 1, 1, 1, 1, 0, 1, 1, CheckExitCode.Violated), summary);
    }

    [Theory]
    [InlineData(true, 1, 1, 1, 4)]
    [InlineData(false, 1, 1, 1, 3)]
    [InlineData(false, 0, 1, 1, 1)]
    [InlineData(false, 0, 0, 1, 2)]
    [InlineData(false, 0, 0, 0, 0)]
    public void ExitCode_WhenSeveralApply_TakesTheMostSevere(bool internalFailure, int errors, int violated, int inconclusive, int expected) =>
        Assert.Equal(expected, CheckExitCode.Of(internalFailure, errors, violated, inconclusive));

    [Fact]
    public void ForFile_WithoutModel_ReportsOnlyDiagnosticsAndExitsWithInputError()
    {
        var error = new Diagnostic("LP1001", Severity.Error, "unexpected ';'", new SourceSpan("broken.lpl", 10, 1, 2, 5));

        var file = CheckReportBuilder.ForFile("broken.lpl", null, [error], []);
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [file, ReportSamples.File()]);

        Assert.Null(file.SchemeName);
        Assert.Equal(string.Empty, file.ScanTimingText);
        Assert.Empty(file.Properties);
        Assert.Equal(CheckExitCode.InputError, report.Summary.ExitCode);
        Assert.Equal(2, report.Summary.Files);
    }

    [Fact]
    public void ForFile_WithResultsButNoModel_Throws()
    {
        Assert.Throws<ArgumentException>(() => CheckReportBuilder.ForFile("x.lpl", null, [], ReportSamples.Results()));
    }

    [Fact]
    public void ForRun_WithInternalFailure_ExitsWithInternalError()
    {
        var report = CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [ReportSamples.File()], internalFailure: true);

        Assert.Equal(CheckExitCode.InternalError, report.Summary.ExitCode);
    }

    [Fact]
    public void ViewOf_Violation_EndsWhenTheFailingScanEnds()
    {
        var view = ReportSamples.Violation();

        Assert.Equal(252, view.Trace.FailingScan);
        Assert.Equal(new Fractions.Fraction(506), view.EndMilliseconds);
        Assert.Equal("bmc", view.Engine);
        Assert.IsType<BoolTraceValue>(view.Trace.Steps[^1].Cells[^1].Value);
    }
}
