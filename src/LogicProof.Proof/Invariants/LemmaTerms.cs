using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>Builders of the lemma shapes the generator proposes, each with its readable description over slot names.</summary>
internal sealed class LemmaTerms(ScanModel model)
{
    public string Name(int slot) => model.StateSlots[slot].Name;

    public static LemmaExpression Slot(int slot) => new LemmaSlot(slot);

    public static LemmaExpression Number(long value) => new LemmaNumber(new Fraction(value));

    public static LemmaExpression Compare(CompareOperator op, LemmaExpression left, LemmaExpression right) =>
        new LemmaCompare(op, left, right);

    public static LemmaExpression Not(LemmaExpression operand) => new LemmaNot(operand);

    public static LemmaExpression Or(params LemmaExpression[] operands) => new LemmaOr(operands);

    public static LemmaExpression And(params LemmaExpression[] operands) => new LemmaAnd(operands);

    /// <summary>0 &lt;= c &lt;= n for a timer counter.</summary>
    public Lemma CounterBounds(int slot, int preset) => new(
        $"0 <= {Name(slot)} <= {preset}",
        And(
            Compare(CompareOperator.GreaterOrEqual, Slot(slot), Number(0)),
            Compare(CompareOperator.LessOrEqual, Slot(slot), Number(preset))));

    /// <summary>c_a = min(c_b, n_a): two timers on the same input, a with the shorter (or equal) preset.</summary>
    public Lemma MinOf(int shorter, int longer, int shorterPreset) => new(
        $"{Name(shorter)} = min({Name(longer)}, {shorterPreset})",
        Or(
            And(
                Compare(CompareOperator.Less, Slot(longer), Number(shorterPreset)),
                Compare(CompareOperator.Equal, Slot(shorter), Slot(longer))),
            And(
                Compare(CompareOperator.GreaterOrEqual, Slot(longer), Number(shorterPreset)),
                Compare(CompareOperator.Equal, Slot(shorter), Number(shorterPreset)))));

    /// <summary>min(c_b, n_a) &lt;= c_a: whenever timer b counts, timer a counts too.</summary>
    public Lemma CountsAtLeast(int counter, int preset, int other) => new(
        $"min({Name(other)}, {preset}) <= {Name(counter)}",
        Or(
            Compare(CompareOperator.LessOrEqual, Slot(other), Slot(counter)),
            Compare(CompareOperator.GreaterOrEqual, Slot(counter), Number(preset))));

    /// <summary>One bool atom implies another (either may be negated).</summary>
    public static Lemma Implies(Atom premise, Atom conclusion) => new(
        $"{premise.Operand} -> {conclusion.Operand}",
        new LemmaImplies(premise.Expression, conclusion.Expression));

    public static Lemma Equal(Atom left, Atom right) => new(
        $"{left.Operand} = {right.Operand}",
        Compare(CompareOperator.Equal, left.Expression, right.Expression));

    public static Lemma Always(Atom atom) => new(atom.Text, atom.Expression);

    public Atom BoolSlot(int slot) => new($"{Name(slot)}", Slot(slot));

    public Atom CounterRunning(int slot) => new($"{Name(slot)} > 0", Compare(CompareOperator.Greater, Slot(slot), Number(0)));

    public Atom CounterAt(int slot, int value) => new($"{Name(slot)} = {value}", Compare(CompareOperator.Equal, Slot(slot), Number(value)));
}
