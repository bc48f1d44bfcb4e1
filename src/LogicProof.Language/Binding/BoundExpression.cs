using Fractions;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>A name-resolved, type-checked expression. Every node has a type and the span of its source.</summary>
public abstract record BoundExpression(ValueType Type, SourceSpan Span);

/// <summary>A literal value, or a setting's value (then <see cref="SettingName"/> names the setting).</summary>
public abstract record BoundConstant(ValueType Type, SourceSpan Span) : BoundExpression(Type, Span)
{
    public string? SettingName { get; init; }
}

public sealed record BoundBoolConstant(bool Value, SourceSpan Span) : BoundConstant(ValueType.Bool, Span);

public sealed record BoundRealConstant(Fraction Value, SourceSpan Span) : BoundConstant(ValueType.Real, Span);

public sealed record BoundDurationConstant(DurationSyntax Duration, SourceSpan Span) : BoundConstant(ValueType.Time, Span);

/// <summary>A reference to an input, local or output (settings are replaced by their constant value).</summary>
public sealed record BoundSymbolReference(Symbol Symbol, SourceSpan Span) : BoundExpression(Symbol.Type, Span);

public sealed record BoundUnary(UnaryOperator Operator, BoundExpression Operand, ValueType Type, SourceSpan Span)
    : BoundExpression(Type, Span);

/// <summary>
/// A binary operation. Comparisons of bools (= and &lt;&gt;) and of reals give bool; + - give real; * and / need one
/// constant side (linear arithmetic); SINCE and -> take and give bool.
/// </summary>
public sealed record BoundBinary(BinaryOperator Operator, BoundExpression Left, BoundExpression Right, ValueType Type, SourceSpan Span)
    : BoundExpression(Type, Span);

/// <summary>ABS, MIN, MAX on reals.</summary>
public sealed record BoundFunctionCall(BuiltinFunction Function, IReadOnlyList<BoundExpression> Arguments, SourceSpan Span)
    : BoundExpression(ValueType.Real, Span);

/// <summary>
/// One call site of an IEC 61131-3 function block; each call site is its own instance with its own memory.
/// <see cref="Inputs"/> are in the standard's order: TON/TOF/TP [IN]; R_TRIG/F_TRIG [CLK]; SR [S1, R]; RS [S, R1].
/// <see cref="Preset"/> is set for TON, TOF and TP only. The value of the call is the block's Q (Q1 for SR/RS).
/// </summary>
public sealed record BoundFunctionBlockCall(
    FunctionBlockKind Kind,
    IReadOnlyList<BoundExpression> Inputs,
    BoundDuration? Preset,
    SourceSpan Span) : BoundExpression(ValueType.Bool, Span);

/// <summary>
/// A past-time operator, allowed only in require and assume formulas. <see cref="Window"/> is set for HELD and
/// WITHIN. SINCE is the binary operator <see cref="BinaryOperator.Since"/>, not this node.
/// </summary>
public sealed record BoundTemporal(TemporalOperator Operator, BoundExpression Operand, BoundDuration? Window, SourceSpan Span)
    : BoundExpression(Operand.Type, Span);

/// <summary>A duration argument: the literal, or the setting it came from.</summary>
public sealed record BoundDuration(DurationSyntax Value, string? SettingName, SourceSpan Span);
