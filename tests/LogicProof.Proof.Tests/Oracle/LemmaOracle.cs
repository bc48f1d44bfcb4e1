using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>The oracle's own reading of a lemma in one simulator state (written here, not shared with the generator).</summary>
internal static class LemmaOracle
{
    public static bool Holds(ScanModel model, LemmaExpression lemma, ScanState state) => lemma switch
    {
        LemmaBool b => b.Value,
        LemmaSlot slot => state.GetBool(slot.Slot),
        LemmaNot not => !Holds(model, not.Operand, state),
        LemmaAnd and => and.Operands.All(o => Holds(model, o, state)),
        LemmaOr or => or.Operands.Any(o => Holds(model, o, state)),
        LemmaImplies implies => !Holds(model, implies.Left, state) || Holds(model, implies.Right, state),
        LemmaCompare compare when IsBool(model, compare.Left) || IsBool(model, compare.Right) =>
            (Holds(model, compare.Left, state) == Holds(model, compare.Right, state)) == (compare.Operator == CompareOperator.Equal),
        LemmaCompare compare => Compare(compare.Operator, Value(model, compare.Left, state).CompareTo(Value(model, compare.Right, state))),
        _ => throw new InvalidOperationException($"not a bool lemma term: {lemma}"),
    };

    private static bool Compare(CompareOperator op, int order) => op switch
    {
        CompareOperator.Equal => order == 0,
        CompareOperator.NotEqual => order != 0,
        CompareOperator.Less => order < 0,
        CompareOperator.LessOrEqual => order <= 0,
        CompareOperator.Greater => order > 0,
        _ => order >= 0,
    };

    private static Fraction Value(ScanModel model, LemmaExpression term, ScanState state) => term switch
    {
        LemmaNumber n => n.Value,
        LemmaSlot s when model.StateSlots[s.Slot].Kind == StateSlotKind.TimerCounter => new Fraction(state.GetCounter(s.Slot)),
        LemmaSlot s => state.GetReal(s.Slot),
        LemmaAdd add => Value(model, add.Left, state) + Value(model, add.Right, state),
        LemmaScale scale => scale.Factor * Value(model, scale.Operand, state),
        _ => throw new InvalidOperationException($"not a numeric lemma term: {term}"),
    };

    private static bool IsBool(ScanModel model, LemmaExpression term) => term switch
    {
        LemmaSlot s => model.StateSlots[s.Slot].Kind is not StateSlotKind.TimerCounter
            && !(model.StateSlots[s.Slot].Kind == StateSlotKind.PreviousValue && model.StateSlots[s.Slot].Type == SignalType.Real),
        LemmaNumber or LemmaAdd or LemmaScale => false,
        _ => true,
    };
}
