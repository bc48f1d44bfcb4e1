using System.Globalization;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Lemmas;
using Microsoft.Z3;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Keeps the largest subset of candidates that is 1-inductive as a whole (Houdini). First every candidate must hold
/// in every power-up state (unknown latches free). Then, in one solver: an arbitrary state s with counters in range,
/// one ordinary scan from it with inputs in range and every assumption TRUE, and the state s' after it. Each
/// candidate is asserted at s behind its own literal; the query "some active candidate is FALSE at s'" is asked
/// under the literals of the active ones. A model drops every candidate it makes FALSE at s', and every candidate
/// FALSE after a few concrete scans from the same s (<see cref="SuccessorProbe"/>), and the query is repeated until
/// it is unsatisfiable: the survivors hold at power-up and are preserved by every scan that satisfies the
/// assumptions, so they hold in every state such scans reach. Single scans suffice for the accelerated engines too,
/// which reach no other states. A query the solver cannot answer gives no lemmas at all.
/// The solvers are Z3's plain incremental solver: the default one costs about 10 ms to set up per solver, which
/// dominated the whole run on small models.
/// </summary>
internal sealed class HoudiniFilter
{
    private readonly SolverSession _session;
    private readonly ScanEncoder _encoder;
    private readonly SuccessorProbe _probe;
    private readonly LemmaEvaluator _evaluator;
    private int _literals;

    public HoudiniFilter(SolverSession session, ScanEncoder encoder, SuccessorProbe probe)
    {
        _session = session;
        _encoder = encoder;
        _probe = probe;
        _evaluator = new LemmaEvaluator(encoder.Model);
    }

    private Context Context => _session.Context;

    public IReadOnlyList<Lemma> Filter(IReadOnlyList<Lemma> candidates)
    {
        var active = Enumerable.Range(0, candidates.Count).ToHashSet();
        var initial = InitialHolds(candidates, active);
        return initial && InductiveHolds(candidates, active) ? [.. active.Order().Select(i => candidates[i])] : [];
    }

    private bool InitialHolds(IReadOnlyList<Lemma> candidates, HashSet<int> active)
    {
        using var solver = Context.MkSimpleSolver();
        var state = _encoder.NewState("pu");
        solver.Add(_encoder.InitialCondition(state));
        solver.Add(_encoder.StateRange(state));
        var terms = candidates.Select(c => _encoder.EncodeLemma(c, state)).ToArray();
        return DropUntilUnsatisfiable(solver, terms, active, assumed: null, _ => []);
    }

    private bool InductiveHolds(IReadOnlyList<Lemma> candidates, HashSet<int> active)
    {
        using var solver = Context.MkSimpleSolver();
        var state = _encoder.NewState("s");
        var inputs = _encoder.NewInputs("i");
        var scan = _encoder.EncodeScan(state, inputs);
        solver.Add(_encoder.StateRange(state));
        solver.Add(_encoder.InputRange(inputs));
        solver.Add(_encoder.AssumptionsHold(scan));
        var assumed = new BoolExpr[candidates.Count];
        for (var i = 0; i < candidates.Count; i++)
        {
            assumed[i] = Literal("assume");
            solver.Add(Context.MkImplies(assumed[i], _encoder.EncodeLemma(candidates[i], state)));
        }

        var next = candidates.Select(c => _encoder.EncodeLemma(c, scan.Next)).ToArray();
        return DropUntilUnsatisfiable(
            solver,
            next,
            active,
            assumed,
            solution => [.. _probe.Successors(solution, state).SelectMany(s => active.Where(i => !_evaluator.Holds(candidates[i].Expression, s)))]);
    }

    /// <summary>
    /// Drops candidates FALSE in a model of "some active term is FALSE" (and those <paramref name="alsoFalse"/> finds
    /// from the same model) until none is; false if the solver gave up.
    /// </summary>
    private bool DropUntilUnsatisfiable(
        Solver solver, BoolExpr[] terms, HashSet<int> active, BoolExpr[]? assumed, Func<Microsoft.Z3.Model, IEnumerable<int>> alsoFalse)
    {
        while (active.Count > 0)
        {
            var someFalse = Literal("drop");
            solver.Add(Context.MkImplies(someFalse, Context.MkOr(active.Select(i => Context.MkNot(terms[i])))));
            var assumptions = assumed is null ? [someFalse] : active.Select(i => assumed[i]).Append(someFalse).ToArray();
            switch (_session.Check(solver, assumptions))
            {
                case Status.UNSATISFIABLE:
                    return true;
                case Status.SATISFIABLE:
                    var solution = solver.Model;
                    var dropped = active.Where(i => !solution.Eval(terms[i], true).IsTrue).Concat(alsoFalse(solution)).ToList();
                    if (dropped.Count == 0)
                    {
                        return false;
                    }

                    active.ExceptWith(dropped);
                    break;
                default:
                    return false;
            }
        }

        return true;
    }

    private BoolExpr Literal(string purpose) =>
        Context.MkBoolConst(string.Create(CultureInfo.InvariantCulture, $"houdini.{purpose}#{_literals++}"));
}
