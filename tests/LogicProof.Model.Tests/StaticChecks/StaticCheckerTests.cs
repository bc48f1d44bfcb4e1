using LogicProof.Core.Diagnostics;
using LogicProof.Model.StaticChecks;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.StaticChecks;

public sealed class StaticCheckerTests
{
    private static IReadOnlyList<Diagnostic> Check(string text) => StaticChecker.Check(BindScheme(text));

    private static Diagnostic Single(IReadOnlyList<Diagnostic> diagnostics, string code) =>
        Assert.Single(diagnostics, d => d.Code == code);

    private static void AssertAt(Diagnostic diagnostic, int line, int column, Severity severity)
    {
        Assert.Equal((line, column), (diagnostic.Span.Line, diagnostic.Span.Column));
        Assert.Equal(severity, diagnostic.Severity);
        Assert.Equal(FileName, diagnostic.Span.File);
    }

    [Fact]
    public void Check_WhenInputIsNeverRead_ReportsUnusedInputAtItsDeclaration()
    {
        var diagnostics = Check(Header + """
            inputs
              CMD : bool;
              SPARE : bool;
            end
            outputs CLOSE : bool; end
            logic CLOSE := CMD; end
            """);

        AssertAt(Single(diagnostics, ModelCodes.UnusedInput), 6, 3, Severity.Warning);
        Assert.Single(diagnostics);
    }

