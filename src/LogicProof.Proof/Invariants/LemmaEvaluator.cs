using System.Numerics;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>The value of a lemma in one concrete state, with exact arithmetic.</summary>
internal sealed class LemmaEvaluator(ScanModel model)
{
    public bool Holds(LemmaExpression expression, ScanState state) => expression switch
    {
        LemmaBool b => b.Value,
        LemmaSlot slot => state.GetBool(slot.Slot),
        LemmaNot not => !Holds(not.Operand, state),
        LemmaAnd and => and.Operands.All(o => Holds(o, state)),
        LemmaOr or => or.Operands.Any(o => Holds(o, state)),
        LemmaImplies implies => !Holds(implies.Left, state) || Holds(implies.Right, state),
        LemmaCompare compare when IsBool(compare.Left) => CompareBools(compare, state),
        LemmaCompare compare when WholeNumber(compare.Left, state) is { } left && WholeNumber(compare.Right, state) is { } right =>
            Ordered(compare.Operator, left.CompareTo(right)),
        LemmaCompare compare => Ordered(compare.Operator, Number(compare.Left, state).CompareTo(Number(compare.Right, state))),
        _ => throw new InvalidOperationException($"Lemma term {expression} is not a bool term."),
    };

    private bool CompareBools(LemmaCompare compare, ScanState state)
    {
        var equal = Holds(compare.Left, state) == Holds(compare.Right, state);
        return compare.Operator switch
        {
            CompareOperator.Equal => equal,
            CompareOperator.NotEqual => !equal,
            _ => throw new InvalidOperationException($"Bool lemma terms compare only with = and <>, not {compare.Operator}."),
        };
    }

    private static bool Ordered(CompareOperator op, int order) => op switch
    {
        CompareOperator.Equal => order == 0,
        CompareOperator.NotEqual => order != 0,
        CompareOperator.Less => order < 0,
        CompareOperator.LessOrEqual => order <= 0,
        CompareOperator.Greater => order > 0,
        CompareOperator.GreaterOrEqual => order >= 0,
        _ => throw new InvalidOperationException($"Unknown comparison {op}."),
    };

    /// <summary>
    /// The value of a term made of counters and whole numbers, without fractions (the common case, and the one the
    /// sampling filter evaluates thousands of times); null when the term involves a real or a fraction.
    /// </summary>
    private long? WholeNumber(LemmaExpression expression, ScanState state) => expression switch
    {
        LemmaNumber number when number.Value.Denominator.IsOne && BigInteger.Abs(number.Value.Numerator) <= int.MaxValue =>
            (long)number.Value.Numerator,
        LemmaSlot slot when model.StateSlots[slot.Slot].Kind == StateSlotKind.TimerCounter => state.GetCounter(slot.Slot),
        LemmaAdd add when WholeNumber(add.Left, state) is { } left && WholeNumber(add.Right, state) is { } right => left + right,
        LemmaScale scale when scale.Factor.Denominator.IsOne && BigInteger.Abs(scale.Factor.Numerator) <= int.MaxValue
            && WholeNumber(scale.Operand, state) is { } operand =>
            (long)scale.Factor.Numerator * operand,
        _ => null,
    };

    private Fraction Number(LemmaExpression expression, ScanState state) => expression switch
    {
        LemmaNumber number => number.Value,
        LemmaSlot slot when model.StateSlots[slot.Slot].Kind == StateSlotKind.TimerCounter => new Fraction(state.GetCounter(slot.Slot)),
        LemmaSlot slot => state.GetReal(slot.Slot),
        LemmaAdd add => Number(add.Left, state) + Number(add.Right, state),
        LemmaScale scale => scale.Factor * Number(scale.Operand, state),
        _ => throw new InvalidOperationException($"Lemma term {expression} is not a numeric term."),
    };

    private bool IsBool(LemmaExpression expression) => expression switch
    {
        LemmaSlot slot => model.StateSlots[slot.Slot] switch
        {
            { Kind: StateSlotKind.TimerCounter } => false,
            { Kind: StateSlotKind.PreviousValue, Type: SignalType.Real } => false,
            _ => true,
        },
        LemmaNumber or LemmaAdd or LemmaScale => false,
        _ => true,
    };
}
