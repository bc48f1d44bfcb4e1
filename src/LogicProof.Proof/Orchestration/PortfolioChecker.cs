using System.Diagnostics;
using System.Globalization;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Orchestration;

/// <summary>
/// Checks every property of a model and owns the verdicts. For each property: slice the model to the property's
/// cone, run the selected engines in parallel on it (each with its own solver context), take the first conclusive
/// verdict and cancel the others; a time limit per property makes the rest Inconclusive. A violation is replayed in
/// the simulator before it is returned (a disagreement throws <see cref="ReplayMismatchException"/>) and its trace
/// is renumbered to the given model's cells. Properties run in parallel up to
/// <see cref="CheckOptions.MaxParallelProperties"/>. Cancelling the token passed in throws
/// <see cref="OperationCanceledException"/>.
/// </summary>
public sealed class PortfolioChecker
{
    public PortfolioChecker()
        : this(DefaultEngines())
    {
    }

    public PortfolioChecker(IReadOnlyList<IProofEngine> engines)
    {
        ArgumentNullException.ThrowIfNull(engines);
        Engines = engines;
    }

    public IReadOnlyList<IProofEngine> Engines { get; }

    /// <summary>The engines of this build; the PDR engine joins here when it exists.</summary>
    public static IReadOnlyList<IProofEngine> DefaultEngines() => [new BmcEngine(), new KInductionEngine()];

    /// <summary>Results in the order of <see cref="ScanModel.Properties"/>.</summary>
    public async Task<IReadOnlyList<PropertyResult>> CheckAsync(
        ScanModel model, CheckOptions options, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(options);
        var results = new PropertyResult[model.Properties.Count];
        var parallel = new ParallelOptions
        {
            MaxDegreeOfParallelism = Math.Max(1, options.MaxParallelProperties),
            CancellationToken = cancellationToken,
        };
        await Parallel.ForEachAsync(
            Enumerable.Range(0, model.Properties.Count),
            parallel,
            async (index, token) => results[index] = await CheckPropertyAsync(model, model.Properties[index], options, token).ConfigureAwait(false))
            .ConfigureAwait(false);
        return results;
    }

    public async Task<PropertyResult> CheckPropertyAsync(
        ScanModel model, ModelProperty property, CheckOptions options, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(property);
        ArgumentNullException.ThrowIfNull(options);
        var clock = Stopwatch.StartNew();
        var engines = Select(options.Engine);
        if (engines.Count == 0)
        {
            var missing = new Inconclusive($"the {options.Engine} engine is not available in this build", 0);
            return new PropertyResult(property, missing, clock.Elapsed);
        }

        var slice = options.SliceToCone ? PropertySlice.Cut(model, property) : PropertySlice.Whole(model, property);
        var problem = new ProofProblem(slice.Sliced, slice.Property)
        {
            Lemmas = options.LemmaSource?.Invoke(slice.Sliced) ?? [],
        };
        var engineOptions = new EngineOptions
        {
            MaxDepth = options.MaxDepth,
            TimeLimit = options.TimeLimitPerProperty,
            Accelerate = options.Accelerate,
        };

        using var timeLimit = new CancellationTokenSource(options.TimeLimitPerProperty);
        using var run = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken, timeLimit.Token);
        var verdict = await RaceAsync(engines, problem, engineOptions, run).ConfigureAwait(false);
        cancellationToken.ThrowIfCancellationRequested();
        if (verdict is Inconclusive inconclusive && timeLimit.IsCancellationRequested)
        {
            verdict = inconclusive with
            {
                Reason = string.Create(
                    CultureInfo.InvariantCulture, $"time limit of {options.TimeLimitPerProperty.TotalSeconds:0.###} s reached"),
            };
        }

        if (verdict is Violated violated)
        {
            TraceReplayer.Replay(slice.Sliced, slice.Property, violated.Trace, violated.Engine);
            verdict = violated with { Trace = slice.ToOriginal(violated.Trace) };
        }

        return new PropertyResult(property, verdict, clock.Elapsed);
    }

    private List<IProofEngine> Select(EngineSelection selection) => selection switch
    {
        EngineSelection.Auto => [.. Engines],
        EngineSelection.Bmc => [.. Engines.Where(e => e.Kind == EngineKind.Bmc)],
        EngineSelection.KInduction => [.. Engines.Where(e => e.Kind == EngineKind.KInduction)],
        EngineSelection.Pdr => [.. Engines.Where(e => e.Kind == EngineKind.Pdr)],
        _ => [],
    };

    /// <summary>The first conclusive verdict, or the most informative inconclusive one; every engine has stopped on return.</summary>
    private static async Task<PropertyVerdict> RaceAsync(
        List<IProofEngine> engines, ProofProblem problem, EngineOptions options, CancellationTokenSource run)
    {
        var running = engines.ToDictionary(e => e.CheckAsync(problem, options, run.Token), e => e);
        var inconclusive = new List<(IProofEngine Engine, Inconclusive Verdict)>();
        PropertyVerdict? winner = null;
        Exception? failure = null;
        while (running.Count > 0)
        {
            var done = await Task.WhenAny(running.Keys).ConfigureAwait(false);
            var engine = running[done];
            running.Remove(done);
            try
            {
                var verdict = await done.ConfigureAwait(false);
                if (winner is null && verdict.IsConclusive)
                {
                    winner = verdict;
                    await run.CancelAsync().ConfigureAwait(false);
                }
                else if (verdict is Inconclusive i)
                {
                    inconclusive.Add((engine, i));
                }
            }
            catch (Exception e) when (winner is null && failure is null)
            {
                failure = e;
                await run.CancelAsync().ConfigureAwait(false);
            }
            catch (Exception) when (winner is not null || failure is not null)
            {
                // An engine that fails after the verdict is settled (or after another failure) changes nothing.
            }
        }

        if (failure is not null)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(failure).Throw();
        }

        if (winner is not null)
        {
            return winner;
        }

        var deepest = inconclusive.MaxBy(i => i.Verdict.DepthReached);
        var reasons = string.Join("; ", inconclusive.Select(i => $"{i.Engine.Name}: {i.Verdict.Reason}"));
        return new Inconclusive(reasons, deepest.Verdict?.DepthReached ?? 0);
    }
}
