using LogicProof.Core.Text;
using LogicProof.Model.Scan;

namespace LogicProof.Proof.Tests.Support;

/// <summary>Builds small scan models by hand, steps in scan order, for tests that need exact control of the model.</summary>
internal sealed class HandModel
{
    private readonly List<Cell> _cells = [];
    private readonly List<int> _inputs = [];
    private readonly List<ScanStep> _steps = [];
    private readonly List<StateSlot> _slots = [];
    private readonly List<ModelProperty> _properties = [];
    private readonly List<ModelAssumption> _assumptions = [];
    private readonly Dictionary<int, int> _previousSlotOfCell = [];

    public int BoolInput(string name) => AddCell(name, CellKind.Input, isInput: true);

    public int Bool(string name) => AddCell(name, CellKind.Variable, isInput: false);

    public int Hidden(string name) => AddCell(name, CellKind.Hidden, isInput: false);

    public static ScanExpression Now(int cell) => new CellReadExpression(cell, ReadTiming.Current, SignalType.Bool);

    public ScanExpression Prev(int cell, PowerUp? powerUp = null)
    {
        if (!_previousSlotOfCell.ContainsKey(cell))
        {
            _previousSlotOfCell[cell] = AddSlot(
                StateSlotKind.PreviousValue, _cells[cell].Name + "@prev", powerUp ?? new KnownBoolPowerUp(false), cell, 0);
        }

        return new CellReadExpression(cell, ReadTiming.Previous, SignalType.Bool);
    }

    public static ScanExpression Not(ScanExpression operand) => new NotExpression(operand);

    public static ScanExpression And(params ScanExpression[] operands) => new AndExpression(operands);

    public static ScanExpression Or(params ScanExpression[] operands) => new OrExpression(operands);

    public static ScanExpression Implies(ScanExpression left, ScanExpression right) => new ImpliesExpression(left, right);

    public void Assign(int target, ScanExpression value) => _steps.Add(new AssignStep(target, value, Span(target)));

    public int Timer(TimerKind kind, int target, ScanExpression input, int presetScans)
    {
        var powerUp = new KnownCounterPowerUp(kind == TimerKind.OffDelay ? presetScans : 0);
        var slot = AddSlot(StateSlotKind.TimerCounter, _cells[target].Name + "@timer", powerUp, target, presetScans);
        _steps.Add(new TimerStep(kind, target, input, presetScans, slot, Span(target)));
        return slot;
    }

    public int Latch(LatchKind kind, int target, ScanExpression set, ScanExpression reset, PowerUp? powerUp = null)
    {
        var slot = AddSlot(StateSlotKind.LatchMemory, _cells[target].Name + "@latch", powerUp ?? new UnknownPowerUp(), target, 0);
        _steps.Add(new LatchStep(kind, target, set, reset, slot, Span(target)));
        return slot;
    }

    public int Edge(EdgeKind kind, int target, ScanExpression clock)
    {
        var slot = AddSlot(StateSlotKind.EdgeMemory, _cells[target].Name + "@edge", new KnownBoolPowerUp(false), target, 0);
        _steps.Add(new EdgeStep(kind, target, clock, slot, Span(target)));
        return slot;
    }

    public void Property(string name, int cell) =>
        _properties.Add(new ModelProperty(name, cell, PropertyOrigin.Requirement, Span(cell)));

    public void Assumption(int cell) => _assumptions.Add(new ModelAssumption(null, cell, Span(cell)));

    public ScanModel Build(decimal scanMilliseconds = 2m)
    {
        var writer = Enumerable.Repeat(-1, _cells.Count).ToArray();
        for (var s = 0; s < _steps.Count; s++)
        {
            writer[_steps[s].Target] = s;
        }

        return new ScanModel(
            "HAND",
            new ScanTiming(new Fractions.Fraction(50), new Fractions.Fraction(scanMilliseconds)),
            [.. _cells],
            [.. _inputs],
            [.. _steps],
            [.. _slots],
            [.. _properties],
            [.. _assumptions])
        {
            EquationStepCount = _steps.Count,
            WriterOfCell = writer,
        };
    }

    private static SourceSpan Span(int cell) => new("hand.lpl", cell, 1, cell + 1, 1);

    private int AddCell(string name, CellKind kind, bool isInput)
    {
        var index = _cells.Count;
        _cells.Add(new Cell(index, name, kind, SignalType.Bool, Span(index)));
        if (isInput)
        {
            _inputs.Add(index);
        }

        return index;
    }

    private int AddSlot(StateSlotKind kind, string name, PowerUp powerUp, int cell, int counterMax)
    {
        var index = _slots.Count;
        _slots.Add(new StateSlot(index, kind, name, powerUp) { Cell = cell, CounterMax = counterMax });
        return index;
    }
}
