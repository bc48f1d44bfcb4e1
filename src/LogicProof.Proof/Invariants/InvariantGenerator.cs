using LogicProof.Core.Threading;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Proposes invariants from the model's shape (<see cref="StructuralCandidates"/>) and from random simulation
/// (<see cref="RelationMiner"/>), drops every candidate a sampled reachable state falsifies, and keeps the subset
/// that is inductive as a whole (<see cref="HoudiniFilter"/>). Every returned lemma holds at power-up for every
/// unknown latch value and in every state reachable through scans at which all assumptions held, so engines may
/// assert it at every state (see <see cref="Lemma"/>). Lemmas are over the slots of the model given, so call it with
/// the model the engines check (normally the property's cone). Thread-safe: every call uses its own solver context.
/// </summary>
public sealed class InvariantGenerator
{
    public InvariantGenerator(InvariantOptions? options = null)
    {
        Options = options ?? new InvariantOptions();
    }

    public InvariantOptions Options { get; }

    public IReadOnlyList<Lemma> Generate(ScanModel model, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.StateSlots.Count == 0)
        {
            return [];
        }

        return LargeStack.Run(() => Run(model, cancellationToken));
    }

    private IReadOnlyList<Lemma> Run(ScanModel model, CancellationToken cancellationToken)
    {
        var random = new Random(Options.Seed);
        var simulator = ScanSimulator.Compile(model);
        var choices = new InputChoices(model);
        var samples = new StateSampler(model, simulator, choices).Sample(Options.SimulationRuns, Options.ScansPerRun, random, cancellationToken);
        if (cancellationToken.IsCancellationRequested)
        {
            return [];
        }

        using var session = new SolverSession(Options.TimeLimit, cancellationToken);
        var encoder = new ScanEncoder(session.Context, model, CounterEncoding.Integer);
        var evaluator = new LemmaEvaluator(model);
        List<Lemma> structural;
        using (var implications = new CountingImplications(session, encoder, Options.MaxCandidates))
        {
            structural = [.. StructuralCandidates.Propose(model, implications)
                .Where(c => samples.All(s => evaluator.Holds(c.Expression, s)))
                .Take(Options.MaxCandidates)];
        }

        var mined = RelationMiner.Mine(model, samples, Options.MaxCandidates - structural.Count);
        var candidates = Distinct(structural.Concat(mined));
        return candidates.Count == 0 || cancellationToken.IsCancellationRequested
            ? []
            : new HoudiniFilter(session, encoder, new SuccessorProbe(model, simulator, choices, random)).Filter(candidates);
    }

    private static List<Lemma> Distinct(IEnumerable<Lemma> candidates)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        return [.. candidates.Where(c => seen.Add(LemmaKey.Of(c.Expression)))];
    }
}
