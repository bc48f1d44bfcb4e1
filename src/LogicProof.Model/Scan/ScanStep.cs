using LogicProof.Core.Text;

namespace LogicProof.Model.Scan;

/// <summary>
/// One step of the scan program. Steps run in order, each writing its <see cref="Target"/> cell once per scan.
/// Function-block steps also read and write their own state slot (<see cref="StateSlot"/>).
/// </summary>
public abstract record ScanStep(int Target, SourceSpan Span);

/// <summary><c>Target := Value</c>.</summary>
public sealed record AssignStep(int Target, ScanExpression Value, SourceSpan Span) : ScanStep(Target, Span);

public enum TimerKind
{
    /// <summary>On-delay TON.</summary>
    OnDelay,

    /// <summary>Off-delay TOF.</summary>
    OffDelay,

    /// <summary>Pulse TP.</summary>
    Pulse,
}

/// <summary>
/// An IEC 61131-3 timer counting whole scans. With n = <see cref="PresetScans"/> and c the counter in the state
/// slot (0..n), c' its value after this scan and IN this scan's input:
/// <list type="bullet">
/// <item>TON: Q = IN and c &gt;= n; c' = IN ? min(c + 1, n) : 0; power-up c = 0. Q rises on the (n+1)-th consecutive
/// scan with IN TRUE, when the elapsed time ET = n scan intervals reaches PT.</item>
/// <item>TOF: Q = IN or c &lt; n; c' = IN ? 0 : min(c + 1, n); power-up c = n (expired, so Q = IN at power-up).
/// Q stays TRUE for n scans after IN falls.</item>
/// <item>TP: c = 0 idle, 0 &lt; c &lt; n pulsing, c = n pulse done. Idle: if IN and n &gt; 0 then Q = TRUE, c' = 1,
/// else Q = FALSE, c' = 0. Pulsing: Q = TRUE, c' = c + 1. Done: Q = FALSE, c' = IN ? n : 0. The pulse lasts exactly
/// n scans whatever IN does meanwhile (not retriggerable); a new pulse needs IN FALSE after the pulse ends.</item>
/// </list>
/// </summary>
public sealed record TimerStep(TimerKind Kind, int Target, ScanExpression Input, int PresetScans, int StateSlot, SourceSpan Span)
    : ScanStep(Target, Span);

public enum EdgeKind
{
    Rising,
    Falling,
}

/// <summary>
/// IEC 61131-3 R_TRIG and F_TRIG with memory M in the state slot, power-up FALSE, exactly as the standard's body:
/// R_TRIG: Q = CLK and not M; M' = CLK. F_TRIG: Q = not CLK and not M; M' = not CLK.
/// So R_TRIG gives Q at the first scan if CLK is TRUE, and F_TRIG gives Q at the first scan if CLK is FALSE.
/// </summary>
public sealed record EdgeStep(EdgeKind Kind, int Target, ScanExpression Clock, int StateSlot, SourceSpan Span)
    : ScanStep(Target, Span);

public enum LatchKind
{
    /// <summary>SR: Q1 = S1 or (not R and Q1 at the previous scan).</summary>
    SetDominant,

    /// <summary>RS: Q1 = not R1 and (S or Q1 at the previous scan).</summary>
    ResetDominant,
}

/// <summary>An IEC 61131-3 bistable; its memory is the state slot (the previous Q1), power-up as declared or unknown.</summary>
public sealed record LatchStep(LatchKind Kind, int Target, ScanExpression Set, ScanExpression Reset, int StateSlot, SourceSpan Span)
    : ScanStep(Target, Span);
