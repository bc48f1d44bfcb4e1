namespace LogicProof.Core.Diagnostics;

public enum Severity
{
    Info,
    Warning,
    Error,
}
