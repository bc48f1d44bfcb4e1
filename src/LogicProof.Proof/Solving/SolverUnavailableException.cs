namespace LogicProof.Proof.Solving;

/// <summary>The Z3 native library could not be loaded on this machine.</summary>
public sealed class SolverUnavailableException : Exception
{
    public SolverUnavailableException()
        : base("The Z3 solver library could not be loaded.")
    {
    }

    public SolverUnavailableException(string message)
        : base(message)
    {
    }

    public SolverUnavailableException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
