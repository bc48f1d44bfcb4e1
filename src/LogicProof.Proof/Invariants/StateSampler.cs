using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Reachable states by random simulation: every power-up state (each combination of unknown latch values, at most
/// <see cref="MaxPowerUpStates"/> of them, chosen at random beyond that), then runs from power-up under random
/// inputs, keeping every state reached through scans at which every assumption held; a run ends at the first scan
/// whose assumptions fail. Each run holds its inputs with its own probability (from "changes every scan" to "rarely
/// changes") so that timers get to count. Deterministic for a given seed.
/// </summary>
internal sealed class StateSampler
{
    private const int MaxPowerUpStates = 256;
    private static readonly double[] HoldProbabilities = [0.0, 0.5, 0.9, 0.98];

    private readonly ScanModel _model;
    private readonly ScanSimulator _simulator;
    private readonly InputChoices _choices;

    public StateSampler(ScanModel model, ScanSimulator simulator, InputChoices choices)
    {
        _model = model;
        _simulator = simulator;
        _choices = choices;
    }

    public List<ScanState> Sample(int runs, int scansPerRun, Random random, CancellationToken cancellationToken)
    {
        var powerUps = PowerUpStates(random);
        var samples = new List<ScanState>(powerUps);
        var inputs = _simulator.CreateInputs();
        var values = _simulator.CreateValues();
        for (var run = 0; run < runs && !cancellationToken.IsCancellationRequested; run++)
        {
            var state = powerUps[run % powerUps.Count].Clone();
            var hold = HoldProbabilities[run % HoldProbabilities.Length];
            _choices.Randomize(inputs, random, hold: 0);
            for (var scan = 0; scan < scansPerRun; scan++)
            {
                _choices.Randomize(inputs, random, hold);
                _simulator.Step(state, inputs, values);
                if (_model.Assumptions.Any(a => !values.GetBool(a.Cell)))
                {
                    break;
                }

                samples.Add(state.Clone());
            }
        }

        return samples;
    }

    private List<ScanState> PowerUpStates(Random random)
    {
        var unknown = _simulator.UnknownPowerUpSlots;
        var all = unknown.Count < 8;
        var count = all ? 1 << unknown.Count : MaxPowerUpStates;
        var states = new List<ScanState>();
        for (var combination = 0; combination < count; combination++)
        {
            var given = unknown
                .Select((slot, bit) => (slot.Index, Value: all ? ((combination >> bit) & 1) == 1 : random.Next(2) == 0))
                .ToDictionary(p => p.Index, p => p.Value);
            states.Add(_simulator.PowerUpState(given));
        }

        return states;
    }
}
