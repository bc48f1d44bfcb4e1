using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The independent oracle: every reachable state of a small scheme with bool inputs, by breadth-first search over
/// simulator states. It shares nothing with the solver encoding; it uses only the parser, the lowering and the
/// simulator. Start states: every combination of values of the latches with unknown power-up. From each state, every
/// vector of input values is one scan. A scan at which some assumption is FALSE is a dead end: neither its property
/// values nor the state after it count (a sequence counts only while every assumption has held). A property is
/// violated iff some counted scan has it FALSE; because states are expanded in order of depth, the first such scan
/// found is a shortest violation, and its length in scans (counting the failing one) is reported.
/// </summary>
internal sealed class ExplicitStateExplorer
{
    private readonly ScanModel _model;
    private readonly ScanSimulator _simulator;

    public ExplicitStateExplorer(ScanModel model)
    {
        if (model.Inputs.Any(c => model.Cells[c].Type != SignalType.Bool))
        {
            throw new ArgumentException("the explorer enumerates bool inputs only", nameof(model));
        }

        _model = model;
        _simulator = ScanSimulator.Compile(model);
    }

    /// <summary>Explores at most <paramref name="maxStates"/> states; beyond that the result is marked incomplete.</summary>
    public Exploration Explore(int maxStates)
    {
        var depthOf = new Dictionary<ScanState, int>();
        var frontier = new Queue<ScanState>();
        foreach (var start in PowerUpStates())
        {
            if (depthOf.TryAdd(start, 0))
            {
                frontier.Enqueue(start);
            }
        }

        var shortest = new long?[_model.Properties.Count];
        var inputVectors = InputVectors();
        var values = _simulator.CreateValues();
        var complete = true;
        while (frontier.Count > 0)
        {
            var state = frontier.Dequeue();
            var depth = depthOf[state];
            foreach (var inputs in inputVectors)
            {
                var next = state.Clone();
                _simulator.Step(next, inputs, values);
                if (_model.Assumptions.Any(a => !values.GetBool(a.Cell)))
                {
                    continue;
                }

                for (var p = 0; p < shortest.Length; p++)
                {
                    if (shortest[p] is null && !values.GetBool(_model.Properties[p].Cell))
                    {
                        shortest[p] = depth + 1;
                    }
                }

                if (!depthOf.ContainsKey(next))
                {
                    if (depthOf.Count >= maxStates)
                    {
                        complete = false;
                        continue;
                    }

                    depthOf.Add(next, depth + 1);
                    frontier.Enqueue(next);
                }
            }
        }

        return new Exploration(shortest, depthOf.Keys.ToList(), complete);
    }

    private List<ScanState> PowerUpStates()
    {
        var unknown = _simulator.UnknownPowerUpSlots;
        var states = new List<ScanState>();
        for (var combination = 0; combination < 1 << unknown.Count; combination++)
        {
            var given = unknown
                .Select((slot, bit) => (slot.Index, Value: (combination >> bit & 1) == 1))
                .ToDictionary(p => p.Index, p => p.Value);
            states.Add(_simulator.PowerUpState(given));
        }

        return states;
    }

    private List<ScanInputs> InputVectors()
    {
        var vectors = new List<ScanInputs>();
        for (var combination = 0; combination < 1 << _model.Inputs.Count; combination++)
        {
            var inputs = _simulator.CreateInputs();
            for (var bit = 0; bit < _model.Inputs.Count; bit++)
            {
                inputs.SetBool(_model.Inputs[bit], (combination >> bit & 1) == 1);
            }

            vectors.Add(inputs);
        }

        return vectors;
    }
}
