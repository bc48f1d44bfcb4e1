namespace LogicProof.Proof.Lemmas;

public sealed record LemmaOr(IReadOnlyList<LemmaExpression> Operands) : LemmaExpression;
