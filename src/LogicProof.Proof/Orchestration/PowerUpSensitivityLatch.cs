namespace LogicProof.Proof.Orchestration;

/// <summary>
/// How one latch of unknown power-up affects a violated property: the verdict with its power-up value fixed TRUE and
/// fixed FALSE, every other unknown latch left free. <see cref="Latch"/> is the latch's variable; a latch may have
/// more than one memory (an SR's memory and its variable's last value, <see cref="Memories"/>), all fixed together.
/// </summary>
public sealed record PowerUpSensitivityLatch(
    string Latch,
    IReadOnlyList<string> Memories,
    PowerUpSensitivityOutcome WhenTrue,
    PowerUpSensitivityOutcome WhenFalse)
{
    /// <summary>TRUE or FALSE when exactly that power-up value breaks the property and the other proves it; else null.</summary>
    public bool? BreakingValue => (WhenTrue, WhenFalse) switch
    {
        (PowerUpSensitivityOutcome.Violated, PowerUpSensitivityOutcome.Proved) => true,
        (PowerUpSensitivityOutcome.Proved, PowerUpSensitivityOutcome.Violated) => false,
        _ => null,
    };

    /// <summary>One line for a report.</summary>
    public string Summary => BreakingValue switch
    {
        { } value => $"{Latch}: power-up {Word(value)} breaks it; power-up {Word(!value)} proves it",
        null when WhenTrue == PowerUpSensitivityOutcome.Violated && WhenFalse == PowerUpSensitivityOutcome.Violated
            => $"{Latch}: it fails with either power-up value",
        _ => $"{Latch}: power-up TRUE {Describe(WhenTrue)}; power-up FALSE {Describe(WhenFalse)}",
    };

    private static string Word(bool value) => value ? "TRUE" : "FALSE";

    private static string Describe(PowerUpSensitivityOutcome outcome) => outcome switch
    {
        PowerUpSensitivityOutcome.Proved => "proves it",
        PowerUpSensitivityOutcome.Violated => "breaks it",
        _ => "is not decided within the limits",
    };
}
