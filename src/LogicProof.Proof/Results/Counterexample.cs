namespace LogicProof.Proof.Results;

/// <summary>
/// A timed input sequence that breaks a property. <see cref="PowerUp"/> gives the value chosen for every state slot
/// with an unknown power-up value (an undeclared latch); the steps follow from power-up in order, the last one being
/// the failing step (<see cref="FailingStep"/>, one scan long): every assumption holds at every scan of the trace,
/// the property holds at every scan before the failing one and is FALSE at it.
/// Cell values cover every cell of the property's cone of influence.
/// </summary>
public sealed record Counterexample(
    IReadOnlyList<NamedValue> PowerUp,
    IReadOnlyList<TraceStep> Steps,
    int FailingStep,
    Justification Justification)
{
    /// <summary>The 0-based scan at which the property is FALSE.</summary>
    public long FailingScan => Steps[FailingStep].FirstScan;

    /// <summary>The number of scans from power-up up to and including the failing one.</summary>
    public long TotalScans => FailingScan + 1;
}
