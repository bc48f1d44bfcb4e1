using LogicProof.Model.Scan;
using LogicProof.Proof.Results;
using Microsoft.Z3;
using Z3Model = Microsoft.Z3.Model;

namespace LogicProof.Proof.Engines;

/// <summary>
/// The forward search shared by BMC and the base case of k-induction: adds the next step to a power-up unrolling,
/// asks whether the property can be FALSE there, and either returns the violation, returns Inconclusive when the
/// solver cannot answer, or asserts the property at that step and returns null.
/// <para>
/// "Shortest" trace. Depths are tried in increasing order, so the first violation found at step K has the fewest
/// steps, and the property holds at every scan before its failing one. Without acceleration a step is a scan, so it
/// is also the shortest in scans. With acceleration the trace is then made as short in scans as possible: first
/// among traces of K steps (<see cref="ScanShortener"/>), then among traces of up to <see cref="ExtraSteps"/> more
/// steps that fail first at their last step with fewer scans (a few quick input changes can beat one long wait).
/// So the trace shown has the fewest scans among all violating traces of at most K + <see cref="ExtraSteps"/>
/// steps (unless the time runs out while shortening, when the best trace so far is kept).
/// </para>
/// </summary>
internal sealed class ViolationSearch
{
    public const int ExtraSteps = 4;

    private readonly SolverSession _session;
    private readonly Unrolling _unrolling;
    private readonly ModelProperty _property;
    private readonly string _engine;

    public ViolationSearch(SolverSession session, Unrolling unrolling, ModelProperty property, string engine)
    {
        _session = session;
        _unrolling = unrolling;
        _property = property;
        _engine = engine;
    }

    /// <summary>Steps checked so far with no violation.</summary>
    public int StepsCleared { get; private set; }

    public PropertyVerdict? CheckNextStep()
    {
        var k = _unrolling.Count;
        _unrolling.AddStep();
        var holds = _unrolling.CellAt(k, _property.Cell);
        var violation = _unrolling.Guard(_unrolling.Context.MkNot(holds), "violation");
        switch (_session.Check(_unrolling.Solver, violation))
        {
            case Status.SATISFIABLE:
                var (solution, failingStep) = Shortest(k, violation, _unrolling.Solver.Model);
                return new Violated(TraceExtractor.Extract(_unrolling, solution, failingStep, _property), _engine);
            case Status.UNSATISFIABLE:
                _unrolling.Solver.Add(holds);
                StepsCleared = k + 1;
                return null;
            default:
                return new Inconclusive(_session.LastUnknownReason, StepsCleared);
        }
    }

    private (Z3Model Solution, int FailingStep) Shortest(int k, BoolExpr violation, Z3Model found)
    {
        var best = ScanShortener.Shorten(_session, _unrolling, [violation], k, found, atLeast: 0);
        var bestStep = k;
        if (!_unrolling.Accelerated)
        {
            return (best, bestStep);
        }

        var bestScans = TraceExtractor.ScansBefore(_unrolling, best, k);
        var heldBefore = new List<BoolExpr> { _unrolling.Guard(_unrolling.CellAt(k, _property.Cell), "holds") };
        for (var j = k + 1; j <= k + ExtraSteps && j < bestScans; j++)
        {
            _unrolling.AddStep();
            var failsHere = _unrolling.Guard(_unrolling.Context.MkNot(_unrolling.CellAt(j, _property.Cell)), "violation");
            var fewerScans = _unrolling.Guard(_unrolling.ScansBeforeAtMost(j)(bestScans - 1), "scans");
            var status = _session.Check(_unrolling.Solver, [.. heldBefore, failsHere, fewerScans]);
            if (status == Status.SATISFIABLE)
            {
                best = ScanShortener.Shorten(_session, _unrolling, [.. heldBefore, failsHere], j, _unrolling.Solver.Model, atLeast: j);
                bestStep = j;
                bestScans = TraceExtractor.ScansBefore(_unrolling, best, j);
            }
            else if (status != Status.UNSATISFIABLE)
            {
                break;
            }

            heldBefore.Add(_unrolling.Guard(_unrolling.CellAt(j, _property.Cell), "holds"));
        }

        return (best, bestStep);
    }
}
