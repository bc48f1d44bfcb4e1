using LogicProof.Core.Diagnostics;
using LogicProof.Proof.Analysis;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Analysis;

public sealed class ConstantEquationCheckerTests
{
    private const string Scheme = """
        // Quillmere 115 kV substation, breaker QM-7, close permissives (fictional)
        scheme QM7_PERMIT;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CLOSE_CMD : bool;
          SYNC      : bool;
          RESET     : bool;
        end
        locals
          SYNC_OK    : bool;
          PERMIT     : bool;
          ARMED      : bool init FALSE;
          LOOSE      : bool;
          EARLY      : bool;
          CLOSE_OUT  : bool;
          DISABLED   : bool;
          SYNC_PREV  : bool;
        end
        logic
          SYNC_OK := TON(SYNC, T#10ms);
          PERMIT := SYNC_OK AND NOT SYNC;
          ARMED := SR(S1 := FALSE, R := RESET);
          LOOSE := SR(S1 := FALSE, R := RESET);
          EARLY := SYNC_OK AND NOT SYNC_PREV;
          SYNC_PREV := SYNC;
          CLOSE_OUT := CLOSE_CMD AND SYNC_OK;
          DISABLED := FALSE;
        end
        """;

    [Fact]
    public void Check_WhenEquationsAreConstantByTheLogicAroundThem_WarnsAtEachOfThem()
    {
        var model = SchemeLoader.Load(Scheme);

        var warnings = ConstantEquationChecker.Check(model);

        // PERMIT: a TON output implies its input. ARMED: a latch that is never set and starts FALSE.
        // EARLY: SYNC_OK needs SYNC TRUE at the previous scan too (read before written, so a one-scan delay).
        Assert.Equal(["PERMIT", "ARMED", "EARLY"], warnings.Select(NameOf));
        Assert.All(warnings, w => Assert.Equal(ProofCodes.ConstantEquation, w.Code));
        Assert.All(warnings, w => Assert.Equal(Severity.Warning, w.Severity));
        Assert.All(warnings, w => Assert.Contains("FALSE", w.Message, StringComparison.Ordinal));
        Assert.Equal(22, warnings[0].Span.Line);
    }

    [Fact]
    public void Check_WhenAssumptionsAllowNoScanAtAll_ReportsNothing()
    {
        var model = SchemeLoader.Load(Scheme + "\nassume FALSE;\n");

        Assert.Empty(ConstantEquationChecker.Check(model));
    }

    [Fact]
    public void Check_WhenTimeLimitIsTooSmall_ReportsNothingRatherThanGuessing()
    {
        var model = SchemeLoader.Load(Scheme);

        Assert.Empty(ConstantEquationChecker.Check(model, new ConstantCheckOptions { TimeLimit = TimeSpan.FromTicks(1) }));
    }

    private static string NameOf(Diagnostic warning) => warning.Message.Split('\'')[1];
}
