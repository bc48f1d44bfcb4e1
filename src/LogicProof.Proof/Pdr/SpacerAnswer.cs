namespace LogicProof.Proof.Pdr;

internal enum SpacerOutcome
{
    /// <summary>No reachable state violates the property; <see cref="SpacerAnswer.Invariant"/> shows why.</summary>
    Holds,

    /// <summary>Some reachable state violates the property (Spacer found a derivation).</summary>
    Violated,

    /// <summary>Timeout, cancellation or the solver gave up; <see cref="SpacerAnswer.Reason"/> says which.</summary>
    Unknown,
}

/// <summary>What Spacer concluded: the outcome, the readable inductive invariant when it holds, or why it stopped.</summary>
internal sealed record SpacerAnswer(SpacerOutcome Outcome, string? Invariant, string? Reason);
