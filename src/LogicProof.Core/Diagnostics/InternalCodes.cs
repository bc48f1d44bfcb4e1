namespace LogicProof.Core.Diagnostics;

/// <summary>
/// Diagnostic codes are stable across releases (tests and CI filters key on them). Each layer owns its range:
/// LP1xxx reading the file (encoding, syntax) and LP2xxx names and types (Language), LP3xxx the scan model and
/// static checks (Model), LP4xxx simulation inputs (Model), LP5xxx proof (Proof), LP6xxx roles, rules and the
/// breaker model, LP9xxx internal. A code is never reused for a different meaning.
/// </summary>
public static class InternalCodes
{
    /// <summary>An internal failure that is not the user's fault.</summary>
    public const string InternalError = "LP9001";
}
