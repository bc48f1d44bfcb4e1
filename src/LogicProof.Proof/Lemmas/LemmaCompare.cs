using LogicProof.Model.Scan;

namespace LogicProof.Proof.Lemmas;

/// <summary>Compares two numeric terms, or two bool terms (Equal and NotEqual only).</summary>
public sealed record LemmaCompare(CompareOperator Operator, LemmaExpression Left, LemmaExpression Right) : LemmaExpression;
