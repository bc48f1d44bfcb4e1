namespace LogicProof.Proof;

/// <summary>
/// Diagnostic codes of the proof layer (LP5xxx, see <c>InternalCodes</c> for the ranges). Stable across releases:
/// tests and CI filters key on them, and a code is never reused for a different meaning.
/// </summary>
public static class ProofCodes
{
    /// <summary>An equation whose value is the same (TRUE, or FALSE) at every scan of every input sequence.</summary>
    public const string ConstantEquation = "LP5001";
}
