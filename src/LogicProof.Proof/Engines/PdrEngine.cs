using System.Diagnostics;
using LogicProof.Core.Threading;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Pdr;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Engines;

/// <summary>
/// Property-directed reachability through Z3's Spacer engine: the property becomes constrained Horn clauses over an
/// invariant predicate (see <see cref="HornSystem"/>), with counters as integers. Spacer either finds an inductive
/// invariant that excludes every violation (Proved, with that invariant written over the slot names) or a
/// derivation of a violation. Reading a concrete trace out of Spacer's derivation is unreliable across Z3 versions,
/// so a violation found by PDR is shortened with BMC before it is shown: BMC searches up to
/// <see cref="EngineOptions.MaxDepth"/> steps in the time left and its shortest trace is returned; if BMC cannot
/// reproduce the violation within those limits the verdict is Inconclusive, never a made-up trace. A timeout,
/// cancellation or a solver that gives up is Inconclusive.
/// </summary>
public sealed class PdrEngine : IProofEngine
{
    public const string EngineName = "pdr";

    public EngineKind Kind => EngineKind.Pdr;

    public string Name => EngineName;

    public Task<PropertyVerdict> CheckAsync(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(problem);
        ArgumentNullException.ThrowIfNull(options);
        return Task.Run(() => LargeStack.Run(() => Check(problem, options, cancellationToken)), CancellationToken.None);
    }

    private static PropertyVerdict Check(ProofProblem problem, EngineOptions options, CancellationToken cancellationToken)
    {
        var clock = Stopwatch.StartNew();
        if (cancellationToken.IsCancellationRequested)
        {
            return new Inconclusive("cancelled", 0);
        }

        SpacerAnswer answer;
        using (var session = new SpacerSession(cancellationToken))
        {
            var encoder = new ScanEncoder(session.Context, problem.Model, CounterEncoding.Integer);
            var system = new HornSystem(encoder, problem.Property, problem.Lemmas, options.Accelerate);
            answer = SpacerQuery.Run(system, session, Remaining(options, clock));
        }

        if (cancellationToken.IsCancellationRequested)
        {
            return new Inconclusive("cancelled", 0);
        }

        return answer.Outcome switch
        {
            SpacerOutcome.Holds => new Proved(EngineName, null, answer.Invariant),
            SpacerOutcome.Violated => Reproduce(problem, options, clock, cancellationToken),
            _ => new Inconclusive(UnknownReason(answer, options, clock), 0),
        };
    }

    private static PropertyVerdict Reproduce(
        ProofProblem problem, EngineOptions options, Stopwatch clock, CancellationToken cancellationToken)
    {
        var remaining = Remaining(options, clock);
        if (remaining is { } left && left <= TimeSpan.Zero)
        {
            return new Inconclusive("PDR found a violation but no time was left to reproduce it with BMC; no trace is shown", 0);
        }

        var bmc = new BmcEngine()
            .CheckAsync(problem, options with { TimeLimit = remaining }, cancellationToken)
            .GetAwaiter()
            .GetResult();
        return bmc switch
        {
            Violated violated => violated with { Engine = EngineName },
            Inconclusive inconclusive => new Inconclusive(
                $"PDR found a violation, but BMC did not reproduce it ({inconclusive.Reason}); no trace is shown",
                inconclusive.DepthReached),
            _ => throw new InvalidOperationException($"BMC returned {bmc.GetType().Name}, which it never should."),
        };
    }

    private static TimeSpan? Remaining(EngineOptions options, Stopwatch clock) => options.TimeLimit - clock.Elapsed;

    private static string UnknownReason(SpacerAnswer answer, EngineOptions options, Stopwatch clock) =>
        options.TimeLimit is { } limit && clock.Elapsed >= limit
            ? "time limit reached"
            : $"Spacer gave up ({answer.Reason})";
}
