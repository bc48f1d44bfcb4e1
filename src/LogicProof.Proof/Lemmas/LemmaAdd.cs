namespace LogicProof.Proof.Lemmas;

public sealed record LemmaAdd(LemmaExpression Left, LemmaExpression Right) : LemmaExpression;
