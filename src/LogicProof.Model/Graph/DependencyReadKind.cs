namespace LogicProof.Model.Graph;

/// <summary>How a dependency reads its source.</summary>
public enum DependencyReadKind
{
    /// <summary>The value computed earlier in the same scan (an input, or a name written by an earlier equation).</summary>
    SameScan,

    /// <summary>The value at the end of the last scan: the name is written by this or a later equation, or by none.</summary>
    LastScan,
}
