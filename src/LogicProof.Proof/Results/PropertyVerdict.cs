namespace LogicProof.Proof.Results;

/// <summary>
/// What an engine concluded about one property: <see cref="Proved"/> (holds at every scan of every input
/// sequence that satisfies the assumptions), <see cref="Violated"/> (a replayable trace breaks it), or
/// <see cref="Inconclusive"/> (neither, within the limits). A time or resource limit never gives Proved.
/// </summary>
public abstract record PropertyVerdict
{
    public bool IsConclusive => this is not Inconclusive;
}
