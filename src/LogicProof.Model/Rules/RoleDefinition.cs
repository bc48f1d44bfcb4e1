namespace LogicProof.Model.Rules;

/// <summary>
/// One of the fixed roles a scheme can bind in its <c>roles</c> section. A role that takes several names means any
/// of them (a rule formula reads it as <c>(A OR B)</c>); <see cref="Choices"/> are the words of a policy role.
/// </summary>
public sealed record RoleDefinition(string Name, RoleValueKind Kind, bool TakesSeveral, string Description)
{
    public IReadOnlyList<string> Choices { get; init; } = [];
}
