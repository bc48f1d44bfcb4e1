namespace LogicProof.Proof.Results;

/// <summary>
/// The property holds. <paramref name="Depth"/> is the induction depth k when the proof is k-inductive (the base
/// case covered every trace of fewer than k steps); <paramref name="Invariant"/> is a readable inductive invariant
/// when the engine found one.
/// </summary>
public sealed record Proved(string Engine, int? Depth, string? Invariant) : PropertyVerdict;
