using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// One step of the encoding: <see cref="Stride"/> scans under held inputs (see <see cref="ScanEncoder.EncodeStep"/>).
/// <see cref="Scan"/> gives every cell's value, which is the same at each scan of the step; <see cref="Allowed"/>
/// constrains the stride; <see cref="Next"/> is the state after the last scan of the step.
/// </summary>
public sealed class SymbolicStep
{
    public SymbolicStep(SymbolicScan scan, Expr stride, BoolExpr allowed, SymbolicState next)
    {
        Scan = scan;
        Stride = stride;
        Allowed = allowed;
        Next = next;
    }

    public SymbolicScan Scan { get; }

    /// <summary>The number of scans m &gt;= 1 the step covers (a counter term, or the constant 1 without acceleration).</summary>
    public Expr Stride { get; }

    public BoolExpr Allowed { get; }

    public SymbolicState Next { get; }
}
