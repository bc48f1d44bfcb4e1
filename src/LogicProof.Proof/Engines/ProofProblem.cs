using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Engines;

/// <summary>
/// One property to check on a model, normally the property's cone of influence (the slice keeps every cell, step and
/// slot the property and the assumptions depend on). <see cref="Lemmas"/> are invariants proved elsewhere (over the
/// slots of this model) that engines may assert.
/// </summary>
public sealed record ProofProblem(ScanModel Model, ModelProperty Property)
{
    public IReadOnlyList<Lemma> Lemmas { get; init; } = [];
}