    [Fact]
    public void Check_WhenInputIsReadOnlyByARoleOrAFormula_DoesNotReportIt()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; RESET : bool; HEALTHY : bool; end
            outputs CLOSE : bool; end
            logic CLOSE := CMD; end
            roles lockout_reset_local = RESET; end
            assume HEALTHY;
            """);

        Assert.DoesNotContain(diagnostics, d => d.Code == ModelCodes.UnusedInput);
    }

    [Fact]
    public void Check_WhenLocalIsWrittenButReadByNothingElse_ReportsUnusedLocal()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            locals
              MEMO : bool;
            end
            outputs CLOSE : bool; end
            logic
              MEMO := CMD OR MEMO;
              CLOSE := CMD;
            end
            """);

        AssertAt(Single(diagnostics, ModelCodes.UnusedLocal), 6, 3, Severity.Warning);
    }

    [Fact]
    public void Check_WhenOutputIsReadByNothing_DoesNotCallItUnused()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            outputs CLOSE : bool; end
            logic CLOSE := CMD; end
            """);

        Assert.Empty(diagnostics);
    }

    [Fact]
    public void Check_WhenVariablesHaveNoEquation_ReportsEachUndriven()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            locals
              BLOCK : bool init TRUE;
            end
            outputs
              CLOSE : bool;
              ALARM : bool;
            end
            logic CLOSE := CMD AND NOT BLOCK; end
            """);

        var undriven = diagnostics.Where(d => d.Code == ModelCodes.UndrivenVariable).ToList();
        Assert.Equal(2, undriven.Count);
        AssertAt(undriven[0], 6, 3, Severity.Warning);
        AssertAt(undriven[1], 10, 3, Severity.Warning);
    }

    [Fact]
    public void Check_WhenEquationReadsANameWrittenLater_ReportsBothPlaces()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            locals PERMIT : bool; end
            outputs CLOSE : bool; end
            logic
              CLOSE := CMD AND PERMIT AND NOT PERMIT;
              PERMIT := CMD;
            end
            """);

        var delay = Single(diagnostics, ModelCodes.ReadBeforeWrite);
        AssertAt(delay, 8, 20, Severity.Warning);
        var writer = Assert.Single(delay.Related);
        Assert.Equal((9, 3), (writer.Span.Line, writer.Span.Column));
        Assert.Contains("PERMIT", delay.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenSameEquationsInScanOrder_ReportsNoReadBeforeWrite()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            locals PERMIT : bool; end
            outputs CLOSE : bool; end
            logic
              PERMIT := CMD;
              CLOSE := CMD AND PERMIT;
            end
            """);

        Assert.Empty(diagnostics);
    }

    [Fact]
    public void Check_WhenSealInHasNoInit_ReportsAFeedbackLoopWarningNamingItsMembers()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; CLOSED : bool; end
            outputs SEAL : bool; end
            logic
              SEAL := (CMD OR SEAL) AND NOT CLOSED;
            end
            """);

        var loop = Single(diagnostics, ModelCodes.FeedbackLoop);
        AssertAt(loop, 7, 3, Severity.Warning);
        Assert.Contains("SEAL", loop.Message, StringComparison.Ordinal);
        Assert.Contains("no power-up value declared", loop.Message, StringComparison.Ordinal);
        Assert.Equal((5, 9), (loop.Related[0].Span.Line, loop.Related[0].Span.Column));
    }

    [Fact]
    public void Check_WhenEveryMemoryOfTheLoopDeclaresInit_ReportsTheLoopAsANote()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; CLOSED : bool; end
            locals FAIL : bool init FALSE; end
            outputs SEAL : bool init FALSE; end
            logic
              SEAL := (CMD OR SEAL) AND NOT CLOSED AND NOT FAIL;
              FAIL := TON(SEAL, T#500ms);
            end
            """);

        var loop = Single(diagnostics, ModelCodes.FeedbackLoop);
        AssertAt(loop, 8, 3, Severity.Info);
        Assert.Contains("FAIL, SEAL, FAIL.TON#1", loop.Message, StringComparison.Ordinal);
        Assert.Contains("power-up declared", loop.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenTimerPresetIsZero_WarnsAtThePreset()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            outputs X : bool; end
            logic
              X := TON(IN := CMD, PT := T#0ms);
            end
            """);

        AssertAt(Single(diagnostics, ModelCodes.TimerPresetZero), 7, 29, Severity.Warning);
    }

    [Fact]
    public void Check_WhenPresetIsNotAWholeNumberOfScans_WarnsWithExactAndRoundedValues()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            settings FAIL_TIME : time = T#25ms; end
            outputs X : bool; end
            logic
              X := TON(CMD, FAIL_TIME);
            end
            """);

        var rounded = Single(diagnostics, ModelCodes.TimerPresetRounded);
        AssertAt(rounded, 8, 17, Severity.Warning);
        Assert.Contains("12.5", rounded.Message, StringComparison.Ordinal);
        Assert.Contains("13 scans", rounded.Message, StringComparison.Ordinal);
        Assert.Contains("26 ms", rounded.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WhenFormulaWindowIsNotWholeScans_WarnsToo()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            outputs X : bool; end
            logic X := CMD; end
            require R: HELD(X, T#3ms) -> CMD;
            """);

        AssertAt(Single(diagnostics, ModelCodes.TimerPresetRounded), 7, 20, Severity.Warning);
    }

    [Fact]
    public void Check_WhenFallingEdgeDetector_NotesItsPowerUpPulse()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; end
            outputs X : bool; end
            logic
              X := NOT F_TRIG(CLK := CMD);
            end
            """);

        // IEC 61131-3 F_TRIG: Q := NOT CLK AND NOT M; M := NOT CLK, with M FALSE at power-up.
        AssertAt(Single(diagnostics, ModelCodes.FallingEdgeAtPowerUp), 7, 12, Severity.Info);
    }

    [Fact]
    public void Check_Always_SortsByPosition()
    {
        var diagnostics = Check(Header + """
            inputs CMD : bool; SPARE : bool; end
            locals LATE : bool; end
            outputs X : bool; end
            logic
              X := LATE AND F_TRIG(CMD);
              LATE := CMD;
            end
            """);

        Assert.Equal(
            [ModelCodes.UnusedInput, ModelCodes.ReadBeforeWrite, ModelCodes.FallingEdgeAtPowerUp],
            diagnostics.Select(d => d.Code));
        Assert.DoesNotContain(diagnostics, d => d.IsError);
    }
}
