using LogicProof.Model.Scan;
using Microsoft.Z3;

namespace LogicProof.Proof.Engines;

/// <summary>
/// The step case of k-induction over one growing unrolling from an arbitrary state: for depth k it holds k + 1
/// scans, the property asserted at the first k and its negation passed as an assumption literal at the last.
/// Simple-path constraints are added lazily (see <see cref="KInductionEngine"/>).
/// </summary>
internal sealed class InductionStep
{
    private readonly SolverSession _session;
    private readonly Unrolling _unrolling;
    private readonly ModelProperty _property;

    public InductionStep(SolverSession session, Unrolling unrolling, ModelProperty property)
    {
        _session = session;
        _unrolling = unrolling;
        _property = property;
    }

    /// <summary>UNSATISFIABLE means the property is k-inductive.</summary>
    public Status Check(int k)
    {
        while (_unrolling.Count < k + 1)
        {
            if (_unrolling.Count > 0)
            {
                _unrolling.Solver.Add(_unrolling.CellAt(_unrolling.Count - 1, _property.Cell));
            }

            _unrolling.AddStep();
        }

        var context = _unrolling.Context;
        var violation = _unrolling.Guard(context.MkNot(_unrolling.CellAt(k, _property.Cell)), "violation");
        while (true)
        {
            var status = _session.Check(_unrolling.Solver, violation);
            if (status != Status.SATISFIABLE)
            {
                return status;
            }

            var repeated = RepeatedStates(_unrolling.Solver.Model, k);
            if (repeated.Count == 0)
            {
                return status;
            }

            foreach (var (first, second) in repeated)
            {
                _unrolling.Solver.Add(context.MkNot(
                    _unrolling.Encoder.StatesEqual(_unrolling.State(first), _unrolling.State(second))));
            }
        }
    }

    /// <summary>Pairs of equal states among s0..sk in a step-case model.</summary>
    private List<(int First, int Second)> RepeatedStates(Microsoft.Z3.Model solution, int k)
    {
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        var pairs = new List<(int, int)>();
        for (var i = 0; i <= k; i++)
        {
            var key = string.Join('|', _unrolling.State(i).Slots.Select(slot => solution.Eval(slot, true).ToString()));
            if (seen.TryGetValue(key, out var earlier))
            {
                pairs.Add((earlier, i));
            }
            else
            {
                seen[key] = i;
            }
        }

        return pairs;
    }
}
