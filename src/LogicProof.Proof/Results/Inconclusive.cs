namespace LogicProof.Proof.Results;

/// <summary>
/// Neither proved nor violated within the limits. <paramref name="DepthReached"/> is the number of encoding steps
/// for which no violation exists (every trace of at most that many steps satisfies the property; with time
/// acceleration a step may span many scans, so this covers at least that many scans).
/// </summary>
public sealed record Inconclusive(string Reason, int DepthReached) : PropertyVerdict;
