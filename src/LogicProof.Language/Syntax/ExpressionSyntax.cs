using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary>An expression as written. Parentheses are not kept: the printer adds them back by precedence.</summary>
public abstract record ExpressionSyntax(SourceSpan Span);

public sealed record BoolLiteralSyntax(bool Value, SourceSpan Span) : ExpressionSyntax(Span);

public sealed record NumberLiteralSyntax(Fraction Value, string Text, SourceSpan Span) : ExpressionSyntax(Span);

public sealed record DurationLiteralSyntax(DurationSyntax Duration, SourceSpan Span) : ExpressionSyntax(Span);

public sealed record NameSyntax(string Name, SourceSpan Span) : ExpressionSyntax(Span);

public sealed record UnarySyntax(UnaryOperator Operator, ExpressionSyntax Operand, SourceSpan Span) : ExpressionSyntax(Span);

public sealed record BinarySyntax(BinaryOperator Operator, ExpressionSyntax Left, ExpressionSyntax Right, SourceSpan Span)
    : ExpressionSyntax(Span);

/// <summary>A call by name: a function block, a function or a past-time operator; resolved by the binder.</summary>
public sealed record CallSyntax(string Callee, SourceSpan CalleeSpan, IReadOnlyList<ArgumentSyntax> Arguments, SourceSpan Span)
    : ExpressionSyntax(Span);

/// <summary>A call argument, positional or named as in IEC 61131-3 (<c>IN := x</c>).</summary>
public sealed record ArgumentSyntax(string? Name, ExpressionSyntax Value, SourceSpan Span);
