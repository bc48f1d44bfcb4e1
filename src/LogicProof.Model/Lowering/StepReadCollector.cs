using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>Collects the cell reads of steps, reusing its buffers from one step to the next.</summary>
internal sealed class StepReadCollector
{
    private readonly Stack<ScanExpression> _stack = new();
    private readonly List<ScanExpression> _roots = new(2);

    /// <summary>Appends every cell read of the step to <paramref name="into"/>, in evaluation order.</summary>
    public void Collect(ScanStep step, List<CellReadExpression> into)
    {
        _roots.Clear();
        ScanExpressionWalk.AddStepExpressions(step, _roots);
        for (var i = _roots.Count - 1; i >= 0; i--)
        {
            _stack.Push(_roots[i]);
        }

        while (_stack.Count > 0)
        {
            switch (_stack.Pop())
            {
                case CellReadExpression read:
                    into.Add(read);
                    break;
                case NotExpression not:
                    _stack.Push(not.Operand);
                    break;
                case NegateExpression negate:
                    _stack.Push(negate.Operand);
                    break;
                case ScaleExpression scale:
                    _stack.Push(scale.Operand);
                    break;
                case AbsExpression abs:
                    _stack.Push(abs.Operand);
                    break;
                case AndExpression and:
                    ScanExpressionWalk.PushAll(_stack, and.Operands);
                    break;
                case OrExpression or:
                    ScanExpressionWalk.PushAll(_stack, or.Operands);
                    break;
                case XorExpression xor:
                    ScanExpressionWalk.PushPair(_stack, xor.Left, xor.Right);
                    break;
                case ImpliesExpression implies:
                    ScanExpressionWalk.PushPair(_stack, implies.Left, implies.Right);
                    break;
                case CompareExpression compare:
                    ScanExpressionWalk.PushPair(_stack, compare.Left, compare.Right);
                    break;
                case AddExpression add:
                    ScanExpressionWalk.PushPair(_stack, add.Left, add.Right);
                    break;
                case SubtractExpression subtract:
                    ScanExpressionWalk.PushPair(_stack, subtract.Left, subtract.Right);
                    break;
                case MinExpression min:
                    ScanExpressionWalk.PushPair(_stack, min.Left, min.Right);
                    break;
                case MaxExpression max:
                    ScanExpressionWalk.PushPair(_stack, max.Left, max.Right);
                    break;
                case BoolConstantExpression or RealConstantExpression:
                    break;
                case var other:
                    throw new InvalidOperationException($"unknown scan expression {other.GetType().Name}");
            }
        }
    }
}
