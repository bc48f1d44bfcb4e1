using LogicProof.Core.Text;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// The growing parts of a scan model while it is lowered: cells with unique names, steps, state slots. Indexes are
/// handed out in creation order and never change.
/// </summary>
internal sealed class ModelAssembly
{
    private readonly Dictionary<string, int> _cellByName;
    private readonly List<int> _previousSlotOfCell;

    /// <param name="expectedCells">A capacity hint, so big schemes do not regrow the tables many times.</param>
    public ModelAssembly(int expectedCells)
    {
        _cellByName = new Dictionary<string, int>(expectedCells, StringComparer.OrdinalIgnoreCase);
        _previousSlotOfCell = new List<int>(expectedCells);
        Cells = new List<Cell>(expectedCells);
        Steps = new List<ScanStep>(expectedCells);
    }

    public List<Cell> Cells { get; }

    public List<ScanStep> Steps { get; }

    public List<StateSlot> Slots { get; } = [];

    public List<PresetRounding> Roundings { get; } = [];

    /// <summary>Adds a declared input or variable; its index must be the next one and its name free.</summary>
    public int AddDeclaredCell(Cell cell)
    {
        if (cell.Index != Cells.Count || !_cellByName.TryAdd(cell.Name, cell.Index))
        {
            throw new InvalidOperationException($"declared cell '{cell.Name}' is out of order or declared twice");
        }

        Cells.Add(cell);
        _previousSlotOfCell.Add(-1);
        return cell.Index;
    }

    /// <summary>Adds a hidden cell under <paramref name="name"/>, or a unique variant of it when taken.</summary>
    public int AddHiddenCell(string name, SignalType type, SourceSpan span)
    {
        var index = Cells.Count;
        var unique = HiddenNames.Unique(name, _cellByName);
        Cells.Add(new Cell(index, unique, CellKind.Hidden, type, span));
        _cellByName.Add(unique, index);
        _previousSlotOfCell.Add(-1);
        return index;
    }

    public void AddStep(ScanStep step) => Steps.Add(step);

    /// <summary>Adds a state slot; <see cref="StateSlot.Cell"/> is the step's target (or the cell it remembers).</summary>
    public int AddSlot(StateSlotKind kind, string name, PowerUp powerUp, int cell, int counterMax = 0)
    {
        var index = Slots.Count;
        Slots.Add(new StateSlot(index, kind, name, powerUp) { Cell = cell, Type = Cells[cell].Type, CounterMax = counterMax });
        return index;
    }

    /// <summary>The PreviousValue slot of a cell, created with <paramref name="powerUp"/> on first use.</summary>
    public int PreviousSlot(int cell, PowerUp powerUp)
    {
        var existing = _previousSlotOfCell[cell];
        if (existing >= 0)
        {
            return existing;
        }

        var slot = AddSlot(StateSlotKind.PreviousValue, Cells[cell].Name + "@last", powerUp, cell);
        _previousSlotOfCell[cell] = slot;
        return slot;
    }

    public int PreviousSlotOrNone(int cell) => _previousSlotOfCell[cell];

    public void SetPowerUp(int slot, PowerUp powerUp) => Slots[slot] = Slots[slot] with { PowerUp = powerUp };
}
