namespace LogicProof.Proof.Results;

/// <summary>
/// The value of a cell (<paramref name="Index"/> is the cell index) or of a state slot (the slot index) in the
/// model that was checked, with its name so that results can be read without that model.
/// </summary>
public sealed record NamedValue(int Index, string Name, TraceValue Value);
