namespace LogicProof.Proof.Lemmas;

/// <summary>
/// A solver-independent term over the slots of one state. Bool terms: slots of bool kind, <see cref="LemmaBool"/>,
/// the connectives and comparisons. Numeric terms: counter slots (whole numbers), real previous-value slots,
/// <see cref="LemmaNumber"/>, sums and constant multiples; arithmetic is exact (no wrap-around, no rounding).
/// </summary>
public abstract record LemmaExpression;
