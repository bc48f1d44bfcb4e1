using Fractions;

namespace LogicProof.Model.Simulation;

/// <summary>
/// One scan of a simulation table: its number, the time it starts (ms from power-up, exact), each column's value,
/// and whether each column changed since the previous scan (never at scan 0).
/// </summary>
public sealed record SimulationRow(long Scan, Fraction TimeMs, IReadOnlyList<SignalValue> Values, IReadOnlyList<bool> Changed);
