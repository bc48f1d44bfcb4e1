using LogicProof.Core.Diagnostics;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Rules;

public sealed class RuleExpanderTests
{
    private const string Scheme = RuleHarness.Header + """
        inputs CMD : bool; REMOTE : bool; LK_IN : bool; RESET : bool; REMOTE_RESET : bool; BRK_52B : bool; GAS : bool; end
        locals LK : bool init FALSE; end
        outputs CLOSE : bool; TRIP : bool; end
        logic
          LK := SR(S1 := LK_IN, R := RESET);
          TRIP := LK;
          CLOSE := (CMD OR REMOTE) AND BRK_52B AND NOT LK AND NOT GAS;
        end

        """;

    [Fact]
    public void Expand_WhenSomeRolesAreBound_AppliesTheRulesThatHaveThemAndNamesWhatTheOthersMiss()
    {
        var setup = RuleHarness.Setup(Scheme + """
            roles
              close_output = CLOSE;
              close_command = CMD, REMOTE;
              lockout = LK;
              lockout_reset_local = RESET;
              breaker_open = BRK_52B;
            end
            """);

        Assert.Empty(setup.Diagnostics);
        Assert.Equal(
            ["close-blocked-in-lockout", "lockout-reset-only", "close-starts-breaker-open", "no-pumping"],
            setup.Rules.Applied.Select(r => r.Rule.Id));
        Assert.Equal("LK -> NOT CLOSE", Formula(setup, "close-blocked-in-lockout"));
        Assert.Equal("FELL(LK) -> RESET OR PREV(RESET)", Formula(setup, "lockout-reset-only"));
        Assert.Equal("ROSE(CLOSE) -> BRK_52B", Formula(setup, "close-starts-breaker-open"));
        Assert.Equal("ROSE(CLOSE) -> NOT PREV((CMD OR REMOTE) SINCE (CLOSE AND (CMD OR REMOTE)))", Formula(setup, "no-pumping"));

        var healthy = setup.NotApplicable.Single(n => n.Rule.Id == "close-starts-healthy");
        Assert.Equal([RoleNames.LowGas, RoleNames.SpringCharged], healthy.MissingRoles);
        Assert.Equal("needs one of low_gas, spring_charged", healthy.Reason);
        var sealedIn = setup.NotApplicable.Single(n => n.Rule.Id == "close-sealed-in");
        Assert.Equal([RoleNames.CloseFailTime, RoleNames.BreakerClosed], sealedIn.MissingRoles);
        Assert.Equal(RuleCatalog.All.Count, setup.Rules.Applied.Count + setup.NotApplicable.Count);
        Assert.Empty(setup.Rules.Skipped);
    }

    [Fact]
    public void Expand_WhenRulesApply_GivesRuleProperties()
    {
        var setup = RuleHarness.Setup(Scheme + "roles\n  lockout = LK;\n  close_output = CLOSE;\nend\n");

        var property = Assert.Single(setup.ExtraProperties);
        Assert.Equal("close-blocked-in-lockout", property.Name);
        Assert.Equal(PropertyOrigin.Rule, property.Origin);
        Assert.Equal(RuleCatalog.Find("close-blocked-in-lockout")!.Statement, property.Statement);
        Assert.Equal(Scheme.Count(c => c == '\n') + 3, property.Span.Line); // the close_output line, its first role
        var model = RuleHarness.Model(Scheme + "roles\n  lockout = LK;\n  close_output = CLOSE;\nend\n");
        Assert.Equal(PropertyOrigin.Rule, Assert.Single(model.Properties).Origin);
    }

