using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Model.Scan;
using LogicProof.Model.Timing;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Lowers bound expressions of equations and formulas into scan expressions, appending the steps that
/// function-block calls and past-time operators need.
/// <para>
/// Read timing in an equation: an input, or a variable written by an earlier equation, is read as computed in this
/// scan; a variable written by this or a later equation, or by none, is read from its PreviousValue slot. In a
/// formula every read is of this scan, because monitors run after all equations.
/// </para>
/// <para>
/// Instances (function blocks, past-time operators, SINCE) run in evaluation order: inner first, left to right.
/// Each gets the next number of its equation or formula and, unless it is the whole right side of an equation, a
/// hidden cell named <c>OWNER.KIND#n</c>. Its step is appended when it is reached, so it runs before the step that
/// reads it. AND and OR chains are flattened to one n-ary node (without recursion) to keep trees shallow.
/// </para>
/// </summary>
internal sealed class ExpressionLowerer
{
    private static readonly BoolConstantExpression True = new(true);
    private static readonly BoolConstantExpression False = new(false);
    private static readonly UnknownPowerUp UnknownPowerUpValue = new();

    private readonly ModelAssembly _model;
    private readonly DurationConverter _durations;
    private readonly DiagnosticBag _diagnostics;
    private readonly IReadOnlyDictionary<string, int> _cellOfSymbol;
    private readonly int[] _writerEquationOfCell;
    private readonly MonitorLowerer _monitors;
    private readonly Dictionary<Symbol, int> _cellBySymbol = new(ReferenceEqualityComparer.Instance);
    private readonly Stack<BoundExpression> _chainStack = new();
    private readonly List<ScanExpression> _chainOperands = [];
    private readonly CellReadExpression?[] _currentReads;
    private readonly CellReadExpression?[] _previousReads;

    private string _owner = string.Empty;
    private int _equationIndex = -1;
    private int _instanceCount;

    /// <param name="writerEquationOfCell">For each declared cell, the index of the equation writing it, or -1.</param>
    public ExpressionLowerer(
        ModelAssembly model,
        DurationConverter durations,
        DiagnosticBag diagnostics,
        IReadOnlyDictionary<string, int> cellOfSymbol,
        int[] writerEquationOfCell)
    {
        _model = model;
        _durations = durations;
        _diagnostics = diagnostics;
        _cellOfSymbol = cellOfSymbol;
        _writerEquationOfCell = writerEquationOfCell;
        _monitors = new MonitorLowerer(model, this);
        _currentReads = new CellReadExpression?[writerEquationOfCell.Length];
        _previousReads = new CellReadExpression?[writerEquationOfCell.Length];
    }

    private bool InFormula => _equationIndex < 0;

    /// <param name="latchPowerUp">The memory power-up of an SR/RS that is the whole right side.</param>
    public void LowerEquation(BoundEquation equation, int targetCell, PowerUp latchPowerUp)
    {
        _owner = _model.Cells[targetCell].Name;
        _equationIndex = equation.Index;
        _instanceCount = 0;
        if (equation.Expression is BoundFunctionBlockCall wholeRightSide)
        {
            LowerBlock(wholeRightSide, targetCell, equation.Syntax.Span, latchPowerUp);
            return;
        }

        _model.AddStep(new AssignStep(targetCell, Lower(equation.Expression), equation.Syntax.Span));
    }

    /// <summary>Adds a bool cell named <paramref name="cellName"/> holding the formula's value at every scan.</summary>
    public int LowerFormula(string cellName, BoundExpression formula, SourceSpan span)
    {
        var cell = _model.AddHiddenCell(cellName, SignalType.Bool, span);
        _owner = _model.Cells[cell].Name;
        _equationIndex = -1;
        _instanceCount = 0;
        _model.AddStep(new AssignStep(cell, Lower(formula), span));
        return cell;
    }

    /// <summary>The next instance number of the current equation or formula and its hidden cell name.</summary>
    public string NextInstanceName(string kind)
    {
        _instanceCount++;
        return HiddenNames.Instance(_owner, kind, _instanceCount);
    }

