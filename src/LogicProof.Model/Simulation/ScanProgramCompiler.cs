using System.Linq.Expressions;
using System.Reflection;
using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// Compiles a <see cref="ScanModel"/> once into a <see cref="ScanProgram"/> of compiled expression trees, so a
/// scan runs straight-line code instead of walking the model. Steps are cut into chunks of bounded size: the JIT
/// optimises small methods fully and gives up on huge ones. The model is checked on the way (every read has a
/// source, every memory its slot); an inconsistent model is a bug in whoever built it and throws
/// <see cref="ArgumentException"/>.
/// </summary>
internal sealed class ScanProgramCompiler
{
    private const int NodesPerChunk = 4000;

    private readonly ScanModel _model;
    private readonly ScanStateLayout _layout;
    private readonly int[] _previousSlotOfCell;
    private readonly bool[] _computed;
    private readonly bool[] _slotOwned;
    private readonly ParameterExpression _cellBools = Expression.Parameter(typeof(bool[]), "cellBools");
    private readonly ParameterExpression _cellReals = Expression.Parameter(typeof(Fraction[]), "cellReals");
    private readonly ParameterExpression _stateBools = Expression.Parameter(typeof(bool[]), "stateBools");
    private readonly ParameterExpression _stateCounters = Expression.Parameter(typeof(int[]), "stateCounters");
    private readonly ParameterExpression _stateReals = Expression.Parameter(typeof(Fraction[]), "stateReals");
    private int _nodes;

    private ScanProgramCompiler(ScanModel model, ScanStateLayout layout)
    {
        _model = model;
        _layout = layout;
        _previousSlotOfCell = new int[model.Cells.Count];
        Array.Fill(_previousSlotOfCell, -1);
        _computed = new bool[model.Cells.Count];
        _slotOwned = new bool[model.StateSlots.Count];
    }

    public static ScanProgram Compile(ScanModel model, ScanStateLayout layout) =>
        new ScanProgramCompiler(model, layout).Compile();

    private ScanProgram Compile()
    {
        CheckCellsAndSlots();
        var chunks = new List<Action<bool[], Fraction[], bool[], int[], Fraction[]>>();
        var statements = new List<Expression>();
        foreach (var step in _model.Steps)
        {
            statements.Add(CompileStep(step));
            _computed[step.Target] = true;
            if (_nodes >= NodesPerChunk)
            {
                chunks.Add(Lambda(statements));
                statements.Clear();
                _nodes = 0;
            }
        }

        statements.AddRange(SaveCurrentValues());
        if (statements.Count > 0)
        {
            chunks.Add(Lambda(statements));
        }

        return new ScanProgram(chunks);
    }

    private Action<bool[], Fraction[], bool[], int[], Fraction[]> Lambda(List<Expression> statements) =>
        Expression.Lambda<Action<bool[], Fraction[], bool[], int[], Fraction[]>>(
            Expression.Block(typeof(void), statements),
            _cellBools,
            _cellReals,
            _stateBools,
            _stateCounters,
            _stateReals).Compile();

    private void CheckCellsAndSlots()
    {
        for (var index = 0; index < _model.Cells.Count; index++)
        {
            Require(_model.Cells[index].Index == index, $"cell '{_model.Cells[index].Name}' has index {_model.Cells[index].Index} at position {index}.");
        }

        foreach (var input in _model.Inputs)
        {
            RequireCell(input);
            Require(_model.Cells[input].Kind == CellKind.Input, $"cell '{_model.Cells[input].Name}' is listed as an input but is not of kind Input.");
            _computed[input] = true;
        }

        for (var index = 0; index < _model.StateSlots.Count; index++)
        {
            var slot = _model.StateSlots[index];
            Require(slot.Index == index, $"state slot '{slot.Name}' has index {slot.Index} at position {index}.");
            if (slot.Kind == StateSlotKind.PreviousValue)
            {
                RequireCell(slot.Cell);
                Require(_previousSlotOfCell[slot.Cell] < 0, $"cell '{_model.Cells[slot.Cell].Name}' has two previous-value slots.");
                Require(slot.Type == _model.Cells[slot.Cell].Type, $"previous-value slot '{slot.Name}' has another type than its cell.");
                _previousSlotOfCell[slot.Cell] = index;
            }
        }

        var written = new bool[_model.Cells.Count];
        foreach (var step in _model.Steps)
        {
            RequireCell(step.Target);
            Require(_model.Cells[step.Target].Kind != CellKind.Input, $"a step writes the input '{_model.Cells[step.Target].Name}'.");
            Require(!written[step.Target], $"cell '{_model.Cells[step.Target].Name}' is written by two steps.");
            written[step.Target] = true;
        }
    }

