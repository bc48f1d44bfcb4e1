using Fractions;

namespace LogicProof.Proof.Lemmas;

/// <summary>A constant multiple of a numeric term (a negative factor gives differences).</summary>
public sealed record LemmaScale(Fraction Factor, LemmaExpression Operand) : LemmaExpression;
