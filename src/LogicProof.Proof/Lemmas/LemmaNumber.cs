using Fractions;

namespace LogicProof.Proof.Lemmas;

public sealed record LemmaNumber(Fraction Value) : LemmaExpression;
