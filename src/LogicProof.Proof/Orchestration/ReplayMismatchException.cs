namespace LogicProof.Proof.Orchestration;

/// <summary>
/// A counterexample from an engine did not replay in the simulator: the solver encoding and the simulator disagree
/// about the model's semantics. An internal error (the CLI exits with 4); the trace is never shown.
/// </summary>
public sealed class ReplayMismatchException : Exception
{
    public ReplayMismatchException()
        : base("A counterexample did not replay in the simulator.")
    {
    }

    public ReplayMismatchException(string message)
        : base(message)
    {
    }

    public ReplayMismatchException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    public string? Property { get; init; }

    public string? Engine { get; init; }

    /// <summary>The scan at which the disagreement was found, when there is one.</summary>
    public long? Scan { get; init; }
}
