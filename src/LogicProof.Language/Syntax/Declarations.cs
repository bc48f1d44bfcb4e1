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

/// <summary>A local or output variable. <see cref="Initial"/> is its power-up value when declared.</summary>
public sealed record VariableDeclarationSyntax(
    string Name,
    SourceSpan NameSpan,
    VariableKind Kind,
    ValueType Type,
    ExpressionSyntax? Initial,
    string? Description,
    SourceSpan Span);
