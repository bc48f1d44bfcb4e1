using LogicProof.Model.Rules;

namespace LogicProof.Cli.Tests.Commands;

public sealed class RulesCommandTests
{
    [Fact]
    public void Rules_WhenRunWithoutOptions_ListsEveryRuleWithItsStatementAndRoles()
    {
        var (exitCode, output, error) = Run("rules");

        Assert.Equal(0, exitCode);
        Assert.Equal(string.Empty, error);
        Assert.All(RuleCatalog.All, rule =>
        {
            Assert.Contains($"\n{rule.Id}\n    {rule.Statement}\n    needs: {rule.NeededRolesText}\n", output, StringComparison.Ordinal);
        });
        Assert.Contains("needs: close_output and one of breaker_open, breaker_closed", output, StringComparison.Ordinal);
    }

    [Fact]
    public void RulesExplain_WhenTheIdIsKnown_PrintsStatementReasonRolesAndFormula()
    {
        var (exitCode, output, _) = Run("rules", "--explain", "no-pumping");

        Assert.Equal(0, exitCode);
        Assert.StartsWith("no-pumping\n  statement: After a close,", output, StringComparison.Ordinal);
        Assert.Contains("  reason:    If the breaker trips while a close command is still held", output, StringComparison.Ordinal);
        Assert.Contains("  needs:     close_output, close_command\n", output, StringComparison.Ordinal);
        Assert.Contains(
            "      ROSE({close_output}) -> NOT PREV({close_command} SINCE ({close_output} AND {close_command}))\n",
            output,
            StringComparison.Ordinal);
    }

    [Fact]
    public void RulesExplain_WhenTheRuleHasPolicyVariants_PrintsEachWithItsCondition()
    {
        var (exitCode, output, _) = Run("rules", "--explain", "LOW-GAS-PHILOSOPHY");

        Assert.Equal(0, exitCode);
        Assert.Contains("    when low_gas_policy = trip:\n      {low_gas}[ AND {breaker_closed}] -> {trip_output}\n", output, StringComparison.Ordinal);
        Assert.Contains("    when low_gas_policy = block_trip:\n      {low_gas} -> NOT {trip_output}\n", output, StringComparison.Ordinal);
    }

    [Fact]
    public void RulesExplain_WhenTheIdIsUnknown_ExitsThreeWithACodedError()
    {
        var (exitCode, output, error) = Run("rules", "--explain", "no-pump");

        Assert.Equal(3, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.StartsWith("--explain: error LP6020: 'no-pump' is not the id of a built-in rule", error, StringComparison.Ordinal);
    }

    [Fact]
    public void RulesRoles_WhenListed_NamesDevicesByTheirIeeeC372Numbers()
    {
        var (exitCode, output, _) = Run("rules", "--roles");

        Assert.Equal(0, exitCode);
        Assert.All(RoleCatalog.All, role => Assert.Contains($"  {role.Name}", output, StringComparison.Ordinal));

        // IEEE C37.2, standard device function numbers (from memory): 25 synchronism check, 52 ac circuit breaker
        // (52a/52b auxiliary contacts), 63 pressure switch, 79 ac reclosing relay, 86 lockout relay, 94 tripping or
        // trip-free relay.
        Assert.Contains("sync_permissive          one or more bool signals: 25 synchronism-check permissive", output, StringComparison.Ordinal);
        Assert.Contains("breaker_closed           a bool signal: 52a breaker auxiliary contact", output, StringComparison.Ordinal);
        Assert.Contains("breaker_open             a bool signal: 52b breaker auxiliary contact", output, StringComparison.Ordinal);
        Assert.Contains("low_gas                  one or more bool signals: 63 pressure switch", output, StringComparison.Ordinal);
        Assert.Contains("79 reclosing relay", output, StringComparison.Ordinal);
        Assert.Contains("lockout                  a bool signal: 86 lockout relay operated", output, StringComparison.Ordinal);
        Assert.Contains("the 94 tripping function", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Rules_WhenHelpIsAsked_DescribesTheCommand()
    {
        var (exitCode, output, _) = Run("rules", "--help");

        Assert.Equal(0, exitCode);
        Assert.Contains("List the built-in close-supervision rules, or explain one.", output, StringComparison.Ordinal);
        Assert.Contains("--explain <ID>", output, StringComparison.Ordinal);
    }

    private static (int ExitCode, string Output, string Error) Run(params string[] args)
    {
        using var output = new StringWriter { NewLine = "\n" };
        using var error = new StringWriter { NewLine = "\n" };
        var exitCode = CliApplication.Run(args, output, error);
        return (exitCode, output.ToString(), error.ToString());
    }
}
