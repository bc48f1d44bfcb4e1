using System.Globalization;

namespace LogicProof.Proof.Results;

/// <summary>A timer counter: the whole scans counted so far (0 up to the preset).</summary>
public sealed record CounterTraceValue(long Scans) : TraceValue
{
    public override string ToString() => Scans.ToString(CultureInfo.InvariantCulture);
}
