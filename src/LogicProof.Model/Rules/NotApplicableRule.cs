namespace LogicProof.Model.Rules;

/// <summary>
/// A selected rule that cannot be checked on this scheme, with the roles it misses (possibly none, when the reason
/// is another, such as a lockout that is an input) and the reason in words. Never to be reported as passed.
/// </summary>
public sealed record NotApplicableRule(RuleDefinition Rule, IReadOnlyList<string> MissingRoles, string Reason);
