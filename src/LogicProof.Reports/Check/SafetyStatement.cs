namespace LogicProof.Reports.Check;

/// <summary>
/// The limits of a proof, stated in every report format (text: a paragraph; JSON: a field; SARIF: the run's
/// properties and the tool's full description; JUnit: a suite property and system-out; HTML: a visible box).
/// </summary>
public static class SafetyStatement
{
    public const string Text =
        "A proof covers the logic as modelled, never the wiring, the relay firmware or the plant. "
        + "It supplements and never replaces testing, commissioning and review by qualified engineers. "
        + "Local codes, utility standards and licensed practice govern.";
}
