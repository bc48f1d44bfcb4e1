using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>A power-up state, and the latches of unknown power-up that were started FALSE because no value was given.</summary>
public sealed record PowerUpResult(ScanState State, IReadOnlyList<StateSlot> DefaultedToFalse);
