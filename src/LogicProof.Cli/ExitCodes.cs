namespace LogicProof.Cli;

/// <summary>The exit codes every command uses; CI jobs key on them, so they never change meaning.</summary>
public static class ExitCodes
{
    /// <summary>Everything proved, equivalent, or clean (warnings allowed).</summary>
    public const int Success = 0;

    /// <summary>A rule or requirement violated, or a difference found.</summary>
    public const int Violated = 1;

    /// <summary>Inconclusive, with no violation.</summary>
    public const int Inconclusive = 2;

    /// <summary>Input error: reading, parsing, names or types, bad options.</summary>
    public const int InputError = 3;

    /// <summary>Internal or solver failure.</summary>
    public const int InternalError = 4;
}
