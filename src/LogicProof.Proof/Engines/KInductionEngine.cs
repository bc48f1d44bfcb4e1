using System.Globalization;
using LogicProof.Core.Threading;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Results;
using Microsoft.Z3;

namespace LogicProof.Proof.Engines;

/// <summary>
/// k-induction. For k = 1, 2, ...: the base case is the forward search of BMC (no violation in the first k steps
/// from power-up, accelerated like BMC, so it also finds violations); the step case asks, in a second solver,
/// whether some path of k + 1 single scans from an arbitrary state (counters in range, lemmas asserted at every
/// state, assumptions at every scan) can have the property TRUE at its first k scans and FALSE at the last. If not,
/// the property is proved with depth k.
/// <para>
/// Why this is sound: take a shortest trace from power-up to a violation. If it has fewer than k scans the base case
/// sees it (an all-single-scan path is also an accelerated one). Otherwise its last k + 1 states are a path of single
/// scans on which the assumptions hold and the property holds until the last, so the step case is satisfiable.
/// A shortest trace visits no state twice, so the step case may also require its states to be pairwise distinct
/// (simple path); those constraints are added lazily, only for the pairs of states a step-case model repeats.
/// The step case uses single scans because an accelerated step adds transitions, which can only make induction
/// harder; acceleration is what makes the base case cheap.
/// </para>
/// </summary>
public sealed class KInductionEngine : IProofEngine
{
    public const string EngineName = "k-induction";

    public EngineKind Kind => EngineKind.KInduction;

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
        using var baseSolver = session.NewSolver();
        using var stepSolver = session.NewSolver();
        var baseEncoder = new ScanEncoder(session.Context, problem.Model, UnrollingEncoding.For(options.Accelerate));
        var stepEncoder = new ScanEncoder(session.Context, problem.Model, UnrollingEncoding.For(accelerate: false));
        var baseCase = new ViolationSearch(
            session,
            new Unrolling(baseEncoder, baseSolver, "base", fromPowerUp: true, options.Accelerate, []),
            problem.Property,
            EngineName);
        var stepCase = new InductionStep(
            session,
            new Unrolling(stepEncoder, stepSolver, "step", fromPowerUp: false, accelerate: false, problem.Lemmas),
            problem.Property);

        try
        {
            for (var k = 1; k <= options.MaxDepth; k++)
            {
                var baseVerdict = baseCase.CheckNextStep();
                if (baseVerdict is not null)
                {
                    return baseVerdict;
                }

                switch (stepCase.Check(k))
                {
                    case Status.UNSATISFIABLE:
                        return new Proved(EngineName, k, null);
                    case Status.UNKNOWN:
                        return new Inconclusive(session.LastUnknownReason, baseCase.StepsCleared);
                }
            }
        }
        catch (Z3Exception) when (session.IsStopped)
        {
            return new Inconclusive(session.StopReason, baseCase.StepsCleared);
        }

        return new Inconclusive(
            string.Create(CultureInfo.InvariantCulture, $"not inductive at any depth up to {options.MaxDepth} (depth limit)"), baseCase.StepsCleared);
    }
}
