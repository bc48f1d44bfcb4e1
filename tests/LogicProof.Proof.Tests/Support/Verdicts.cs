using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tests.Support;

internal static class Verdicts
{
    public static Task<PropertyVerdict> RunAsync(IProofEngine engine, ScanModel model, string property, EngineOptions? options = null) =>
        engine.CheckAsync(new ProofProblem(model, SchemeLoader.Property(model, property)), options ?? new EngineOptions(), CancellationToken.None);

    public static TraceValue Input(TraceStep step, string name) =>
        step.Inputs.Single(i => string.Equals(i.Name, name, StringComparison.OrdinalIgnoreCase)).Value;

    public static TraceValue Cell(TraceStep step, string name) =>
        step.Cells.Single(i => string.Equals(i.Name, name, StringComparison.OrdinalIgnoreCase)).Value;
}
