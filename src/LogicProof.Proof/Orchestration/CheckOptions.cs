using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Orchestration;

/// <summary>
/// Options of a portfolio check. <see cref="MaxDepth"/> counts encoding steps (see <c>EngineOptions</c>);
/// <see cref="TimeLimitPerProperty"/> bounds each property's wall-clock time (reaching it gives Inconclusive, never
/// Proved); properties run in parallel up to <see cref="MaxParallelProperties"/>. <see cref="LemmaSource"/> is the
/// hook for an invariant generator: given the sliced model a property is checked on, it returns proved invariants
/// over that model's slots.
/// </summary>
public sealed record CheckOptions
{
    public EngineSelection Engine { get; init; } = EngineSelection.Auto;

    public int MaxDepth { get; init; } = 50;

    public TimeSpan TimeLimitPerProperty { get; init; } = TimeSpan.FromSeconds(60);

    public bool Accelerate { get; init; } = true;

    public int MaxParallelProperties { get; init; } = Environment.ProcessorCount;

    /// <summary>Check each property on its cone of influence (on by default; off only for testing).</summary>
    public bool SliceToCone { get; init; } = true;

    public Func<ScanModel, IReadOnlyList<Lemma>>? LemmaSource { get; init; }
}