    private Expression CompileStep(ScanStep step)
    {
        var targetType = _model.Cells[step.Target].Type;
        return step switch
        {
            AssignStep assign => Store(step.Target, targetType, Typed(assign.Value, targetType)),
            TimerStep timer => Store(step.Target, SignalType.Bool, CompileTimer(timer)),
            EdgeStep edge => Store(step.Target, SignalType.Bool, Expression.Call(
                Method(edge.Kind == EdgeKind.Rising ? nameof(FunctionBlockLogic.RisingEdge) : nameof(FunctionBlockLogic.FallingEdge)),
                Typed(edge.Clock, SignalType.Bool),
                _stateBools,
                Expression.Constant(SlotPosition(edge.StateSlot, StateSlotKind.EdgeMemory)))),
            LatchStep latch => Store(step.Target, SignalType.Bool, Expression.Call(
                Method(latch.Kind == LatchKind.SetDominant ? nameof(FunctionBlockLogic.SetDominantLatch) : nameof(FunctionBlockLogic.ResetDominantLatch)),
                Typed(latch.Set, SignalType.Bool),
                Typed(latch.Reset, SignalType.Bool),
                _stateBools,
                Expression.Constant(SlotPosition(latch.StateSlot, StateSlotKind.LatchMemory)))),
            _ => throw new ArgumentException($"unknown step kind {step.GetType().Name}."),
        };
    }

    private MethodCallExpression CompileTimer(TimerStep timer)
    {
        var slot = SlotPosition(timer.StateSlot, StateSlotKind.TimerCounter);
        Require(timer.PresetScans >= 0, $"timer writing '{_model.Cells[timer.Target].Name}' has a negative preset.");
        Require(
            _model.StateSlots[timer.StateSlot].CounterMax == timer.PresetScans,
            $"timer writing '{_model.Cells[timer.Target].Name}' has preset {timer.PresetScans} but its counter slot counts to {_model.StateSlots[timer.StateSlot].CounterMax}.");
        var method = timer.Kind switch
        {
            TimerKind.OnDelay => nameof(FunctionBlockLogic.OnDelay),
            TimerKind.OffDelay => nameof(FunctionBlockLogic.OffDelay),
            _ => nameof(FunctionBlockLogic.Pulse),
        };
        return Expression.Call(
            Method(method),
            Typed(timer.Input, SignalType.Bool),
            _stateCounters,
            Expression.Constant(slot),
            Expression.Constant(timer.PresetScans));
    }

    private BinaryExpression Store(int cell, SignalType type, Expression value) =>
        Expression.Assign(
            Expression.ArrayAccess(type == SignalType.Bool ? _cellBools : _cellReals, Expression.Constant(cell)),
            value);

    private IEnumerable<Expression> SaveCurrentValues()
    {
        foreach (var slot in _model.StateSlots)
        {
            if (slot.Kind != StateSlotKind.PreviousValue)
            {
                continue;
            }

            Require(_computed[slot.Cell], $"previous-value slot '{slot.Name}' keeps cell '{_model.Cells[slot.Cell].Name}', which nothing writes.");
            var position = Expression.Constant(_layout.PositionOfSlot[slot.Index]);
            var cell = Expression.Constant(slot.Cell);
            yield return slot.Type == SignalType.Bool
                ? Expression.Assign(Expression.ArrayAccess(_stateBools, position), Expression.ArrayIndex(_cellBools, cell))
                : Expression.Assign(Expression.ArrayAccess(_stateReals, position), Expression.ArrayIndex(_cellReals, cell));
        }
    }

    private Expression Typed(ScanExpression expression, SignalType expected)
    {
        Require(expression.Type == expected, $"a {expected} value was expected but a {expression.GetType().Name} gives {expression.Type}.");
        return CompileExpression(expression);
    }

    private Expression CompileExpression(ScanExpression expression)
    {
        _nodes++;
        return expression switch
        {
            BoolConstantExpression constant => Expression.Constant(constant.Value),
            RealConstantExpression constant => Expression.Constant(constant.Value),
            CellReadExpression read => CompileRead(read),
            NotExpression not => Expression.Not(Typed(not.Operand, SignalType.Bool)),
            AndExpression and => Fold(and.Operands, Expression.AndAlso, true),
            OrExpression or => Fold(or.Operands, Expression.OrElse, false),
            XorExpression xor => Expression.NotEqual(Typed(xor.Left, SignalType.Bool), Typed(xor.Right, SignalType.Bool)),
            ImpliesExpression implies => Expression.OrElse(
                Expression.Not(Typed(implies.Left, SignalType.Bool)),
                Typed(implies.Right, SignalType.Bool)),
            CompareExpression compare => CompileCompare(compare),
            AddExpression add => Real(nameof(ExactArithmetic.Add), add.Left, add.Right),
            SubtractExpression subtract => Real(nameof(ExactArithmetic.Subtract), subtract.Left, subtract.Right),
            NegateExpression negate => Real(nameof(ExactArithmetic.Negate), negate.Operand),
            ScaleExpression scale => Expression.Call(
                typeof(ExactArithmetic).GetMethod(nameof(ExactArithmetic.Scale))!,
                Expression.Constant(scale.Factor),
                Typed(scale.Operand, SignalType.Real)),
            AbsExpression abs => Real(nameof(ExactArithmetic.Abs), abs.Operand),
            MinExpression min => Real(nameof(ExactArithmetic.Min), min.Left, min.Right),
            MaxExpression max => Real(nameof(ExactArithmetic.Max), max.Left, max.Right),
            _ => throw new ArgumentException($"unknown expression kind {expression.GetType().Name}."),
        };
    }