    public PresetRounding? Preset(BoundDuration duration)
    {
        var preset = _durations.Convert(duration.Value, _diagnostics);
        if (preset is { WasRounded: true })
        {
            _model.Roundings.Add(preset);
        }

        return preset;
    }

    public ScanExpression Lower(BoundExpression expression) => expression switch
    {
        BoundBoolConstant constant => constant.Value ? True : False,
        BoundRealConstant constant => new RealConstantExpression(constant.Value),
        BoundSymbolReference reference => Read(reference.Symbol),
        BoundUnary unary => LowerUnary(unary),
        BoundBinary { Operator: BinaryOperator.Since } since => InFormula
            ? _monitors.LowerSince(since)
            : throw new InvalidOperationException("SINCE in an equation: the binder allows it only in formulas"),
        BoundBinary binary => LowerBinary(binary),
        BoundFunctionCall call => LowerFunction(call),
        BoundFunctionBlockCall block => LowerBlock(block, null, block.Span, UnknownPowerUpValue)!,
        BoundTemporal temporal => InFormula
            ? _monitors.LowerTemporal(temporal)
            : throw new InvalidOperationException("a past-time operator in an equation: the binder allows them only in formulas"),
        _ => throw new InvalidOperationException($"cannot lower {expression.GetType().Name} at {expression.Span}"),
    };

    private ScanExpression Read(Symbol symbol)
    {
        var cell = CellOf(symbol);
        if (symbol.Kind == SymbolKind.Input || InFormula)
        {
            return _currentReads[cell] ??= new CellReadExpression(cell, ReadTiming.Current, _model.Cells[cell].Type);
        }

        var writer = _writerEquationOfCell[cell];
        if (writer >= 0 && writer < _equationIndex)
        {
            return _currentReads[cell] ??= new CellReadExpression(cell, ReadTiming.Current, _model.Cells[cell].Type);
        }

        _model.PreviousSlot(cell, PendingPowerUp.Instance);
        return _previousReads[cell] ??= new CellReadExpression(cell, ReadTiming.Previous, _model.Cells[cell].Type);
    }

    // Bound references share their Symbol object, so an identity lookup avoids hashing the name at every read.
    private int CellOf(Symbol symbol)
    {
        if (_cellBySymbol.TryGetValue(symbol, out var cell))
        {
            return cell;
        }

        if (symbol.Kind == SymbolKind.Setting || !_cellOfSymbol.TryGetValue(symbol.Name, out cell))
        {
            throw new InvalidOperationException($"'{symbol.Name}' has no cell (settings are constants after binding)");
        }

        _cellBySymbol.Add(symbol, cell);
        return cell;
    }

    private ScanExpression LowerUnary(BoundUnary unary)
    {
        var operand = Lower(unary.Operand);
        return unary.Operator switch
        {
            UnaryOperator.Not => new NotExpression(operand),
            UnaryOperator.Negate => operand is RealConstantExpression constant
                ? new RealConstantExpression(-constant.Value)
                : new NegateExpression(operand),
            _ => throw new InvalidOperationException($"unknown unary operator {unary.Operator}"),
        };
    }

    private ScanExpression LowerBinary(BoundBinary binary)
    {
        switch (binary.Operator)
        {
            case BinaryOperator.And:
                return new AndExpression(LowerChain(binary));
            case BinaryOperator.Or:
                return new OrExpression(LowerChain(binary));
        }

        var left = Lower(binary.Left);
        var right = Lower(binary.Right);
        return binary.Operator switch
        {
            BinaryOperator.Xor => new XorExpression(left, right),
            BinaryOperator.Implies => new ImpliesExpression(left, right),
            BinaryOperator.Equal => new CompareExpression(CompareOperator.Equal, left, right),
            BinaryOperator.NotEqual => new CompareExpression(CompareOperator.NotEqual, left, right),
            BinaryOperator.Less => new CompareExpression(CompareOperator.Less, left, right),
            BinaryOperator.LessOrEqual => new CompareExpression(CompareOperator.LessOrEqual, left, right),
            BinaryOperator.Greater => new CompareExpression(CompareOperator.Greater, left, right),
            BinaryOperator.GreaterOrEqual => new CompareExpression(CompareOperator.GreaterOrEqual, left, right),
            BinaryOperator.Add => Fold(left, right, (a, b) => a + b) ?? (ScanExpression)new AddExpression(left, right),
            BinaryOperator.Subtract => Fold(left, right, (a, b) => a - b) ?? (ScanExpression)new SubtractExpression(left, right),
            BinaryOperator.Multiply => Multiply(left, right, binary),
            BinaryOperator.Divide => Divide(left, right, binary),
            _ => throw new InvalidOperationException($"unknown binary operator {binary.Operator}"),
        };
    }

