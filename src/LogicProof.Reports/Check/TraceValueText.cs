using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>Counterexample values as text: bools as 1 and 0, counters as whole numbers, reals exact or rounded for display.</summary>
public static class TraceValueText
{
    /// <summary>For people: a real with at most four decimals, a trailing <c>~</c> when rounded; a missing value as "-".</summary>
    public static string Display(TraceValue? value) => value switch
    {
        BoolTraceValue b => b.Value ? "1" : "0",
        RealTraceValue r => ExactNumberText.FormatForDisplay(r.Value),
        CounterTraceValue c => ReportSentences.Count(c.Scans),
        _ => "-",
    };

    /// <summary>For programs: a real exact (a decimal, or p/q); a missing value as an empty string.</summary>
    public static string Exact(TraceValue? value) => value switch
    {
        BoolTraceValue b => b.Value ? "1" : "0",
        RealTraceValue r => ExactNumberText.FormatExact(r.Value),
        CounterTraceValue c => ReportSentences.Count(c.Scans),
        _ => string.Empty,
    };

    /// <summary>Bools as TRUE and FALSE, as the equations write them; other values as <see cref="Display"/>.</summary>
    public static string Logical(TraceValue? value) => value is BoolTraceValue b ? ReportSentences.Logical(b.Value) : Display(value);
}
