namespace LogicProof.Model.Rules;

/// <summary>
/// Which built-in rules to apply: only those of <see cref="Only"/> when it is given (<c>--rules</c>), minus those of
/// <see cref="Skip"/> (<c>--skip-rules</c>). Ids are compared ignoring case; an id no rule has is an input error.
/// </summary>
public sealed record RuleSelection(IReadOnlyList<string>? Only, IReadOnlyList<string> Skip)
{
    public static RuleSelection Every { get; } = new(null, []);

    public bool Selects(string id) =>
        (Only is null || Only.Contains(id, StringComparer.OrdinalIgnoreCase)) && !Skip.Contains(id, StringComparer.OrdinalIgnoreCase);
}
