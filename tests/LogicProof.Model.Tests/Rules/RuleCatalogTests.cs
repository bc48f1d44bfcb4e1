using System.Text.RegularExpressions;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Parsing;
using LogicProof.Model.Rules;

namespace LogicProof.Model.Tests.Rules;

public sealed partial class RuleCatalogTests
{
    [Fact]
    public void All_WhenListed_HasOneRuleForEachRuleOfTheBriefPlusTheTwoTheIssueAdds()
    {
        // The brief's list of built-in close-supervision rules, the low-gas philosophy it asks the trip rules to
        // follow, and the two rules issue 4 adds (lockout trips, trip-circuit supervision).
        string[] expected =
        [
            "close-blocked-in-lockout", "lockout-reset-only", "close-starts-breaker-open", "close-starts-in-sync",
            "close-starts-healthy", "close-sealed-in", "close-not-held-on", "no-pumping", "trip-not-blocked", "trip-wins",
            "lockout-trips", "trip-circuit-supervised", "low-gas-philosophy",
        ];

        Assert.Equal(expected, RuleCatalog.All.Select(r => r.Id));
    }

    [Fact]
    public void All_WhenIdsAreRead_AreUniqueKebabCase()
    {
        Assert.All(RuleCatalog.All, rule => Assert.Matches(KebabCase(), rule.Id));
        Assert.Equal(RuleCatalog.All.Count, RuleCatalog.All.Select(r => r.Id).Distinct(StringComparer.OrdinalIgnoreCase).Count());
    }

    [Fact]
    public void All_WhenRolesAreNamed_EveryRoleExistsAndEveryPlaceholderIsARoleOfItsRule()
    {
        foreach (var rule in RuleCatalog.All)
        {
            Assert.All(rule.AllRoles, role => Assert.NotNull(RoleCatalog.Find(role)));
            foreach (var variant in rule.Variants)
            {
                Assert.All(RuleTemplate.Placeholders(variant.Template), role => Assert.Contains(role, rule.AllRoles));

                // A chosen variant must always render: what it needs outside brackets is required or checked for.
                var guaranteed = rule.RequiredRoles.Concat(variant.NeedsRoles).ToList();
                Assert.All(RuleTemplate.MandatoryPlaceholders(variant.Template), role => Assert.Contains(role, guaranteed));
                if (variant.PolicyRole is not null)
                {
                    Assert.Contains(variant.PolicyWord, RoleCatalog.Find(variant.PolicyRole)!.Choices);
                }
            }
        }
    }

    [Fact]
    public void All_WhenEveryTemplateIsFilledWithStandInNames_ParsesAsAFormula()
    {
        foreach (var rule in RuleCatalog.All)
        {
            foreach (var variant in rule.Variants)
            {
                var text = RuleTemplate.Render(variant.Template, StandIn);
                var diagnostics = new DiagnosticBag();

                var formula = FormulaReader.Parse(rule.Id, text!, diagnostics);

                Assert.True(formula is not null, $"{rule.Id}: {text}: {RuleHarness.Describe(diagnostics)}");
            }
        }
    }

    [Fact]
    public void Find_WhenIdDiffersInCase_FindsTheRule()
    {
        Assert.Equal("no-pumping", RuleCatalog.Find("No-Pumping")?.Id);
        Assert.Null(RuleCatalog.Find("no_pumping"));
    }

    private static string StandIn(string role) => RoleCatalog.Find(role)!.Kind switch
    {
        RoleValueKind.Duration => "T#10ms",
        _ when RoleCatalog.Find(role)!.TakesSeveral => $"({role.ToUpperInvariant()}_1 OR {role.ToUpperInvariant()}_2)",
        _ => role.ToUpperInvariant(),
    };

    [GeneratedRegex("^[a-z]+(-[a-z]+)*$")]
    private static partial Regex KebabCase();
}
