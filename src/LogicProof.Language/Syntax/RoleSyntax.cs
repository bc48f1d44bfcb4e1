using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary><c>role = value, value;</c> in the roles section. Role names and value kinds are checked by the rules layer.</summary>
public sealed record RoleBindingSyntax(string Role, SourceSpan RoleSpan, IReadOnlyList<RoleValueSyntax> Values, SourceSpan Span);

public abstract record RoleValueSyntax(SourceSpan Span);

public sealed record NameRoleValueSyntax(string Name, SourceSpan Span) : RoleValueSyntax(Span);

public sealed record DurationRoleValueSyntax(DurationSyntax Duration, SourceSpan Span) : RoleValueSyntax(Span);

public sealed record BoolRoleValueSyntax(bool Value, SourceSpan Span) : RoleValueSyntax(Span);
