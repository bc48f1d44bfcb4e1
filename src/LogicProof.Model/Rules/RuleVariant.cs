namespace LogicProof.Model.Rules;

/// <summary>
/// One formula of a rule. A variant is chosen when its policy matches (<see cref="PolicyRole"/> bound to
/// <see cref="PolicyWord"/>, or unbound and <see cref="IsPolicyDefault"/>) and the roles it needs beyond the rule's
/// required ones are bound; the first such variant in the catalog's order wins. The template is written in the
/// language with <c>{role}</c> placeholders; a part in square brackets is kept only when every role in it is bound.
/// </summary>
public sealed record RuleVariant(string Template)
{
    public string? PolicyRole { get; init; }

    public string? PolicyWord { get; init; }

    /// <summary>The variant used when <see cref="PolicyRole"/> is not bound.</summary>
    public bool IsPolicyDefault { get; init; }

    public IReadOnlyList<string> NeedsRoles { get; init; } = [];

    /// <summary>When this variant applies, in words ("always", "with low_gas_policy = block_trip").</summary>
    public string Condition
    {
        get
        {
            var parts = new List<string>();
            if (PolicyRole is not null)
            {
                parts.Add(IsPolicyDefault ? $"{PolicyRole} = {PolicyWord} or not bound" : $"{PolicyRole} = {PolicyWord}");
            }

            if (NeedsRoles.Count > 0)
            {
                parts.Add(string.Join(" and ", NeedsRoles) + (NeedsRoles.Count == 1 ? " is bound" : " are bound"));
            }

            return parts.Count == 0 ? "always" : "when " + string.Join(", ", parts);
        }
    }

    public bool MatchesPolicy(RoleBindings roles)
    {
        ArgumentNullException.ThrowIfNull(roles);
        if (PolicyRole is null)
        {
            return true;
        }

        return roles.Find(PolicyRole) is { Policy: { } word }
            ? string.Equals(word, PolicyWord, StringComparison.OrdinalIgnoreCase)
            : IsPolicyDefault;
    }
}
