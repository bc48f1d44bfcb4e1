namespace LogicProof.Proof.Lemmas;

/// <summary>The value of a state slot: bool for bool memories, a whole number for counters, a real for real values.</summary>
public sealed record LemmaSlot(int Slot) : LemmaExpression;
