using System.Globalization;
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
        $"latch {note.Latch} has no declared power-up value; {note.Property} fails when it powers up {(note.BreakingValue ? "TRUE" : "FALSE")}";

    /// <summary>Seconds with three decimals, for people and for JUnit's time attribute.</summary>
    public static string Seconds(TimeSpan elapsed) =>
        Math.Round((decimal)elapsed.Ticks / TimeSpan.TicksPerSecond, 3, MidpointRounding.AwayFromZero).ToString("0.000", CultureInfo.InvariantCulture);

    public static string Count(long value) => value.ToString(CultureInfo.InvariantCulture);
}
