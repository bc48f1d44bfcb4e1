using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// The value every cell had during one scan (inputs, variables, hidden cells, properties and assumptions),
/// addressed by cell index: a bool cell through <see cref="GetBool"/>, a real cell through <see cref="GetReal"/>.
/// <see cref="ScanSimulator.Step"/> overwrites it in place; <see cref="Clone"/> keeps a copy.
/// </summary>
public sealed class ScanValues
{
    public ScanValues(ScanModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        Model = model;
        Bools = new bool[model.Cells.Count];
        Reals = new Fraction[model.Cells.Count];
        Array.Fill(Reals, Fraction.Zero);
    }

    private ScanValues(ScanValues source)
    {
        Model = source.Model;
        Bools = (bool[])source.Bools.Clone();
        Reals = (Fraction[])source.Reals.Clone();
    }

    public ScanModel Model { get; }

    internal bool[] Bools { get; }

    internal Fraction[] Reals { get; }

    public bool GetBool(int cell) => Bools[cell];

    public Fraction GetReal(int cell) => Reals[cell];

    /// <summary>Whether <paramref name="cell"/> has the same value here and in <paramref name="other"/>.</summary>
    public bool SameValue(ScanValues other, int cell) =>
        Bools[cell] == other.Bools[cell] && Reals[cell].CompareTo(other.Reals[cell]) == 0;

    public ScanValues Clone() => new(this);
}
