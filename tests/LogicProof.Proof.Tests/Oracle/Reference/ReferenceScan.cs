using Fractions;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// One scan in progress: this scan's inputs, the values the equations have written so far, and the memories, which
/// each stateful node reads and then updates in <see cref="ReferenceState"/>. Every operand is evaluated (no
/// short-circuit), so every timer, edge and past-time operator sees every scan.
/// </summary>
internal sealed class ReferenceScan(
    ReferenceLayout layout,
    IReadOnlyDictionary<string, int> inputIndex,
    IReadOnlyDictionary<string, int> variableIndex,
    ReferenceState state,
    ReferenceInputs inputs)
{
    private const int AfterEveryEquation = int.MaxValue;

    private readonly bool[] _bools = new bool[variableIndex.Count];
    private readonly Fraction[] _reals = new Fraction[variableIndex.Count];
    private int _equation;

    public void Run(BoundEquation equation)
    {
        _equation = equation.Index;
        var variable = variableIndex[equation.Target.Name];
        if (equation.Target.Type == ValueType.Real)
        {
            _reals[variable] = Real(equation.Expression);
        }
        else
        {
            _bools[variable] = Bool(equation.Expression);
        }
    }

    public bool Formula(BoundExpression formula)
    {
        _equation = AfterEveryEquation;
        return Bool(formula);
    }

    /// <summary>Stores this scan's value of every variable that is read as its last-scan value, and gives the state after the scan.</summary>
    public ReferenceState End()
    {
        foreach (var (name, (slot, isReal)) in layout.LastValue)
        {
            var variable = variableIndex[name];
            if (isReal)
            {
                state.Reals[slot] = _reals[variable];
            }
            else
            {
                state.Flags[slot] = _bools[variable];
            }
        }

        return state;
    }

    private bool Bool(BoundExpression expression) => expression switch
    {
        BoundBoolConstant constant => constant.Value,
        BoundSymbolReference reference => ReadBool(reference.Symbol),
        BoundUnary { Operator: UnaryOperator.Not } not => !Bool(not.Operand),
        BoundBinary binary => Binary(binary),
        BoundFunctionBlockCall block => Block(block),
        BoundTemporal temporal => Temporal(temporal),
        _ => throw new NotSupportedException($"not a bool expression: {expression}"),
    };

    private bool Binary(BoundBinary binary)
    {
        if (binary.Operator == BinaryOperator.Since)
        {
            var holding = Bool(binary.Left);
            var start = Bool(binary.Right);
            ref var since = ref state.Flags[layout.Nodes[binary].Flag];
            since = start || (holding && since);
            return since;
        }

        if (binary.Left.Type == ValueType.Bool)
        {
            var left = Bool(binary.Left);
            var right = Bool(binary.Right);
            return binary.Operator switch
            {
                BinaryOperator.Implies => !left || right,
                BinaryOperator.Or => left || right,
                BinaryOperator.Xor => left != right,
                BinaryOperator.And => left && right,
                BinaryOperator.Equal => left == right,
                BinaryOperator.NotEqual => left != right,
                _ => throw new NotSupportedException($"not a bool operator: {binary.Operator}"),
            };
        }

        var order = Real(binary.Left).CompareTo(Real(binary.Right));
        return binary.Operator switch
        {
            BinaryOperator.Equal => order == 0,
            BinaryOperator.NotEqual => order != 0,
            BinaryOperator.Less => order < 0,
            BinaryOperator.LessOrEqual => order <= 0,
            BinaryOperator.Greater => order > 0,
            BinaryOperator.GreaterOrEqual => order >= 0,
            _ => throw new NotSupportedException($"not a comparison: {binary.Operator}"),
        };
    }

    private Fraction Real(BoundExpression expression) => (expression switch
    {
        BoundRealConstant constant => constant.Value,
        BoundSymbolReference reference => ReadReal(reference.Symbol),
        BoundUnary { Operator: UnaryOperator.Negate } negate => -Real(negate.Operand),
        BoundBinary { Operator: BinaryOperator.Add } add => Real(add.Left) + Real(add.Right),
        BoundBinary { Operator: BinaryOperator.Subtract } subtract => Real(subtract.Left) - Real(subtract.Right),
        BoundBinary { Operator: BinaryOperator.Multiply } multiply => Real(multiply.Left) * Real(multiply.Right),
        BoundBinary { Operator: BinaryOperator.Divide } divide => Real(divide.Left) / Real(divide.Right),
        BoundFunctionCall { Function: BuiltinFunction.Abs } abs => Fraction.Abs(Real(abs.Arguments[0])),
        BoundFunctionCall { Function: BuiltinFunction.Min } min => Smaller(Real(min.Arguments[0]), Real(min.Arguments[1])),
        BoundFunctionCall { Function: BuiltinFunction.Max } max => Larger(Real(max.Arguments[0]), Real(max.Arguments[1])),
        BoundTemporal { Operator: TemporalOperator.Prev } prev => PreviousReal(prev),
        _ => throw new NotSupportedException($"not a real expression: {expression}"),
    }).Reduce();

    private static Fraction Smaller(Fraction left, Fraction right) => left.CompareTo(right) <= 0 ? left : right;

    private static Fraction Larger(Fraction left, Fraction right) => left.CompareTo(right) >= 0 ? left : right;

    private Fraction PreviousReal(BoundTemporal prev)
    {
        var now = Real(prev.Operand);
        ref var memory = ref state.Reals[layout.Nodes[prev].Real];
        var last = memory;
        memory = now;
        return last;
    }

    private bool ReadBool(Symbol symbol) => Locate(symbol, out var index) switch
    {
        Where.Input => inputs.Bools[index],
        Where.ThisScan => _bools[index],
        Where.LastScan => state.Flags[index],
        _ => (symbol.PowerUp as BoundBoolConstant)?.Value ?? false,
    };

    private Fraction ReadReal(Symbol symbol) => Locate(symbol, out var index) switch
    {
        Where.Input => inputs.Reals[index],
        Where.ThisScan => _reals[index],
        Where.LastScan => state.Reals[index],
        _ => (symbol.PowerUp as BoundRealConstant)?.Value ?? Fraction.Zero,
    };

    /// <summary>
    /// Where a read finds its value: an input; a variable whose equation has run this scan; the last-scan memory of a
    /// variable read at or before its own equation; or, for a variable no equation writes, its power-up value.
    /// </summary>
    private Where Locate(Symbol symbol, out int index)
    {
        if (symbol.Kind == SymbolKind.Input)
        {
            index = inputIndex[symbol.Name];
            return Where.Input;
        }

        if (layout.Writer.TryGetValue(symbol.Name, out var writer) && writer < _equation)
        {
            index = variableIndex[symbol.Name];
            return Where.ThisScan;
        }

        var isLast = layout.LastValue.TryGetValue(symbol.Name, out var last);
        index = last.Slot;
        return isLast ? Where.LastScan : Where.PowerUp;
    }

    private bool Block(BoundFunctionBlockCall block)
    {
        var first = Bool(block.Inputs[0]);
        var second = block.Inputs.Count > 1 && Bool(block.Inputs[1]);
        var m = layout.Nodes[block];
        var flags = state.Flags;
        var counts = state.Counts;
        return block.Kind switch
        {
            FunctionBlockKind.Ton => ReferenceBlocks.OnDelay(first, ref flags[m.Flag], ref counts[m.Count], m.Scans),
            FunctionBlockKind.Tof => ReferenceBlocks.OffDelay(first, ref flags[m.Flag], ref counts[m.Count], m.Scans),
            FunctionBlockKind.Tp => ReferenceBlocks.Pulse(first, ref flags[m.Flag], ref flags[m.SecondFlag], ref counts[m.Count], m.Scans),
            FunctionBlockKind.RTrig => ReferenceBlocks.RisingEdge(first, ref flags[m.Flag]),
            FunctionBlockKind.FTrig => ReferenceBlocks.FallingEdge(first, ref flags[m.Flag]),
            FunctionBlockKind.Sr => ReferenceBlocks.SetDominant(first, second, ref flags[m.Flag]),
            _ => ReferenceBlocks.ResetDominant(first, second, ref flags[m.Flag]),
        };
    }

    /// <summary>
    /// The past-time operators as the brief defines them, "so far" counting this scan: PREV is FALSE before the first
    /// scan; HELD(x, d) is TRUE when x has been TRUE at every scan of the last d (n = d in scans, rounded up: the
    /// last n + 1 samples, which span n scan intervals); WITHIN(x, d) when x was TRUE at one of those n + 1 samples.
    /// </summary>
    private bool Temporal(BoundTemporal temporal)
    {
        var now = Bool(temporal.Operand);
        var m = layout.Nodes[temporal];
        switch (temporal.Operator)
        {
            case TemporalOperator.Held:
                ref var run = ref state.Counts[m.Count];
                run = now ? Math.Min(run + 1, m.Scans + 1) : 0;
                return run >= m.Scans + 1;
            case TemporalOperator.Within:
                ref var age = ref state.Counts[m.Count];
                age = now ? 0 : Math.Min(age + 1, m.Scans + 1);
                return age <= m.Scans;
        }

        ref var memory = ref state.Flags[m.Flag];
        var last = memory;
        switch (temporal.Operator)
        {
            case TemporalOperator.Once:
                memory = now || last;
                return memory;
            case TemporalOperator.Historically:
                memory = now && last;
                return memory;
            default:
                memory = now;
                return temporal.Operator switch
                {
                    TemporalOperator.Prev => last,
                    TemporalOperator.Rose => now && !last,
                    _ => !now && last,
                };
        }
    }

    private enum Where
    {
        Input,
        ThisScan,
        LastScan,
        PowerUp,
    }
}
