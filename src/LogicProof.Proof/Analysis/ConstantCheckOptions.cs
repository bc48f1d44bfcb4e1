using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Analysis;

/// <summary>
/// Limits of the constant-equation check: the induction depth tried (1 or 2 is usually enough for an equation that
/// is constant because of the logic around it), the time for the whole model, and invariants that may be assumed.
/// </summary>
public sealed record ConstantCheckOptions
{
    public int InductionDepth { get; init; } = 2;

    public TimeSpan TimeLimit { get; init; } = TimeSpan.FromSeconds(20);

    public IReadOnlyList<Lemma> Lemmas { get; init; } = [];
}
