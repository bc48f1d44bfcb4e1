namespace LogicProof.Proof.Orchestration;

/// <summary>The verdict on a property with one latch's power-up value fixed (the other latches still unknown).</summary>
public enum PowerUpSensitivityOutcome
{
    Proved,
    Violated,
    Inconclusive,
}
