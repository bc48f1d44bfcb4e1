using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// Translates lemmas. Numeric terms are Int while only whole numbers and counters are involved and Real as soon
/// as a real slot or a non-integral constant is; bit-vector counters are read as unsigned Ints, so lemma
/// arithmetic never wraps.
/// </summary>
internal sealed class LemmaEncoder
{
    private readonly ScanEncoder _encoder;

    public LemmaEncoder(ScanEncoder encoder)
    {
        _encoder = encoder;
    }

    private Context Context => _encoder.Context;

    public BoolExpr Encode(LemmaExpression expression, SymbolicState state) => Bool(expression, state);

    private BoolExpr Bool(LemmaExpression expression, SymbolicState state) => expression switch
    {
        LemmaBool b => Context.MkBool(b.Value),
        LemmaSlot slot when SlotIsBool(slot.Slot) => (BoolExpr)state[slot.Slot],
        LemmaNot not => Context.MkNot(Bool(not.Operand, state)),
        LemmaAnd and => Context.MkAnd(and.Operands.Select(o => Bool(o, state))),
        LemmaOr or => Context.MkOr(or.Operands.Select(o => Bool(o, state))),
        LemmaImplies implies => Context.MkImplies(Bool(implies.Left, state), Bool(implies.Right, state)),
        LemmaCompare compare => Compare(compare, state),
        _ => throw new InvalidOperationException($"Lemma term {expression} is not a bool term."),
    };

    private BoolExpr Compare(LemmaCompare compare, SymbolicState state)
    {
        if (IsBoolTerm(compare.Left) || IsBoolTerm(compare.Right))
        {
            var equal = Context.MkEq(Bool(compare.Left, state), Bool(compare.Right, state));
            return compare.Operator switch
            {
                CompareOperator.Equal => equal,
                CompareOperator.NotEqual => Context.MkNot(equal),
                _ => throw new InvalidOperationException($"Bool lemma terms compare only with = and <>, not {compare.Operator}."),
            };
        }

        var (left, right) = Unify(Number(compare.Left, state), Number(compare.Right, state));
        return compare.Operator switch
        {
            CompareOperator.Equal => Context.MkEq(left, right),
            CompareOperator.NotEqual => Context.MkNot(Context.MkEq(left, right)),
            CompareOperator.Less => Context.MkLt(left, right),
            CompareOperator.LessOrEqual => Context.MkLe(left, right),
            CompareOperator.Greater => Context.MkGt(left, right),
            CompareOperator.GreaterOrEqual => Context.MkGe(left, right),
            _ => throw new InvalidOperationException($"Unknown comparison {compare.Operator}."),
        };
    }

    private ArithExpr Number(LemmaExpression expression, SymbolicState state)
    {
        switch (expression)
        {
            case LemmaNumber number:
                var reduced = number.Value.Reduce();
                return reduced.Denominator.IsOne
                    ? Context.MkInt(reduced.Numerator.ToString(System.Globalization.CultureInfo.InvariantCulture))
                    : RealTerms.Constant(Context, reduced);
            case LemmaSlot slot when !SlotIsBool(slot.Slot):
                var kind = _encoder.Model.StateSlots[slot.Slot].Kind;
                return kind == StateSlotKind.TimerCounter
                    ? _encoder.Counters.ToInteger(state[slot.Slot])
                    : (ArithExpr)state[slot.Slot];
            case LemmaAdd add:
                var (left, right) = Unify(Number(add.Left, state), Number(add.Right, state));
                return Context.MkAdd(left, right);
            case LemmaScale scale:
                var (factor, operand) = Unify(Number(new LemmaNumber(scale.Factor), state), Number(scale.Operand, state));
                return Context.MkMul(factor, operand);
            default:
                throw new InvalidOperationException($"Lemma term {expression} is not a numeric term.");
        }
    }

    private (ArithExpr Left, ArithExpr Right) Unify(ArithExpr left, ArithExpr right) =>
        left is IntExpr leftInt && right is not IntExpr
            ? (Context.MkInt2Real(leftInt), right)
            : right is IntExpr rightInt && left is not IntExpr
                ? (left, Context.MkInt2Real(rightInt))
                : (left, right);

    private bool SlotIsBool(int slot)
    {
        var s = _encoder.Model.StateSlots[slot];
        return s.Kind switch
        {
            StateSlotKind.TimerCounter => false,
            StateSlotKind.PreviousValue => s.Type == SignalType.Bool,
            _ => true,
        };
    }

    private bool IsBoolTerm(LemmaExpression expression) => expression switch
    {
        LemmaSlot slot => SlotIsBool(slot.Slot),
        LemmaNumber or LemmaAdd or LemmaScale => false,
        _ => true,
    };
}
