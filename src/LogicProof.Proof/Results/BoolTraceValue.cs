namespace LogicProof.Proof.Results;

public sealed record BoolTraceValue(bool Value) : TraceValue
{
    public static BoolTraceValue True { get; } = new(true);

    public static BoolTraceValue False { get; } = new(false);

    public override string ToString() => Value ? "TRUE" : "FALSE";
}
