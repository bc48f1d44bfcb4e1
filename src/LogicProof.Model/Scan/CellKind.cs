namespace LogicProof.Model.Scan;

public enum CellKind
{
    /// <summary>Sampled once at the start of each scan and held for the whole scan.</summary>
    Input,

    /// <summary>A declared local or output, written by its equation.</summary>
    Variable,

    /// <summary>Introduced by the model: a function-block output, a formula monitor, a requirement or assumption.</summary>
    Hidden,
}
