namespace LogicProof.Model.Scan;

/// <summary>The type of a per-scan value: a boolean signal or an exact rational quantity.</summary>
public enum SignalType
{
    Bool,
    Real,
}
