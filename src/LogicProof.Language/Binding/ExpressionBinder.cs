using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>
/// Resolves names and checks types of one expression at a time. A null result means an error was reported below;
/// the parent then skips its own type checks so that one mistake gives one diagnostic. Settings are replaced by
/// their constant value. The values of constant real subexpressions are tracked bottom-up, so that deciding
/// whether a product is linear never re-walks a subtree (long chains stay linear in time).
/// </summary>
internal sealed partial class ExpressionBinder(IReadOnlyDictionary<string, Symbol> symbols, DiagnosticBag diagnostics)
{
    private readonly Dictionary<BoundExpression, Fraction> _constants = new(ReferenceEqualityComparer.Instance);

    /// <summary>Binds and checks the type; <paramref name="role"/> names the place for the message ("the equation of X").</summary>
    public BoundExpression? BindAs(ExpressionSyntax syntax, ValueType expected, bool inFormula, string role) =>
        Expect(Bind(syntax, inFormula), expected, role);

    public BoundExpression? Bind(ExpressionSyntax syntax, bool inFormula) => syntax switch
    {
        BoolLiteralSyntax b => new BoundBoolConstant(b.Value, b.Span),
        NumberLiteralSyntax n => Constant(new BoundRealConstant(n.Value, n.Span), n.Value),
        DurationLiteralSyntax d => new BoundDurationConstant(d.Duration, d.Span),
        NameSyntax name => BindName(name),
        UnarySyntax unary => BindUnary(unary, inFormula),
        BinarySyntax binary => BindBinary(binary, inFormula),
        CallSyntax call => BindCall(call, inFormula),
        _ => throw new InvalidOperationException($"unknown expression form {syntax.GetType().Name}"),
    };

    /// <summary>Checks the type; the message names the place as <paramref name="role"/> and <paramref name="subject"/>, joined only when needed.</summary>
    private BoundExpression? Expect(BoundExpression? bound, ValueType expected, string role, string? subject = null)
    {
        if (bound is null || bound.Type == expected)
        {
            return bound;
        }

        var place = subject is null ? role : $"{role} {subject}";
        diagnostics.Error(
            LanguageCodes.TypeMismatch,
            $"{place} must be {TypeText.Of(expected)}, but this is {TypeText.Of(bound.Type)}",
            bound.Span);
        return null;
    }

    private BoundExpression? BindName(NameSyntax name)
    {
        if (!symbols.TryGetValue(name.Name, out var symbol))
        {
            var message = BuiltinCallables.IsBuiltin(name.Name)
                ? $"'{name.Name}' is {BuiltinCallables.KindOf(name.Name)}: call it with its arguments in parentheses"
                : $"'{name.Name}' is not declared";
            diagnostics.Error(LanguageCodes.UndefinedName, message, name.Span);
            return null;
        }

        if (symbol.Kind != SymbolKind.Setting)
        {
            return new BoundSymbolReference(symbol, name.Span);
        }

        if (symbol.SettingValue is not { } value)
        {
            return null; // its declaration was reported
        }

        var reference = value with { Span = name.Span };
        return reference is BoundRealConstant real ? Constant(reference, real.Value) : reference;
    }

    /// <summary>Binds a run of prefix operators (NOT NOT x) innermost first, without recursing along the run.</summary>
    private BoundExpression? BindUnary(UnarySyntax unary, bool inFormula)
    {
        var run = new List<UnarySyntax>();
        ExpressionSyntax node = unary;
        while (node is UnarySyntax u)
        {
            run.Add(u);
            node = u.Operand;
        }

        var operand = Bind(node, inFormula);
        for (var i = run.Count - 1; i >= 0 && operand is not null; i--)
        {
            var isNot = run[i].Operator == UnaryOperator.Not;
            var type = isNot ? ValueType.Bool : ValueType.Real;
            operand = Expect(operand, type, isNot ? "the operand of NOT" : "the operand of unary minus");
            if (operand is null)
            {
                break;
            }

            var bound = new BoundUnary(run[i].Operator, operand, type, run[i].Span);
            operand = !isNot && ConstantValue(operand) is { } value ? Constant(bound, -value) : bound;
        }

        return operand;
    }

