namespace LogicProof.Proof.Lemmas;

public sealed record LemmaNot(LemmaExpression Operand) : LemmaExpression;
