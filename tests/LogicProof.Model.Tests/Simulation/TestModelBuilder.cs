using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>Builds small <see cref="ScanModel"/>s by hand, step by step in scan order, for simulator tests.</summary>
internal sealed class TestModelBuilder
{
    private readonly List<Cell> _cells = [];
    private readonly List<int> _inputs = [];
    private readonly List<ScanStep> _steps = [];
    private readonly List<StateSlot> _slots = [];
    private readonly List<ModelProperty> _properties = [];
    private readonly List<ModelAssumption> _assumptions = [];
    private readonly Dictionary<int, int> _previousSlotOfCell = [];

    public int BoolInput(string name) => AddInput(name, SignalType.Bool, null);

    public int RealInput(string name, Fraction? low = null, Fraction? high = null) =>
        AddInput(name, SignalType.Real, low is { } l && high is { } h ? (l, h) : null);

    public int Bool(string name, bool isOutput = false) => AddCell(name, CellKind.Variable, SignalType.Bool, isOutput);

    public int Real(string name, bool isOutput = false) => AddCell(name, CellKind.Variable, SignalType.Real, isOutput);

    public int Hidden(string name, SignalType type = SignalType.Bool) => AddCell(name, CellKind.Hidden, type, false);

    public ScanExpression Now(int cell) => new CellReadExpression(cell, ReadTiming.Current, _cells[cell].Type);

    /// <summary>A read of the cell's previous value; the first read creates its PreviousValue slot.</summary>
    public ScanExpression Prev(int cell, PowerUp? powerUp = null)
    {
        if (!_previousSlotOfCell.ContainsKey(cell))
        {
            var type = _cells[cell].Type;
            powerUp ??= type == SignalType.Bool ? new KnownBoolPowerUp(false) : new KnownRealPowerUp(Fraction.Zero);
            _previousSlotOfCell[cell] = AddSlot(StateSlotKind.PreviousValue, _cells[cell].Name + "@prev", powerUp, cell, type, 0);
        }

        return new CellReadExpression(cell, ReadTiming.Previous, _cells[cell].Type);
    }

    public int PreviousSlotOf(int cell) => _previousSlotOfCell[cell];

    public void Assign(int target, ScanExpression value) => _steps.Add(new AssignStep(target, value, SourceSpan.None));

    public int Timer(TimerKind kind, int target, ScanExpression input, int presetScans)
    {
        var powerUp = new KnownCounterPowerUp(kind == TimerKind.OffDelay ? presetScans : 0);
        var slot = AddSlot(StateSlotKind.TimerCounter, _cells[target].Name + "@timer", powerUp, target, SignalType.Bool, presetScans);
        _steps.Add(new TimerStep(kind, target, input, presetScans, slot, SourceSpan.None));
        return slot;
    }

    public int Edge(EdgeKind kind, int target, ScanExpression clock)
    {
        var slot = AddSlot(StateSlotKind.EdgeMemory, _cells[target].Name + "@edge", new KnownBoolPowerUp(false), target, SignalType.Bool, 0);
        _steps.Add(new EdgeStep(kind, target, clock, slot, SourceSpan.None));
        return slot;
    }

    public int Latch(LatchKind kind, int target, ScanExpression set, ScanExpression reset, PowerUp? powerUp = null)
    {
        var slot = AddSlot(StateSlotKind.LatchMemory, _cells[target].Name + "@latch", powerUp ?? new UnknownPowerUp(), target, SignalType.Bool, 0);
        _steps.Add(new LatchStep(kind, target, set, reset, slot, SourceSpan.None));
        return slot;
    }

    public void Property(string name, int cell) => _properties.Add(new ModelProperty(name, cell, PropertyOrigin.Requirement, SourceSpan.None));

    public void Assumption(int cell) => _assumptions.Add(new ModelAssumption(null, cell, SourceSpan.None));

    public void AddStep(ScanStep step) => _steps.Add(step);

    public int AddRawSlot(StateSlot slot)
    {
        _slots.Add(slot);
        return slot.Index;
    }

    public ScanModel Build(decimal scanMilliseconds = 2m) => Build(new Fraction(scanMilliseconds));

    public ScanModel Build(Fraction scanMilliseconds) =>
        new(
            "TEST",
            new ScanTiming(new Fraction(60), scanMilliseconds),
            _cells.ToList(),
            _inputs.ToList(),
            _steps.ToList(),
            _slots.ToList(),
            _properties.ToList(),
            _assumptions.ToList())
        {
            EquationStepCount = _steps.Count,
            WriterOfCell = WriterOfCell(),
        };

    private int[] WriterOfCell()
    {
        var writers = Enumerable.Repeat(-1, _cells.Count).ToArray();
        for (var i = 0; i < _steps.Count; i++)
        {
            writers[_steps[i].Target] = i;
        }

        return writers;
    }

    private int AddInput(string name, SignalType type, (Fraction, Fraction)? range)
    {
        var cell = new Cell(_cells.Count, name, CellKind.Input, type, SourceSpan.None) { Range = range };
        _cells.Add(cell);
        _inputs.Add(cell.Index);
        return cell.Index;
    }

    private int AddCell(string name, CellKind kind, SignalType type, bool isOutput)
    {
        var cell = new Cell(_cells.Count, name, kind, type, SourceSpan.None) { IsOutput = isOutput };
        _cells.Add(cell);
        return cell.Index;
    }

    private int AddSlot(StateSlotKind kind, string name, PowerUp powerUp, int cell, SignalType type, int counterMax)
    {
        var slot = new StateSlot(_slots.Count, kind, name, powerUp) { Cell = cell, Type = type, CounterMax = counterMax };
        _slots.Add(slot);
        return slot.Index;
    }
}
