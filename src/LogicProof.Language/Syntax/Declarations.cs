using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

public sealed record RangeSyntax(Fraction Low, Fraction High, SourceSpan Span);

public sealed record InputDeclarationSyntax(
    string Name, SourceSpan NameSpan, ValueType Type, RangeSyntax? Range, string? Description, SourceSpan Span);

/// <summary>A named constant (a relay setting). Its value is a literal of its type.</summary>
public sealed record SettingDeclarationSyntax(
    string Name, SourceSpan NameSpan, ValueType Type, ExpressionSyntax Value, string? Description, SourceSpan Span);

public enum VariableKind
{
    Local,
    Output,
}

/// <summary>
/// A local or output variable. <see cref="Initial"/> is its power-up value when declared. <see cref="Retained"/> is
/// TRUE for <c>init retained</c>: a non-volatile memory whose power-up value is the value it had before the relay
/// restarted (IEC 61131-3 RETAIN); <see cref="Initial"/> is then null.
/// </summary>
public sealed record VariableDeclarationSyntax(
    string Name,
    SourceSpan NameSpan,
    VariableKind Kind,
    ValueType Type,
    ExpressionSyntax? Initial,
    string? Description,
    SourceSpan Span)
{
    public bool Retained { get; init; }
}
