using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Proof.Invariants;

/// <summary>The real constants a step's expressions contain (settings are inlined as constants by the lowering).</summary>
internal static class ModelConstants
{
    public static IEnumerable<Fraction> Of(ScanStep step) => step switch
    {
        AssignStep assign => In(assign.Value),
        TimerStep timer => In(timer.Input),
        EdgeStep edge => In(edge.Clock),
        LatchStep latch => In(latch.Set).Concat(In(latch.Reset)),
        _ => [],
    };

    private static IEnumerable<Fraction> In(ScanExpression expression) => expression switch
    {
        RealConstantExpression constant => [constant.Value],
        NotExpression e => In(e.Operand),
        AndExpression e => e.Operands.SelectMany(In),
        OrExpression e => e.Operands.SelectMany(In),
        XorExpression e => In(e.Left).Concat(In(e.Right)),
        ImpliesExpression e => In(e.Left).Concat(In(e.Right)),
        CompareExpression e => In(e.Left).Concat(In(e.Right)),
        AddExpression e => In(e.Left).Concat(In(e.Right)),
        SubtractExpression e => In(e.Left).Concat(In(e.Right)),
        NegateExpression e => In(e.Operand),
        ScaleExpression e => In(e.Operand),
        AbsExpression e => In(e.Operand),
        MinExpression e => In(e.Left).Concat(In(e.Right)),
        MaxExpression e => In(e.Left).Concat(In(e.Right)),
        _ => [],
    };
}