    /// <summary>The operands of a chain of one associative operator (A AND B AND C), in order, lowered.</summary>
    private ScanExpression[] LowerChain(BoundBinary chain)
    {
        // One stack and one operand buffer serve every chain: a chain nested in an operand works above this one's
        // marks and leaves both as it found them before this chain continues.
        var pending = _chainStack;
        var operands = _chainOperands;
        var pendingBottom = pending.Count;
        var operandsStart = operands.Count;
        pending.Push(chain);
        while (pending.Count > pendingBottom)
        {
            var node = pending.Pop();
            if (node is BoundBinary binary && binary.Operator == chain.Operator)
            {
                pending.Push(binary.Right);
                pending.Push(binary.Left);
                continue;
            }

            operands.Add(Lower(node));
        }

        var lowered = new ScanExpression[operands.Count - operandsStart];
        operands.CopyTo(operandsStart, lowered, 0, lowered.Length);
        operands.RemoveRange(operandsStart, lowered.Length);
        return lowered;
    }

    private static RealConstantExpression? Fold(ScanExpression left, ScanExpression right, Func<Fraction, Fraction, Fraction> operation) =>
        left is RealConstantExpression a && right is RealConstantExpression b
            ? new RealConstantExpression(operation(a.Value, b.Value))
            : null;

    // Linear arithmetic: the binder guarantees a constant side; constants are folded bottom-up as they are lowered.
    private static ScanExpression Multiply(ScanExpression left, ScanExpression right, BoundBinary source) => (left, right) switch
    {
        (RealConstantExpression a, RealConstantExpression b) => new RealConstantExpression(a.Value * b.Value),
        (_, RealConstantExpression factor) => new ScaleExpression(factor.Value, left),
        (RealConstantExpression factor, _) => new ScaleExpression(factor.Value, right),
        _ => throw new InvalidOperationException($"non-linear product at {source.Span}: the binder should have rejected it"),
    };

    private static ScanExpression Divide(ScanExpression left, ScanExpression right, BoundBinary source)
    {
        if (right is not RealConstantExpression divisor || divisor.Value.IsZero)
        {
            throw new InvalidOperationException($"division by a non-constant or zero at {source.Span}: the binder should have rejected it");
        }

        var factor = Fraction.One / divisor.Value;
        return left is RealConstantExpression constant
            ? new RealConstantExpression(constant.Value * factor)
            : new ScaleExpression(factor, left);
    }

    private ScanExpression LowerFunction(BoundFunctionCall call)
    {
        var arguments = new ScanExpression[call.Arguments.Count];
        for (var i = 0; i < arguments.Length; i++)
        {
            arguments[i] = Lower(call.Arguments[i]);
        }

        return (call.Function, arguments) switch
        {
            (BuiltinFunction.Abs, [RealConstantExpression c]) => new RealConstantExpression(Fraction.Abs(c.Value)),
            (BuiltinFunction.Abs, [var operand]) => new AbsExpression(operand),
            (BuiltinFunction.Min, [RealConstantExpression a, RealConstantExpression b]) =>
                a.Value.CompareTo(b.Value) <= 0 ? a : b,
            (BuiltinFunction.Min, [var a, var b]) => new MinExpression(a, b),
            (BuiltinFunction.Max, [RealConstantExpression a, RealConstantExpression b]) =>
                a.Value.CompareTo(b.Value) >= 0 ? a : b,
            (BuiltinFunction.Max, [var a, var b]) => new MaxExpression(a, b),
            _ => throw new InvalidOperationException($"{call.Function} with {arguments.Length} arguments at {call.Span}"),
        };
    }

