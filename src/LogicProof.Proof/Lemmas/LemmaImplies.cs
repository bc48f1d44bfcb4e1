namespace LogicProof.Proof.Lemmas;

public sealed record LemmaImplies(LemmaExpression Left, LemmaExpression Right) : LemmaExpression;
