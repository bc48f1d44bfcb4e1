namespace LogicProof.Reports.Check;

/// <summary>A built-in rule that was not checked because the scheme binds none of these roles to a name.</summary>
public sealed record NotApplicableRule(string RuleId, IReadOnlyList<string> MissingRoles)
{
    public string? Statement { get; init; }
}
