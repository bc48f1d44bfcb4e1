namespace LogicProof.Reports.Check;

/// <summary>
/// One column of a counterexample. <see cref="Index"/> is the cell index in the checked model (for
/// <see cref="TraceSignalRole.Timer"/>, the state slot index), the key of the values in each
/// <see cref="LogicProof.Proof.Results.TraceStep"/>.
/// </summary>
public sealed record TraceSignal(string Name, TraceSignalRole Role, TraceSignalType Type, int Index);
