using LogicProof.Core.Diagnostics;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Rules;

/// <summary>Warnings found before any proof: a close-fail time against the breaker model, and the lockout's power-up.</summary>
public sealed class SetupWarningsTests
{
    private static string Scheme(string closeFailTime, string lockoutInit) => RuleHarness.Header + $"""
        inputs CMD : bool; TRIP_86 : bool; RESET_86 : bool; B52A : bool; B52B : bool; end
        outputs CO : bool; TO : bool; LOCKOUT_86 : bool {lockoutInit}; end
        logic
          LOCKOUT_86 := SR(S1 := TRIP_86, R := RESET_86);
          TO := LOCKOUT_86;
          CO := CMD AND B52B AND NOT LOCKOUT_86 AND NOT TO;
        end
        breaker_model
          closing_time = T#6ms .. T#10ms;
          opening_time = T#4ms;
        end
        roles close_output = CO; trip_output = TO; lockout = LOCKOUT_86; breaker_closed = B52A; breaker_open = B52B; close_fail_time = {closeFailTime}; end
        """;

    [Theory]
    // Common practice: the close-fail timer is set above the breaker's longest closing time, with a margin.
    [InlineData("T#10ms", true)]
    [InlineData("T#8ms", true)]
    [InlineData("0.6 cyc", true)] // exactly 10 ms at 60 Hz: not longer either
    [InlineData("T#12ms", false)]
    public void Prepare_WhenCloseFailTimeIsNotAboveTheLongestClosingTime_Warns(string closeFailTime, bool warned)
    {
        var setup = RuleHarness.Setup(Scheme(closeFailTime, "init FALSE"));

        var warnings = setup.Diagnostics.Where(d => d.Code == RuleCodes.CloseFailNotAboveClosingTime).ToList();
        Assert.Equal(warned ? 1 : 0, warnings.Count);
        Assert.NotNull(setup.ModelScheme);
        if (warned)
        {
            var warning = warnings[0];
            Assert.Equal(Severity.Warning, warning.Severity);
            Assert.Contains("T#10ms (10 ms)", warning.Message, StringComparison.Ordinal);
            Assert.Equal(LineOf(Scheme(closeFailTime, "init FALSE"), "roles"), warning.Span.Line);
            Assert.Equal(LineOf(Scheme(closeFailTime, "init FALSE"), "closing_time"), Assert.Single(warning.Related).Span.Line);
        }
    }

    [Fact]
    public void Prepare_WhenThereIsNoBreakerModel_DoesNotCompareTheCloseFailTime()
    {
        var setup = RuleHarness.Setup(WithoutBreaker(Scheme("T#2ms", "init FALSE")));

        Assert.DoesNotContain(setup.Diagnostics, d => d.Code == RuleCodes.CloseFailNotAboveClosingTime);
    }

    [Theory]
    // IEEE C37.2 device 86 (from memory): an operated lockout trips its breaker and holds it open, so one that comes
    // up operated trips a breaker in service at every relay restart.
    [InlineData("init TRUE", true)]
    [InlineData("init retained", false)]
    [InlineData("init FALSE", false)]
    [InlineData("", false)]
    public void Prepare_WhenTheLockoutComesUpOperated_WarnsAtItsDeclaration(string init, bool warned)
    {
        var text = Scheme("T#20ms", init);

        var setup = RuleHarness.Setup(text);

        var warnings = setup.Diagnostics.Where(d => d.Code == RuleCodes.LockoutOperatedAtPowerUp).ToList();
        Assert.Equal(warned ? 1 : 0, warnings.Count);
        if (warned)
        {
            Assert.Equal(LineOf(text, "LOCKOUT_86 : bool"), warnings[0].Span.Line);
            Assert.Contains("init retained", warnings[0].Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Prepare_WhenNoTripOutputIsBound_DoesNotWarnAboutTheLockoutPowerUp()
    {
        // The breaker model needs trip_output, so this scheme has none.
        var text = WithoutBreaker(Scheme("T#20ms", "init TRUE")).Replace(" trip_output = TO;", string.Empty, StringComparison.Ordinal);

        var setup = RuleHarness.Setup(text);

        Assert.NotNull(setup.ModelScheme);
        Assert.DoesNotContain(setup.Diagnostics, d => d.Code == RuleCodes.LockoutOperatedAtPowerUp);
    }

    [Fact]
    public void Build_WhenTheLockoutIsRetained_LeavesItsPowerUpToTheChecker()
    {
        // IEC 61131-3 RETAIN: the value before the restart, which may be either; the checker takes both.
        var model = RuleHarness.Model(Scheme("T#20ms", "init retained"));

        var lockoutCell = model.Cells.Single(c => c.Name == "LOCKOUT_86").Index;
        Assert.Contains(model.StateSlots, s => s.Cell == lockoutCell);
        Assert.All(model.StateSlots.Where(s => s.Cell == lockoutCell), s => Assert.IsType<UnknownPowerUp>(s.PowerUp));
    }

    private static string WithoutBreaker(string text) =>
        text[..text.IndexOf("breaker_model", StringComparison.Ordinal)] + text[text.IndexOf("roles", StringComparison.Ordinal)..];

    private static int LineOf(string text, string fragment) =>
        text[..text.IndexOf(fragment, StringComparison.Ordinal)].Count(c => c == '\n') + 1;
}
