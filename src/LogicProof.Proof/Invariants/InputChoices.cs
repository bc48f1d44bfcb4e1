using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Input values for concrete scans: a bool input TRUE or FALSE; a real input one of its range ends, its midpoint, or
/// a constant the model uses that lies in its range (where comparisons change value).
/// </summary>
internal sealed class InputChoices
{
    private readonly ScanModel _model;
    private readonly Dictionary<int, Fraction[]> _realChoices;

    public InputChoices(ScanModel model)
    {
        _model = model;
        _realChoices = model.Inputs
            .Where(c => model.Cells[c].Type == SignalType.Real)
            .ToDictionary(c => c, c => RealChoices(model, c));
    }

    /// <summary>Gives each input a random value, except that each keeps its value with probability <paramref name="hold"/>.</summary>
    public void Randomize(ScanInputs inputs, Random random, double hold)
    {
        foreach (var cell in _model.Inputs)
        {
            if (hold > 0 && random.NextDouble() < hold)
            {
                continue;
            }

            if (_realChoices.TryGetValue(cell, out var choices))
            {
                inputs.SetReal(cell, choices[random.Next(choices.Length)]);
            }
            else
            {
                inputs.SetBool(cell, random.Next(2) == 0);
            }
        }
    }

    private static Fraction[] RealChoices(ScanModel model, int cell)
    {
        var (low, high) = model.Cells[cell].Range ?? (new Fraction(-2), new Fraction(2));
        var constants = model.Steps
            .SelectMany(ModelConstants.Of)
            .Where(v => v.CompareTo(low) >= 0 && v.CompareTo(high) <= 0);
        return [.. new[] { low, high, (low + high) / 2 }.Concat(constants).Select(v => v.Reduce()).Distinct()];
    }
}
