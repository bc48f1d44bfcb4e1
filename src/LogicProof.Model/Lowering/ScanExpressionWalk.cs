using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>Stack-safe walks over the expressions of scan steps.</summary>
internal static class ScanExpressionWalk
{
    /// <summary>The expressions a step evaluates, in the order it evaluates them.</summary>
    public static void AddStepExpressions(ScanStep step, List<ScanExpression> into)
    {
        switch (step)
        {
            case AssignStep assign:
                into.Add(assign.Value);
                break;
            case TimerStep timer:
                into.Add(timer.Input);
                break;
            case EdgeStep edge:
                into.Add(edge.Clock);
                break;
            case LatchStep latch:
                into.Add(latch.Set);
                into.Add(latch.Reset);
                break;
            default:
                throw new InvalidOperationException($"unknown step type {step.GetType().Name}");
        }
    }

    internal static void PushAll(Stack<ScanExpression> stack, IReadOnlyList<ScanExpression> operands)
    {
        for (var i = operands.Count - 1; i >= 0; i--)
        {
            stack.Push(operands[i]);
        }
    }

    internal static void PushPair(Stack<ScanExpression> stack, ScanExpression left, ScanExpression right)
    {
        stack.Push(right);
        stack.Push(left);
    }
}
