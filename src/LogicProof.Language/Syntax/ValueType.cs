namespace LogicProof.Language.Syntax;

/// <summary>The types of the language: boolean signals, exact real quantities and durations (settings only).</summary>
public enum ValueType
{
    Bool,
    Real,
    Time,
}
