using System.Globalization;
using Fractions;

namespace LogicProof.Proof.Results;

public sealed record RealTraceValue(Fraction Value) : TraceValue
{
    public override string ToString() => Value.ToString(CultureInfo.InvariantCulture);
}
