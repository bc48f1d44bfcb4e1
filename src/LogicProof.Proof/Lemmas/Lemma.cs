namespace LogicProof.Proof.Lemmas;

/// <summary>
/// A formula over state slots claimed to hold in every state reachable from power-up through scans at which every
/// assumption held (an invariant), for example a relation between two timer counters. Lemmas come from an invariant
/// generator that has proved them; engines assert them at every state of an induction path, which is sound exactly
/// when they are invariants, and never report a lemma as proved themselves.
/// </summary>
public sealed record Lemma(string Description, LemmaExpression Expression);