    [Fact]
    public void Expand_WhenTheLockoutIsAnInput_ReportsTheResetRuleNotApplicableWithTheReason()
    {
        var setup = RuleHarness.Setup(Scheme + "roles\n  lockout = LK_IN;\n  lockout_reset_local = RESET;\nend\n");

        var reset = setup.NotApplicable.Single(n => n.Rule.Id == "lockout-reset-only");
        Assert.Empty(reset.MissingRoles);
        Assert.Contains("'LK_IN' is an input", reset.Reason, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("local_only", "FELL(LK) -> RESET OR PREV(RESET)")]
    [InlineData("local_or_remote", "FELL(LK) -> RESET OR REMOTE_RESET OR PREV(RESET OR REMOTE_RESET)")]
    public void Expand_WhenTheResetPolicyIsGiven_ChoosesItsFormula(string policy, string formula)
    {
        var setup = RuleHarness.Setup(Scheme + $"""
            roles
              lockout = LK;
              lockout_reset_local = RESET;
              lockout_reset_remote = REMOTE_RESET;
              lockout_reset_policy = {policy};
            end
            """);

        Assert.Equal(formula, Formula(setup, "lockout-reset-only"));
    }

    [Fact]
    public void Expand_WhenAPolicyNeedsARoleThatIsNotBound_ReportsItMissing()
    {
        var setup = RuleHarness.Setup(Scheme + """
            roles
              lockout = LK;
              lockout_reset_local = RESET;
              lockout_reset_policy = local_or_remote;
              trip_command = CMD;
              trip_output = TRIP;
              low_gas_policy = block_trip;
            end
            """);

        var reset = setup.NotApplicable.Single(n => n.Rule.Id == "lockout-reset-only");
        Assert.Equal([RoleNames.LockoutResetRemote], reset.MissingRoles);
        Assert.Equal("with lockout_reset_policy = local_or_remote it needs lockout_reset_remote", reset.Reason);
        var trip = setup.NotApplicable.Single(n => n.Rule.Id == "trip-not-blocked");
        Assert.Equal([RoleNames.LowGas], trip.MissingRoles);
    }

    [Fact]
    public void Expand_WhenTheLowGasPolicyIsNotBound_UsesTheTripFormulaButLeavesThePhilosophyRuleNotApplicable()
    {
        var setup = RuleHarness.Setup(Scheme + "roles\n  low_gas = GAS;\n  trip_output = TRIP;\n  lockout = LK;\nend\n");

        Assert.Equal("LK -> TRIP", Formula(setup, "lockout-trips"));
        var philosophy = setup.NotApplicable.Single(n => n.Rule.Id == "low-gas-philosophy");
        Assert.Equal([RoleNames.LowGasPolicy], philosophy.MissingRoles);
    }

    [Fact]
    public void Expand_WhenRulesAreSelectedOrSkipped_AppliesOnlyThose()
    {
        const string roles = "roles\n  lockout = LK;\n  close_output = CLOSE;\n  trip_output = TRIP;\nend\n";

        var only = RuleHarness.Setup(Scheme + roles, new RuleSelection(["TRIP-WINS", "no-pumping"], []));
        var skip = RuleHarness.Setup(Scheme + roles, new RuleSelection(null, ["trip-wins"]));

        Assert.Equal(["trip-wins"], only.Rules.Applied.Select(r => r.Rule.Id));
        Assert.Equal(["no-pumping"], only.NotApplicable.Select(r => r.Rule.Id));
        Assert.Equal(RuleCatalog.All.Count - 2, only.Rules.Skipped.Count);
        Assert.DoesNotContain(skip.Rules.Applied, r => r.Rule.Id == "trip-wins");
        Assert.Contains(skip.Rules.Applied, r => r.Rule.Id == "lockout-trips");
    }

    [Fact]
    public void Prepare_WhenASelectedIdIsUnknown_IsAnInputErrorNamingTheOption()
    {
        var setup = RuleHarness.Setup(Scheme, new RuleSelection(null, ["no-pumpin"]));

        var error = Assert.Single(setup.Diagnostics);
        Assert.Equal(RuleCodes.UnknownRuleId, error.Code);
        Assert.Equal(Severity.Error, error.Severity);
        Assert.Equal("--skip-rules", error.Span.File);
        Assert.Contains("'no-pumpin'", error.Message, StringComparison.Ordinal);
        Assert.Null(setup.ModelScheme);
    }

    [Fact]
    public void Prepare_WhenTheSchemeHasNoBreakerModel_SaysTheStatusIsFree()
    {
        var setup = RuleHarness.Setup(Scheme);

        Assert.False(setup.BreakerModelled);
        Assert.Contains("free", setup.Breaker.Summary, StringComparison.Ordinal);
        Assert.Equal(RuleCatalog.All.Count, setup.NotApplicable.Count);
        Assert.Empty(setup.ExtraProperties);
    }

    private static string Formula(RuleSetupResult setup, string id) => setup.Rules.Applied.Single(r => r.Rule.Id == id).Formula;
}
