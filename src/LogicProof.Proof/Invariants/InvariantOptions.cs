namespace LogicProof.Proof.Invariants;

/// <summary>
/// Limits of <see cref="InvariantGenerator"/>. The simulation takes <see cref="SimulationRuns"/> runs of up to
/// <see cref="ScansPerRun"/> scans from <see cref="Seed"/> (deterministic); at most <see cref="MaxCandidates"/>
/// candidates go to the solver; <see cref="TimeLimit"/> bounds the solver work (reaching it gives no lemmas, never
/// unproved ones).
/// </summary>
public sealed record InvariantOptions
{
    public int SimulationRuns { get; init; } = 64;

    public int ScansPerRun { get; init; } = 64;

    public int Seed { get; init; } = 61131;

    public int MaxCandidates { get; init; } = 300;

    public TimeSpan TimeLimit { get; init; } = TimeSpan.FromSeconds(10);
}
