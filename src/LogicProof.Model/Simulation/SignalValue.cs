using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>The value of one cell at one scan: a bool, or an exact real.</summary>
public readonly record struct SignalValue(SignalType Type, bool Bool, Fraction Real)
{
    public static SignalValue Of(bool value) => new(SignalType.Bool, value, Fraction.Zero);

    public static SignalValue Of(Fraction value) => new(SignalType.Real, false, value);

    public bool SameAs(SignalValue other) => Type == other.Type && Bool == other.Bool && Real.CompareTo(other.Real) == 0;
}
