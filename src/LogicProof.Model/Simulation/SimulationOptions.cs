using Fractions;

namespace LogicProof.Model.Simulation;

/// <summary>
/// The choices of one simulation run, resolved against the model: extra cells to show, power-up values of
/// latches of unknown power-up (keyed by state slot), and the run length in ms when it overrides the trace.
/// </summary>
public sealed record SimulationOptions(
    IReadOnlyList<int> ShownCells,
    IReadOnlyDictionary<int, bool> UnknownPowerUps,
    Fraction? UntilMs);
