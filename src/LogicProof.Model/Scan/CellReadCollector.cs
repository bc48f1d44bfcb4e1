namespace LogicProof.Model.Scan;

/// <summary>
/// Collects the cell reads of steps and expressions in evaluation order (operands left to right), without
/// recursion: a generated equation can nest far deeper than the call stack allows. One collector reuses its
/// buffer from one call to the next; it is not thread-safe.
/// </summary>
public sealed class CellReadCollector
{
    private readonly Stack<ScanExpression> _pending = new();

    /// <summary>Appends every cell read of the step's expressions to <paramref name="into"/>.</summary>
    public void Collect(ScanStep step, List<CellReadExpression> into)
    {
        switch (step)
        {
            case AssignStep assign:
                Collect(assign.Value, into);
                break;
            case TimerStep timer:
                Collect(timer.Input, into);
                break;
            case EdgeStep edge:
                Collect(edge.Clock, into);
                break;
            case LatchStep latch:
                Collect(latch.Set, into);
                Collect(latch.Reset, into);
                break;
            default:
                throw new InvalidOperationException($"unknown step type {step.GetType().Name}");
        }
    }

    /// <summary>Appends every cell read of the expression to <paramref name="into"/>.</summary>
    public void Collect(ScanExpression expression, List<CellReadExpression> into)
    {
        _pending.Push(expression);
        while (_pending.Count > 0)
        {
            switch (_pending.Pop())
            {
                case CellReadExpression read:
                    into.Add(read);
                    break;
                case AndExpression and:
                    PushRightToLeft(and.Operands);
                    break;
                case OrExpression or:
                    PushRightToLeft(or.Operands);
                    break;
                case var node:
                    var (first, second) = FixedOperands(node);
                    if (second is not null)
                    {
                        _pending.Push(second);
                    }

                    if (first is not null)
                    {
                        _pending.Push(first);
                    }

                    break;
            }
        }
    }

    private void PushRightToLeft(IReadOnlyList<ScanExpression> operands)
    {
        for (var i = operands.Count - 1; i >= 0; i--)
        {
            _pending.Push(operands[i]);
        }
    }

    /// <summary>The operands of a node with at most two, in order; null where there is none.</summary>
    private static (ScanExpression? First, ScanExpression? Second) FixedOperands(ScanExpression expression) => expression switch
    {
        BoolConstantExpression or RealConstantExpression => (null, null),
        NotExpression not => (not.Operand, null),
        NegateExpression negate => (negate.Operand, null),
        ScaleExpression scale => (scale.Operand, null),
        AbsExpression abs => (abs.Operand, null),
        XorExpression xor => (xor.Left, xor.Right),
        ImpliesExpression implies => (implies.Left, implies.Right),
        CompareExpression compare => (compare.Left, compare.Right),
        AddExpression add => (add.Left, add.Right),
        SubtractExpression subtract => (subtract.Left, subtract.Right),
        MinExpression min => (min.Left, min.Right),
        MaxExpression max => (max.Left, max.Right),
        _ => throw new InvalidOperationException($"unknown scan expression {expression.GetType().Name}"),
    };
}
