using LogicProof.Core.Diagnostics;
using LogicProof.Model.Rules;

namespace LogicProof.Model.Tests.Rules;

public sealed class RoleBinderTests
{
    private const string Declarations = """
        inputs CMD : bool; REMOTE : bool; V : real; CLOSED : bool; end
        settings LIMIT : real = 1; FAIL_TIME : time = T#8ms; ENABLE : bool = TRUE; end
        outputs CLOSE : bool; TRIP : bool; end
        logic
          CLOSE := (CMD OR REMOTE) AND NOT CLOSED AND ENABLE;
          TRIP := V > LIMIT;
        end

        """;

    [Theory]
    [InlineData("closing_output = CLOSE;", "closing_output", RuleCodes.UnknownRole)]
    [InlineData("close_output = CLOSE, TRIP;", "TRIP", RuleCodes.RoleTakesOneValue)]
    [InlineData("close_output = T#5ms;", "T#5ms", RuleCodes.RoleValueKind)]
    [InlineData("close_command = CMD, TRUE;", "TRUE", RuleCodes.RoleValueKind)]
    [InlineData("close_output = NOPE;", "NOPE", RuleCodes.RoleNameUndeclared)]
    [InlineData("lockout = V;", "V", RuleCodes.RoleNeedsBoolSignal)]
    [InlineData("lockout = ENABLE;", "ENABLE", RuleCodes.RoleNeedsBoolSignal)]
    [InlineData("close_output = CMD;", "CMD", RuleCodes.RoleNeedsComputedSignal)]
    [InlineData("trip_circuit_alarm = CLOSED;", "CLOSED", RuleCodes.RoleNeedsComputedSignal)]
    [InlineData("close_fail_time = CMD;", "CMD", RuleCodes.RoleNeedsDuration)]
    [InlineData("close_fail_time = LIMIT;", "LIMIT", RuleCodes.RoleNeedsDuration)]
    [InlineData("close_fail_time = NOPE;", "NOPE", RuleCodes.RoleNameUndeclared)]
    [InlineData("close_fail_time = T#8ms, T#9ms;", "T#9ms", RuleCodes.RoleTakesOneValue)]
    [InlineData("low_gas_policy = sometimes;", "sometimes", RuleCodes.UnknownPolicyWord)]
    [InlineData("lockout_reset_policy = TRUE;", "TRUE", RuleCodes.UnknownPolicyWord)]
    public void Bind_WhenARoleIsWrong_ReportsItsCodeAtTheValue(string line, string offending, string code)
    {
        var (roles, diagnostics, text) = Bind(line);

        var error = Assert.Single(diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Equal(Severity.Error, error.Severity);
        Assert.Equal("test.lpl", error.Span.File);
        Assert.Equal(LineOf(text, line), error.Span.Line);
        Assert.Equal(line.IndexOf(offending, StringComparison.Ordinal) + 3, error.Span.Column); // the line is indented by two spaces
        Assert.Empty(roles.All);
    }

    [Fact]
    public void Bind_WhenARoleIsBoundTwice_ReportsTheSecondWithTheFirstAsRelated()
    {
        var (roles, diagnostics, text) = Bind("close_output = CLOSE;\n  close_output = TRIP;");

        var error = Assert.Single(diagnostics);
        Assert.Equal(RuleCodes.RoleBoundTwice, error.Code);
        Assert.Equal(LineOf(text, "close_output = TRIP;"), error.Span.Line);
        Assert.Equal(LineOf(text, "close_output = CLOSE;"), Assert.Single(error.Related).Span.Line);
        Assert.Equal("CLOSE", roles.Get(RoleNames.CloseOutput).FormulaText);
    }

    [Fact]
    public void Bind_WhenANameIsRepeatedInOneRole_WarnsAndKeepsItOnce()
    {
        var (roles, diagnostics, _) = Bind("close_command = CMD, CMD;");

        var warning = Assert.Single(diagnostics);
        Assert.Equal(RuleCodes.RoleNameRepeated, warning.Code);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal("CMD", roles.Get(RoleNames.CloseCommand).FormulaText);
    }

    [Fact]
    public void Bind_WhenRolesAreValid_GivesTheTextRuleFormulasRead()
    {
        var (roles, diagnostics, _) = Bind("""
            close_output = close;
            close_command = CMD, REMOTE;
            close_fail_time = FAIL_TIME;
            trip_circuit_alarm_time = 30 cyc;
            LOCKOUT_RESET_POLICY = LOCAL_ONLY;
            """);

        Assert.Empty(diagnostics);
        Assert.Equal("CLOSE", roles.Get(RoleNames.CloseOutput).FormulaText);
        Assert.Equal("(CMD OR REMOTE)", roles.Get(RoleNames.CloseCommand).FormulaText);
        Assert.Equal("FAIL_TIME", roles.Get(RoleNames.CloseFailTime).FormulaText);
        Assert.Equal("T#8ms", roles.Get(RoleNames.CloseFailTime).Duration?.Text);
        Assert.Equal("30 cyc", roles.Get(RoleNames.TripCircuitAlarmTime).FormulaText);
        Assert.Equal(RoleNames.LocalOnly, roles.Get(RoleNames.LockoutResetPolicy).Policy);
        Assert.False(roles.IsBound(RoleNames.Lockout));
    }

    private static (RoleBindings Roles, IReadOnlyList<Diagnostic> Diagnostics, string Text) Bind(string rolesBody)
    {
        var text = RuleHarness.Header + Declarations + "roles\n  " + rolesBody + "\nend\n";
        var diagnostics = new DiagnosticBag();
        var roles = RoleBinder.Bind(RuleHarness.Bind(text), diagnostics);
        return (roles, diagnostics.ToList(), text);
    }

    private static int LineOf(string text, string line) => text[..text.IndexOf(line, StringComparison.Ordinal)].Count(c => c == '\n') + 1;
}
