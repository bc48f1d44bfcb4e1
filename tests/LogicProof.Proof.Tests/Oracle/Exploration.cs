using LogicProof.Model.Simulation;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// What the explorer found: per property (in model order) the length in scans of a shortest violation, or null when
/// no reachable scan violates it; every reachable state; and whether the search finished within its state limit
/// (an incomplete search proves nothing about properties it did not find violated).
/// </summary>
internal sealed record Exploration(IReadOnlyList<long?> ShortestViolation, IReadOnlyList<ScanState> ReachableStates, bool Complete);
