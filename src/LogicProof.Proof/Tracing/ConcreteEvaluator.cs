using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tracing;

/// <summary>
/// Evaluates a scan expression on the concrete values of a trace row, to find which terms of an equation decided
/// its value. Only used for explanations; the replay that validates a trace runs in the simulator.
/// </summary>
internal sealed class ConcreteEvaluator
{
    private readonly Func<int, TraceValue> _current;
    private readonly Func<int, TraceValue> _previous;

    public ConcreteEvaluator(Func<int, TraceValue> current, Func<int, TraceValue> previous)
    {
        _current = current;
        _previous = previous;
    }

    public TraceValue Evaluate(ScanExpression expression) => expression switch
    {
        BoolConstantExpression b => TraceValue.Of(b.Value),
        RealConstantExpression r => TraceValue.Of(r.Value),
        CellReadExpression read => read.Timing == ReadTiming.Current ? _current(read.Cell) : _previous(read.Cell),
        NotExpression not => TraceValue.Of(!Bool(not.Operand)),
        AndExpression and => TraceValue.Of(and.Operands.All(Bool)),
        OrExpression or => TraceValue.Of(or.Operands.Any(Bool)),
        XorExpression xor => TraceValue.Of(Bool(xor.Left) ^ Bool(xor.Right)),
        ImpliesExpression implies => TraceValue.Of(!Bool(implies.Left) || Bool(implies.Right)),
        CompareExpression compare => TraceValue.Of(Compare(compare)),
        AddExpression add => TraceValue.Of(Real(add.Left) + Real(add.Right)),
        SubtractExpression subtract => TraceValue.Of(Real(subtract.Left) - Real(subtract.Right)),
        NegateExpression negate => TraceValue.Of(-Real(negate.Operand)),
        ScaleExpression scale => TraceValue.Of(scale.Factor * Real(scale.Operand)),
        AbsExpression abs => TraceValue.Of(Fraction.Abs(Real(abs.Operand))),
        MinExpression min => TraceValue.Of(Real(min.Left) <= Real(min.Right) ? Real(min.Left) : Real(min.Right)),
        MaxExpression max => TraceValue.Of(Real(max.Left) >= Real(max.Right) ? Real(max.Left) : Real(max.Right)),
        _ => throw new InvalidOperationException($"Unsupported scan expression {expression.GetType().Name}."),
    };

    public bool Bool(ScanExpression expression) => Evaluate(expression) is BoolTraceValue b
        ? b.Value
        : throw new InvalidOperationException("A bool value was expected.");

    public Fraction Real(ScanExpression expression) => Evaluate(expression) switch
    {
        RealTraceValue r => r.Value,
        CounterTraceValue c => new Fraction(c.Scans),
        _ => throw new InvalidOperationException("A real value was expected."),
    };

    private bool Compare(CompareExpression compare)
    {
        if (compare.Left.Type == SignalType.Bool || compare.Right.Type == SignalType.Bool)
        {
            var equal = Bool(compare.Left) == Bool(compare.Right);
            return compare.Operator == CompareOperator.Equal ? equal : !equal;
        }

        var order = Real(compare.Left).CompareTo(Real(compare.Right));
        return compare.Operator switch
        {
            CompareOperator.Equal => order == 0,
            CompareOperator.NotEqual => order != 0,
            CompareOperator.Less => order < 0,
            CompareOperator.LessOrEqual => order <= 0,
            CompareOperator.Greater => order > 0,
            CompareOperator.GreaterOrEqual => order >= 0,
            _ => throw new InvalidOperationException($"Unknown comparison {compare.Operator}."),
        };
    }
}
