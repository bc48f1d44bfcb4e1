using System.Globalization;
using LogicProof.Core.Threading;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Results;
using Microsoft.Z3;

namespace LogicProof.Proof.Engines;

/// <summary>
/// Bounded model checking: one incremental solver, one step added per depth, and at each depth the question "can
/// the property be FALSE at this step?" asked through an assumption literal. Depths are tried in increasing order
/// and the property is asserted at every depth already answered, so the first violation found is the shortest in
/// steps and the property holds before it; with acceleration off a step is a scan. With acceleration the trace is
/// then shortened in scans (<see cref="ScanShortener"/>). BMC never proves a property: reaching the depth limit is
/// Inconclusive.
/// </summary>
public sealed class BmcEngine : IProofEngine
{
    public const string EngineName = "bmc";

    public EngineKind Kind => EngineKind.Bmc;

    public string Name => EngineName;

    public Task<PropertyVerdict> CheckAsync(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(problem);
        ArgumentNullException.ThrowIfNull(options);
        return Task.Run(() => LargeStack.Run(() => Check(problem, options, cancellationToken)), CancellationToken.None);
    }

    private static PropertyVerdict Check(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken)
    {
        using var session = new SolverSession(options.TimeLimit, cancellationToken);
        using var solver = session.NewSolver();
        var encoder = new ScanEncoder(session.Context, problem.Model, UnrollingEncoding.For(options.Accelerate));
        var unrolling = new Unrolling(encoder, solver, "bmc", fromPowerUp: true, options.Accelerate, []);
        var search = new ViolationSearch(session, unrolling, problem.Property, EngineName);
        try
        {
            for (var depth = 0; depth < options.MaxDepth; depth++)
            {
                var verdict = search.CheckNextStep();
                if (verdict is not null)
                {
                    return verdict;
                }
            }
        }
        catch (Z3Exception) when (session.IsStopped)
        {
            return new Inconclusive(session.StopReason, search.StepsCleared);
        }

        return new Inconclusive(
            string.Create(CultureInfo.InvariantCulture, $"no violation within {options.MaxDepth} steps (depth limit)"), options.MaxDepth);
    }
}
