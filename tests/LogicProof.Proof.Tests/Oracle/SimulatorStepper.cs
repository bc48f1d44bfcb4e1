using System.Globalization;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The product's simulator as a stepper, for the checks that need the product's own states (the generated lemmas are
/// statements about its state slots). Verdicts come from <see cref="Reference.ReferenceStepper"/>. Start states:
/// every combination of values of the latches with unknown power-up.
/// </summary>
internal sealed class SimulatorStepper : IScanStepper<ScanState>
{
    private readonly ScanModel _model;
    private readonly ScanSimulator _simulator;
    private readonly List<(ScanInputs Inputs, Fraction[] Values)> _vectors = [];
    private readonly ScanValues _values;

    public SimulatorStepper(ScanModel model, IReadOnlyDictionary<string, Fraction[]>? realDomains = null)
    {
        _model = model;
        _simulator = ScanSimulator.Compile(model);
        _values = _simulator.CreateValues();
        var domains = model.Inputs.Select(c => InputAlphabet.Domain(model.Cells[c].Name, model.Cells[c].Type == SignalType.Bool, realDomains)).ToList();
        foreach (var values in InputAlphabet.Vectors(domains))
        {
            var inputs = _simulator.CreateInputs();
            for (var i = 0; i < model.Inputs.Count; i++)
            {
                if (model.Cells[model.Inputs[i]].Type == SignalType.Bool)
                {
                    inputs.SetBool(model.Inputs[i], !values[i].IsZero);
                }
                else
                {
                    inputs.SetReal(model.Inputs[i], values[i]);
                }
            }

            _vectors.Add((inputs, values));
        }
    }

    public int PropertyCount => _model.Properties.Count;

    public int InputVectorCount => _vectors.Count;

    public IEnumerable<ScanState> PowerUpStates()
    {
        var unknown = _simulator.UnknownPowerUpSlots;
        for (var combination = 0; combination < 1 << unknown.Count; combination++)
        {
            var given = unknown
                .Select((slot, bit) => (slot.Index, Value: (combination >> bit & 1) == 1))
                .ToDictionary(p => p.Index, p => p.Value);
            yield return _simulator.PowerUpState(given);
        }
    }

    public bool Step(ScanState state, int inputVector, bool[] properties, out ScanState next)
    {
        next = state.Clone();
        _simulator.Step(next, _vectors[inputVector].Inputs, _values);
        for (var p = 0; p < properties.Length; p++)
        {
            properties[p] = _values.GetBool(_model.Properties[p].Cell);
        }

        return _model.Assumptions.All(a => _values.GetBool(a.Cell));
    }

    public string DescribeInputs(int inputVector) =>
        string.Join(" ", _model.Inputs.Select((cell, i) => $"{_model.Cells[cell].Name}={_vectors[inputVector].Values[i].ToString(CultureInfo.InvariantCulture)}"));
}
