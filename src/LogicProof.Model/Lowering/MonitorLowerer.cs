using LogicProof.Language.Binding;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Lowers past-time operators into monitor steps with their own memories (hidden cells <c>OWNER.KIND#n</c>):
/// <list type="bullet">
/// <item>PREV(e): the cell holds e; PREV reads its PreviousValue slot, power-up FALSE (0 for a real).</item>
/// <item>ROSE(e) = e AND NOT PREV(e); FELL(e) = NOT e AND PREV(e), over the same kind of cell.</item>
/// <item>ONCE(e): o := e OR last(o), power-up FALSE. HISTORICALLY(e): h := e AND last(h), power-up TRUE.</item>
/// <item>a SINCE b: s := b OR (a AND last(s)), power-up FALSE.</item>
/// <item>HELD(e, d): a TON on e with preset d. WITHIN(e, d): a TOF on e with preset d (expired at power-up).</item>
/// </list>
/// </summary>
internal sealed class MonitorLowerer(ModelAssembly model, ExpressionLowerer expressions)
{
    public ScanExpression LowerTemporal(BoundTemporal temporal)
    {
        var operand = expressions.Lower(temporal.Operand);
        var kindName = BoundTree.TemporalName(temporal.Operator);
        var name = expressions.NextInstanceName(kindName);
        var type = operand.Type;
        var cell = model.AddHiddenCell(name, type, temporal.Span);
        var now = new CellReadExpression(cell, ReadTiming.Current, type);
        switch (temporal.Operator)
        {
            case TemporalOperator.Prev:
                Assign(cell, operand, temporal);
                return LastScan(cell, MemoryPowerUpResolver.Default(type));
            case TemporalOperator.Rose:
                Assign(cell, operand, temporal);
                return new AndExpression([now, new NotExpression(LastScan(cell, new KnownBoolPowerUp(false)))]);
            case TemporalOperator.Fell:
                Assign(cell, operand, temporal);
                return new AndExpression([new NotExpression(now), LastScan(cell, new KnownBoolPowerUp(false))]);
            case TemporalOperator.Once:
                Assign(cell, new OrExpression([operand, LastScan(cell, new KnownBoolPowerUp(false))]), temporal);
                return now;
            case TemporalOperator.Historically:
                Assign(cell, new AndExpression([operand, LastScan(cell, new KnownBoolPowerUp(true))]), temporal);
                return now;
            case TemporalOperator.Held or TemporalOperator.Within:
                var window = temporal.Window
                    ?? throw new InvalidOperationException($"{kindName} without a duration at {temporal.Span}");
                var scans = expressions.Preset(window)?.Scans ?? 0;
                var kind = temporal.Operator == TemporalOperator.Held ? TimerKind.OnDelay : TimerKind.OffDelay;
                expressions.AddTimer(kind, cell, operand, scans, temporal.Span);
                return now;
            default:
                throw new InvalidOperationException($"unknown past-time operator {temporal.Operator}");
        }
    }

    public ScanExpression LowerSince(BoundBinary since)
    {
        var holding = expressions.Lower(since.Left);
        var start = expressions.Lower(since.Right);
        var cell = model.AddHiddenCell(expressions.NextInstanceName("SINCE"), SignalType.Bool, since.Span);
        var value = new OrExpression([start, new AndExpression([holding, LastScan(cell, new KnownBoolPowerUp(false))])]);
        model.AddStep(new AssignStep(cell, value, since.Span));
        return new CellReadExpression(cell, ReadTiming.Current, SignalType.Bool);
    }

    private void Assign(int cell, ScanExpression value, BoundTemporal source) =>
        model.AddStep(new AssignStep(cell, value, source.Span));

    private CellReadExpression LastScan(int cell, PowerUp powerUp)
    {
        model.PreviousSlot(cell, powerUp);
        return new CellReadExpression(cell, ReadTiming.Previous, model.Cells[cell].Type);
    }
}