    private Expression CompileRead(CellReadExpression read)
    {
        RequireCell(read.Cell);
        var cell = _model.Cells[read.Cell];
        Require(cell.Type == read.CellType, $"a read of '{cell.Name}' has type {read.CellType} but the cell is {cell.Type}.");
        if (read.Timing == ReadTiming.Current)
        {
            Require(_computed[read.Cell], $"'{cell.Name}' is read in the current scan before the step that writes it.");
            return Expression.ArrayIndex(cell.Type == SignalType.Bool ? _cellBools : _cellReals, Expression.Constant(read.Cell));
        }

        var slot = _previousSlotOfCell[read.Cell];
        Require(slot >= 0, $"'{cell.Name}' is read from the previous scan but has no previous-value slot.");
        return Expression.ArrayIndex(
            cell.Type == SignalType.Bool ? _stateBools : _stateReals,
            Expression.Constant(_layout.PositionOfSlot[slot]));
    }

    private Expression Fold(IReadOnlyList<ScanExpression> operands, Func<Expression, Expression, BinaryExpression> combine, bool empty)
    {
        if (operands.Count == 0)
        {
            return Expression.Constant(empty);
        }

        var result = Typed(operands[0], SignalType.Bool);
        for (var i = 1; i < operands.Count; i++)
        {
            result = combine(result, Typed(operands[i], SignalType.Bool));
        }

        return result;
    }

    private Expression CompileCompare(CompareExpression compare)
    {
        var type = compare.Left.Type;
        var left = Typed(compare.Left, type);
        var right = Typed(compare.Right, type);
        if (type == SignalType.Bool)
        {
            return compare.Operator switch
            {
                CompareOperator.Equal => Expression.Equal(left, right),
                CompareOperator.NotEqual => Expression.NotEqual(left, right),
                _ => throw new ArgumentException($"bools compare only with = and <>, not {compare.Operator}."),
            };
        }

        var sign = Expression.Call(typeof(ExactArithmetic).GetMethod(nameof(ExactArithmetic.Compare))!, left, right);
        var zero = Expression.Constant(0);
        return compare.Operator switch
        {
            CompareOperator.Equal => Expression.Equal(sign, zero),
            CompareOperator.NotEqual => Expression.NotEqual(sign, zero),
            CompareOperator.Less => Expression.LessThan(sign, zero),
            CompareOperator.LessOrEqual => Expression.LessThanOrEqual(sign, zero),
            CompareOperator.Greater => Expression.GreaterThan(sign, zero),
            _ => Expression.GreaterThanOrEqual(sign, zero),
        };
    }

    private MethodCallExpression Real(string method, params ScanExpression[] operands) =>
        Expression.Call(
            typeof(ExactArithmetic).GetMethod(method)!,
            operands.Select(operand => Typed(operand, SignalType.Real)));

    private int SlotPosition(int slot, StateSlotKind expected)
    {
        Require((uint)slot < (uint)_model.StateSlots.Count, $"state slot {slot} does not exist.");
        Require(_model.StateSlots[slot].Kind == expected, $"state slot '{_model.StateSlots[slot].Name}' is {_model.StateSlots[slot].Kind}, expected {expected}.");
        Require(!_slotOwned[slot], $"state slot '{_model.StateSlots[slot].Name}' is the memory of two function blocks.");
        _slotOwned[slot] = true;
        return _layout.PositionOfSlot[slot];
    }

    private void RequireCell(int cell) =>
        Require((uint)cell < (uint)_model.Cells.Count, $"cell {cell} does not exist (the model has {_model.Cells.Count}).");

    private static MethodInfo Method(string name) =>
        typeof(FunctionBlockLogic).GetMethod(name, BindingFlags.Public | BindingFlags.Static)!;

    private static void Require(bool condition, string message)
    {
        if (!condition)
        {
            throw new ArgumentException($"inconsistent scan model: {message}");
        }
    }
}