    /// <summary>
    /// Appends the step of one function-block call. With <paramref name="wholeTarget"/> the block writes that
    /// variable's cell directly and nothing is returned; otherwise it writes a new hidden cell, which is returned
    /// read in this scan.
    /// </summary>
    private ScanExpression? LowerBlock(BoundFunctionBlockCall call, int? wholeTarget, SourceSpan stepSpan, PowerUp latchPowerUp)
    {
        var inputs = new ScanExpression[call.Inputs.Count];
        for (var i = 0; i < inputs.Length; i++)
        {
            inputs[i] = Lower(call.Inputs[i]);
        }

        var kindName = BoundTree.BlockName(call.Kind);
        var hiddenName = NextInstanceName(kindName);
        var target = wholeTarget ?? _model.AddHiddenCell(hiddenName, SignalType.Bool, call.Span);
        var cellName = _model.Cells[target].Name;
        switch (call.Kind)
        {
            case FunctionBlockKind.Ton or FunctionBlockKind.Tof or FunctionBlockKind.Tp when inputs.Length == 1:
                var preset = call.Preset is { } duration
                    ? Preset(duration)
                    : throw new InvalidOperationException($"{kindName} without a preset at {call.Span}");
                AddTimer(TimerKindOf(call.Kind), target, inputs[0], preset?.Scans ?? 0, stepSpan);
                break;
            case FunctionBlockKind.RTrig or FunctionBlockKind.FTrig when inputs.Length == 1:
                var edgeSlot = _model.AddSlot(StateSlotKind.EdgeMemory, cellName + "@edge", new KnownBoolPowerUp(false), target);
                var edgeKind = call.Kind == FunctionBlockKind.RTrig ? EdgeKind.Rising : EdgeKind.Falling;
                _model.AddStep(new EdgeStep(edgeKind, target, inputs[0], edgeSlot, stepSpan));
                break;
            case FunctionBlockKind.Sr or FunctionBlockKind.Rs when inputs.Length == 2:
                var latchSlot = _model.AddSlot(StateSlotKind.LatchMemory, cellName + "@latch", latchPowerUp, target);
                var latchKind = call.Kind == FunctionBlockKind.Sr ? LatchKind.SetDominant : LatchKind.ResetDominant;
                _model.AddStep(new LatchStep(latchKind, target, inputs[0], inputs[1], latchSlot, stepSpan));
                break;
            default:
                throw new InvalidOperationException($"{kindName} with {inputs.Length} inputs at {call.Span}");
        }

        return wholeTarget is null ? new CellReadExpression(target, ReadTiming.Current, SignalType.Bool) : null;
    }

    /// <summary>Appends a timer step with its counter (power-up 0, or the preset for TOF: expired).</summary>
    public void AddTimer(TimerKind kind, int target, ScanExpression input, int presetScans, SourceSpan span)
    {
        var powerUp = new KnownCounterPowerUp(kind == TimerKind.OffDelay ? presetScans : 0);
        var slot = _model.AddSlot(StateSlotKind.TimerCounter, _model.Cells[target].Name + "@timer", powerUp, target, presetScans);
        _model.AddStep(new TimerStep(kind, target, input, presetScans, slot, span));
    }

    private static TimerKind TimerKindOf(FunctionBlockKind kind) => kind switch
    {
        FunctionBlockKind.Ton => TimerKind.OnDelay,
        FunctionBlockKind.Tof => TimerKind.OffDelay,
        _ => TimerKind.Pulse,
    };

    public static SignalType ToSignalType(ValueType type) => type switch
    {
        ValueType.Bool => SignalType.Bool,
        ValueType.Real => SignalType.Real,
        _ => throw new InvalidOperationException($"a {type} value cannot be a signal"),
    };
}
