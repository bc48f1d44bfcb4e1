using LogicProof.Model.Lowering;

namespace LogicProof.Model.Rules;

/// <summary>The built-in rules for one scheme: applied (with their properties), not applicable (with reasons) and skipped by the selection; each list in catalog order.</summary>
public sealed record RuleExpansion(
    IReadOnlyList<AppliedRule> Applied,
    IReadOnlyList<NotApplicableRule> NotApplicable,
    IReadOnlyList<RuleDefinition> Skipped)
{
    public IReadOnlyList<ExtraProperty> Properties => [.. Applied.Select(rule => rule.Property)];
}
