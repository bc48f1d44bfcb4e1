using LogicProof.Model.Scan;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Structural equality of scan expressions. The records' own equality compares operand lists by reference, so two
/// timers written on the same input text would not compare equal through it.
/// </summary>
internal static class ScanExpressionEquality
{
    public static bool AreEqual(ScanExpression left, ScanExpression right) => (left, right) switch
    {
        (BoolConstantExpression a, BoolConstantExpression b) => a.Value == b.Value,
        (RealConstantExpression a, RealConstantExpression b) => a.Value.CompareTo(b.Value) == 0,
        (CellReadExpression a, CellReadExpression b) => a.Cell == b.Cell && a.Timing == b.Timing,
        (NotExpression a, NotExpression b) => AreEqual(a.Operand, b.Operand),
        (AndExpression a, AndExpression b) => SameOperands(a.Operands, b.Operands),
        (OrExpression a, OrExpression b) => SameOperands(a.Operands, b.Operands),
        (XorExpression a, XorExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (ImpliesExpression a, ImpliesExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (CompareExpression a, CompareExpression b) =>
            a.Operator == b.Operator && AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (AddExpression a, AddExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (SubtractExpression a, SubtractExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (NegateExpression a, NegateExpression b) => AreEqual(a.Operand, b.Operand),
        (ScaleExpression a, ScaleExpression b) => a.Factor.CompareTo(b.Factor) == 0 && AreEqual(a.Operand, b.Operand),
        (AbsExpression a, AbsExpression b) => AreEqual(a.Operand, b.Operand),
        (MinExpression a, MinExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        (MaxExpression a, MaxExpression b) => AreEqual(a.Left, b.Left) && AreEqual(a.Right, b.Right),
        _ => false,
    };

    private static bool SameOperands(IReadOnlyList<ScanExpression> left, IReadOnlyList<ScanExpression> right) =>
        left.Count == right.Count && left.Zip(right).All(pair => AreEqual(pair.First, pair.Second));
}
