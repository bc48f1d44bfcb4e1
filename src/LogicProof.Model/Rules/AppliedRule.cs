using LogicProof.Model.Lowering;

namespace LogicProof.Model.Rules;

/// <summary>A rule whose roles are bound: the variant chosen, its formula with the scheme's names, and the property to check.</summary>
public sealed record AppliedRule(RuleDefinition Rule, RuleVariant Variant, string Formula, ExtraProperty Property);
