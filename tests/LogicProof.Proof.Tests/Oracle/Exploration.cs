namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// What the explorer found: per property (in the stepper's order) the length in scans of a shortest violation, or
/// null when no reachable scan violates it, and the inputs of that violation, scan by scan; every reachable state;
/// and whether the search finished within its state limit (an incomplete search proves nothing about properties it
/// did not find violated).
/// </summary>
internal sealed record Exploration<TState>(
    IReadOnlyList<long?> ShortestViolation,
    IReadOnlyList<string?> ShortestWitness,
    IReadOnlyList<TState> ReachableStates,
    bool Complete)
    where TState : notnull;
