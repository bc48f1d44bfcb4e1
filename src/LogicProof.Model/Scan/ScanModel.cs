namespace LogicProof.Model.Scan;

/// <summary>
/// The scan-cycle transition system of one scheme; the one read-only form every engine and the simulator share.
/// <para>
/// A step of the system is one scan. Before the first scan every state slot holds its power-up value. At each
/// scan the inputs are sampled once (each input cell takes a value, a real input within its range); then the
/// steps run in order, each computing its target cell from inputs, cells computed earlier in this scan, and state
/// slots (values of the previous scan); a function-block step also computes its next memory. At the end of the
/// scan every state slot takes its next value: a PreviousValue slot the value its cell had in this scan.
/// A name read before its equation in scan order, or in its own equation, is a PreviousValue read: the one-scan
/// delay that relays and PLCs have.
/// </para>
/// <para>
/// Properties and assumptions are bool cells computed by steps appended after the scheme's equations (past-time
/// operators become monitor steps with their own memories), so they too are functions of state and inputs.
/// </para>
/// </summary>
public sealed record ScanModel(
    string Name,
    ScanTiming Timing,
    IReadOnlyList<Cell> Cells,
    IReadOnlyList<int> Inputs,
    IReadOnlyList<ScanStep> Steps,
    IReadOnlyList<StateSlot> StateSlots,
    IReadOnlyList<ModelProperty> Properties,
    IReadOnlyList<ModelAssumption> Assumptions)
{
    /// <summary>Number of steps that come from the scheme's equations; the monitor steps follow them.</summary>
    public int EquationStepCount { get; init; }

    /// <summary>The step writing each cell, or -1 for inputs; index by cell.</summary>
    public IReadOnlyList<int> WriterOfCell { get; init; } = [];

    /// <summary>Timers whose preset was not a whole number of scans, with the exact and rounded-up values.</summary>
    public IReadOnlyList<PresetRounding> Roundings { get; init; } = [];

    /// <summary>
    /// For a model that is a cone-of-influence slice of another: the index in the original model of each cell of
    /// this one (index by cell), so traces can be shown with the original cells. Null for a model built from source.
    /// </summary>
    public IReadOnlyList<int>? OriginalCells { get; init; }
}
