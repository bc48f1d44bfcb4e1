namespace LogicProof.Proof.Orchestration;

/// <summary>
/// For a violated property whose counterexample chose power-up values of latches without a declared <c>init</c>:
/// each such latch and what each of its power-up values does to the property. <see cref="DependsOnPowerUp"/> is TRUE
/// when some latch decides the verdict alone (one value breaks the property, the other proves it).
/// </summary>
public sealed record PowerUpSensitivityReport(string Property, IReadOnlyList<PowerUpSensitivityLatch> Latches)
{
    public bool DependsOnPowerUp => Latches.Any(latch => latch.BreakingValue is not null);
}
