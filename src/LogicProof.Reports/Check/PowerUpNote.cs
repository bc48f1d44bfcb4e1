namespace LogicProof.Reports.Check;

/// <summary>
/// A latch without a declared power-up value (<c>init</c>) that a counterexample starts at
/// <see cref="BreakingValue"/>: the checker tried both values and <see cref="Property"/> fails from this one.
/// <see cref="Latch"/> is the name to give the simulator (<c>--powerup LATCH=TRUE</c>); <see cref="Slot"/> is the
/// model's memory name.
/// </summary>
public sealed record PowerUpNote(string Property, string Latch, string Slot, bool BreakingValue);
