namespace LogicProof.Proof.Engines;

/// <summary>
/// Limits and switches every engine honours. <see cref="MaxDepth"/> counts steps of the encoding (with time
/// acceleration a step may span many scans). <see cref="TimeLimit"/> bounds each engine run; reaching it gives
/// Inconclusive, never Proved. <see cref="Accelerate"/> turns time acceleration off for testing (every step is then
/// one scan, and BMC's shortest trace is shortest in scans).
/// </summary>
public sealed record EngineOptions
{
    public int MaxDepth { get; init; } = 50;

    public TimeSpan? TimeLimit { get; init; }

    public bool Accelerate { get; init; } = true;
}
