using LogicProof.Proof.Results;

namespace LogicProof.Proof.Engines;

/// <summary>
/// The one entry point every engine has. An engine uses its own Z3 context, stops promptly when
/// <paramref name="cancellationToken"/> is cancelled (returning Inconclusive), and never returns Proved on a
/// time or resource limit. A returned Violated trace has not been replayed yet; the orchestrator does that.
/// </summary>
public interface IProofEngine
{
    EngineKind Kind { get; }

    /// <summary>The engine's name as it appears in verdicts, e.g. "bmc".</summary>
    string Name { get; }

    Task<PropertyVerdict> CheckAsync(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken);
}
