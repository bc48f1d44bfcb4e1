namespace LogicProof.Proof.Lemmas;

public sealed record LemmaBool(bool Value) : LemmaExpression;
