namespace LogicProof.Model.Rules;

/// <summary>
/// A built-in close-supervision rule: a stable kebab-case id of our own, a one-line statement, the reason in the
/// trade, the roles it needs and may use, and its formula variants (past-time formulas that must hold at every
/// scan). A rule applies when every role of <see cref="RequiredRoles"/> is bound, at least one of
/// <see cref="OneOfRoles"/> is (when that list is not empty), every role of <see cref="ComputedRoles"/> names a
/// signal the scheme computes, and a variant matches; otherwise it is reported as not applicable, never as passed.
/// <see cref="DesignNote"/> records a choice made in writing the formula.
/// </summary>
public sealed record RuleDefinition(
    string Id,
    string Statement,
    string Reason,
    IReadOnlyList<string> RequiredRoles,
    IReadOnlyList<string> OptionalRoles,
    IReadOnlyList<RuleVariant> Variants)
{
    public IReadOnlyList<string> OneOfRoles { get; init; } = [];

    public IReadOnlyList<string> ComputedRoles { get; init; } = [];

    public string? DesignNote { get; init; }

    /// <summary>Every role the rule can read, required first.</summary>
    public IReadOnlyList<string> AllRoles => [.. RequiredRoles, .. OneOfRoles, .. OptionalRoles];

    /// <summary>The roles needed, in words, for listings: "close_output, lockout", "close_output and one of breaker_open, breaker_closed".</summary>
    public string NeededRolesText =>
        OneOfRoles.Count == 0
            ? string.Join(", ", RequiredRoles)
            : string.Join(", ", RequiredRoles) + (RequiredRoles.Count > 0 ? " and " : string.Empty) + "one of " + string.Join(", ", OneOfRoles);
}
