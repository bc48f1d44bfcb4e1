using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>The fixed wording every format shares, so the formats never tell different stories.</summary>
public static class ReportSentences
{
    public static string Breaker(bool modelled) => modelled
        ? "The breaker was modelled: 52a and 52b followed the close and trip outputs through the scheme's breaker model."
        : "The breaker was not modelled: 52a and 52b were free inputs, so a proof holds for any breaker status sequence "
          + "and a counterexample may show status changes that a real breaker cannot make.";

    /// <summary>"proved", "violated" or "inconclusive".</summary>
    public static string Verdict(PropertyVerdict verdict) => verdict switch
    {
        Proved => "proved",
        Violated => "violated",
        _ => "inconclusive",
    };

    public static string Origin(PropertyOrigin origin) => origin == PropertyOrigin.Rule ? "rule" : "requirement";

    /// <summary>"Rule" or "Requirement", to start a sentence.</summary>
    public static string OriginAtStart(PropertyOrigin origin) => origin == PropertyOrigin.Rule ? "Rule" : "Requirement";

    /// <summary>"error", "warning" or "note".</summary>
    public static string SeverityName(Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };

    /// <summary>A diagnostic on one line: place, severity, code and message.</summary>
    public static string DiagnosticLine(Diagnostic diagnostic) =>
        $"{diagnostic.Span}: {SeverityName(diagnostic.Severity)} {diagnostic.Code}: {diagnostic.Message}";

    /// <summary>How a verdict was reached, e.g. "k-induction, depth 2" or "bmc: bound of 50 steps reached".</summary>
    public static string VerdictDetail(PropertyVerdict verdict) => verdict switch
    {
        Proved proved => proved.Engine
            + (proved.Depth is { } depth ? ", depth " + Count(depth) : string.Empty)
            + (proved.Invariant is { } invariant ? ", invariant " + invariant : string.Empty),
        Violated violated => violated.Engine + ", failing at scan " + Count(violated.Trace.FailingScan),
        Inconclusive inconclusive => inconclusive.Reason + " (no violation within " + Count(inconclusive.DepthReached) + " steps)",
        _ => string.Empty,
    };

    /// <summary>Why a rule was not checked, e.g. "the scheme does not bind the roles low_gas, spring_charged".</summary>
    public static string MissingRoles(NotApplicableRule rule) =>
        (rule.MissingRoles.Count == 1 ? "the scheme does not bind the role " : "the scheme does not bind the roles ")
        + string.Join(", ", rule.MissingRoles);

    public static string PowerUp(PowerUpNote note) =>
        $"latch {note.Latch} has no declared power-up value; {note.Property} fails when it powers up {Logical(note.BreakingValue)}";

    /// <summary>The power-up a counterexample starts from, beside its table.</summary>
    public static string PowerUpStart(PowerUpNote note) =>
        $"latch {note.Latch} starts {Logical(note.BreakingValue)} (no declared power-up value; the checker tried both)";

    /// <summary>The simulator's setting for the power-up, e.g. "SEAL=TRUE".</summary>
    public static string PowerUpSetting(PowerUpNote note) => note.Latch + "=" + Logical(note.BreakingValue);

    /// <summary>A node of the justification tree: the cell, its value, the scan, and the equation's file and line.</summary>
    public static string Justification(JustificationNode node)
    {
        var place = node.Equation.IsNone ? string.Empty : $", {node.Equation.File}:{Count(node.Equation.Line)}";
        var note = node.Note is { } text ? $" ({text})" : string.Empty;
        return $"{node.Cell} = {TraceValueText.Logical(node.Value)} at scan {Count(node.Scan)}{place}{note}";
    }

    /// <summary>The terms that decide a justification node's value.</summary>
    public static string Because(JustificationNode node) =>
        "because " + string.Join("; ", node.Terms.Select(term => $"{term.Text} = {TraceValueText.Logical(term.Value)}"));

    /// <summary>Bools as the equations write them.</summary>
    public static string Logical(bool value) => value ? "TRUE" : "FALSE";

    /// <summary>Seconds with three decimals, for people and for JUnit's time attribute.</summary>
    public static string Seconds(TimeSpan elapsed) =>
        Math.Round((decimal)elapsed.Ticks / TimeSpan.TicksPerSecond, 3, MidpointRounding.AwayFromZero).ToString("0.000", CultureInfo.InvariantCulture);

    public static string Count(long value) => value.ToString(CultureInfo.InvariantCulture);
}
