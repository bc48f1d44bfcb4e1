using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>One column of a simulation table: a cell of the model, by name.</summary>
public sealed record SimulationColumn(string Name, int Cell, SimulationColumnKind Kind, SignalType Type);
