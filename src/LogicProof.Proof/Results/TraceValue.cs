using Fractions;

namespace LogicProof.Proof.Results;

/// <summary>A concrete value in a trace: a bool, an exact real, or a timer counter (whole scans).</summary>
public abstract record TraceValue
{
    public static TraceValue Of(bool value) => value ? BoolTraceValue.True : BoolTraceValue.False;

    public static TraceValue Of(Fraction value) => new RealTraceValue(value);
}
