namespace LogicProof.Language.Binding;

/// <summary>The IEC 61131-3 standard function blocks the language supports, by their standard names.</summary>
public enum FunctionBlockKind
{
    Ton,
    Tof,
    Tp,
    RTrig,
    FTrig,
    Sr,
    Rs,
}

public enum BuiltinFunction
{
    Abs,
    Min,
    Max,
}

/// <summary>
/// Past-time operators for formulas. PREV(x) is x at the previous scan (FALSE, or 0 for a real, at the first
/// scan); ROSE(x) = x AND NOT PREV(x); FELL(x) = NOT x AND PREV(x); ONCE(x): x at some scan so far;
/// HISTORICALLY(x): x at every scan so far; HELD(x, d): x TRUE continuously for at least d (same timing as a TON
/// with preset d); WITHIN(x, d): x TRUE at some scan in the last d (same timing as a TOF with preset d).
/// </summary>
public enum TemporalOperator
{
    Prev,
    Rose,
    Fell,
    Once,
    Historically,
    Held,
    Within,
}
