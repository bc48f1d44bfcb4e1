namespace LogicProof.Proof.Lemmas;

public sealed record LemmaAnd(IReadOnlyList<LemmaExpression> Operands) : LemmaExpression;
