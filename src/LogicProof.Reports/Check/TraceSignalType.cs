namespace LogicProof.Reports.Check;

/// <summary>The kind of value a counterexample column holds.</summary>
public enum TraceSignalType
{
    Bool,

    /// <summary>An exact rational.</summary>
    Real,

    /// <summary>A whole number of scans (a timer counter).</summary>
    Counter,
}