    /// <summary>
    /// Binds a left-leaning chain (a AND b AND c ..., as the parser builds it) from the innermost left operand
    /// outwards, so a chain of any length costs no stack; right operands are bound recursively.
    /// </summary>
    private BoundExpression? BindBinary(BinarySyntax binary, bool inFormula)
    {
        var spine = new List<BinarySyntax>();
        ExpressionSyntax node = binary;
        while (node is BinarySyntax b)
        {
            spine.Add(b);
            node = b.Left;
        }

        var left = Bind(node, inFormula);
        for (var i = spine.Count - 1; i >= 0; i--)
        {
            left = Combine(spine[i], left, inFormula);
        }

        return left;
    }

    /// <summary>One link of a chain: <paramref name="left"/> is already bound (null after an error).</summary>
    private BoundExpression? Combine(BinarySyntax binary, BoundExpression? left, bool inFormula)
    {
        var op = binary.Operator;
        if (!inFormula && op is BinaryOperator.Implies or BinaryOperator.Since)
        {
            diagnostics.Error(
                op == BinaryOperator.Implies ? LanguageCodes.ImpliesInEquation : LanguageCodes.TemporalInEquation,
                op == BinaryOperator.Implies
                    ? "'->' (implies) is allowed only in require and assume formulas; in an equation write NOT a OR b"
                    : "SINCE is a past-time operator, allowed only in require and assume formulas",
                binary.Span);
            Bind(binary.Right, inFormula);
            return null;
        }

        var right = Bind(binary.Right, inFormula);
        if (op is BinaryOperator.Equal or BinaryOperator.NotEqual)
        {
            return BindEquality(binary, left, right);
        }

        var isLogical = op is BinaryOperator.Implies or BinaryOperator.Since or BinaryOperator.Or or BinaryOperator.Xor or BinaryOperator.And;
        var operandType = isLogical ? ValueType.Bool : ValueType.Real;
        var symbol = OperatorSpelling.Of(op);
        left = Expect(left, operandType, "the left operand of", symbol);
        right = Expect(right, operandType, "the right operand of", symbol);
        if (left is null || right is null)
        {
            return null;
        }

        return op is BinaryOperator.Add or BinaryOperator.Subtract or BinaryOperator.Multiply or BinaryOperator.Divide
            ? BindArithmetic(binary, left, right)
            : new BoundBinary(op, left, right, ValueType.Bool, binary.Span);
    }

    private BoundExpression? BindEquality(BinarySyntax binary, BoundExpression? left, BoundExpression? right)
    {
        if (left is null || right is null)
        {
            return null;
        }

        if (left.Type != right.Type || left.Type == ValueType.Time)
        {
            diagnostics.Error(
                LanguageCodes.TypeMismatch,
                $"{OperatorSpelling.Of(binary.Operator)} compares two bools or two reals, but this compares {TypeText.Of(left.Type)} with {TypeText.Of(right.Type)}",
                binary.Span);
            return null;
        }

        return new BoundBinary(binary.Operator, left, right, ValueType.Bool, binary.Span);
    }

    private BoundExpression? BindArithmetic(BinarySyntax binary, BoundExpression left, BoundExpression right)
    {
        var op = binary.Operator;
        var leftValue = ConstantValue(left);
        var rightValue = ConstantValue(right);
        if (op == BinaryOperator.Multiply && leftValue is null && rightValue is null)
        {
            diagnostics.Error(
                LanguageCodes.NonLinearArithmetic,
                "'*' needs a constant on one side (a number, a real setting or an expression of them): the proof uses linear arithmetic",
                binary.Span);
            return null;
        }

        if (op == BinaryOperator.Divide && rightValue is null)
        {
            diagnostics.Error(
                LanguageCodes.NonLinearArithmetic,
                "'/' can divide only by a constant (a number, a real setting or an expression of them): the proof uses linear arithmetic",
                binary.Span);
            return null;
        }

        if (op == BinaryOperator.Divide && rightValue is { IsZero: true })
        {
            diagnostics.Error(LanguageCodes.DivisionByZero, "division by a constant that is zero", right.Span);
            return null;
        }

        var node = new BoundBinary(op, left, right, ValueType.Real, binary.Span);
        if (leftValue is not { } l || rightValue is not { } r)
        {
            return node;
        }

        return Constant(node, op switch
        {
            BinaryOperator.Add => l + r,
            BinaryOperator.Subtract => l - r,
            BinaryOperator.Multiply => l * r,
            _ => l / r,
        });
    }

    private BoundExpression Constant(BoundExpression node, Fraction value)
    {
        _constants[node] = value;
        return node;
    }

    private Fraction? ConstantValue(BoundExpression node) => _constants.TryGetValue(node, out var value) ? value : null;
}
