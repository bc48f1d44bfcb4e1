namespace LogicProof.Model;

/// <summary>
/// Diagnostic codes of the scan model and the static checks (the LP3xxx range). Codes are stable: tests and CI
/// filters key on them, and a code is never reused for a different meaning. Only the LP300x codes are errors
/// (the model cannot be built); the static checks are warnings or notes.
/// </summary>
public static class ModelCodes
{
    /// <summary>Error: the power frequency in the header is zero or negative.</summary>
    public const string FrequencyNotPositive = "LP3001";

    /// <summary>Error: the scan interval in the header is zero or negative.</summary>
    public const string ScanIntervalNotPositive = "LP3002";

    /// <summary>Error: a timer preset or formula window is longer than the largest scan count a timer can hold.</summary>
    public const string PresetTooLong = "LP3004";

    /// <summary>Warning: an input that no equation, formula or role reads.</summary>
    public const string UnusedInput = "LP3010";

    /// <summary>Warning: a local variable that no other equation, no formula and no role reads.</summary>
    public const string UnusedLocal = "LP3011";

    /// <summary>Warning: a local or output that no equation writes; it keeps its power-up value for ever.</summary>
    public const string UndrivenVariable = "LP3012";

    /// <summary>Warning: an equation reads a name that a later equation writes, so it sees last scan's value.</summary>
    public const string ReadBeforeWrite = "LP3013";

    /// <summary>
    /// Warning (note when every power-up value is declared): a feedback loop through last-scan values, which holds
    /// its state like a latch.
    /// </summary>
    public const string FeedbackLoop = "LP3014";

    /// <summary>Warning: a timer preset or formula window of zero scans.</summary>
    public const string TimerPresetZero = "LP3015";

    /// <summary>Warning: a timer preset or formula window that is not a whole number of scans; it is rounded up.</summary>
    public const string TimerPresetRounded = "LP3016";

    /// <summary>Note: an F_TRIG gives TRUE at the first scan when its input is FALSE (IEC 61131-3 definition).</summary>
    public const string FallingEdgeAtPowerUp = "LP3017";

    /// <summary>Error: the name given for a cone of influence is not an input, variable or function block of the scheme.</summary>
    public const string UnknownConeName = "LP3020";
}
