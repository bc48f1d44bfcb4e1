namespace LogicProof.Model.Simulation;

public enum SimulationColumnKind
{
    Input,
    Output,

    /// <summary>Any other cell the user asked to see: a local, or a hidden cell such as a function-block output.</summary>
    Shown,
}
