using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// Where each state slot of one model lives in a <see cref="ScanState"/>: bool memories (previous bool values, edge
/// and latch memories), timer counters and previous real values are packed into three dense arrays, so a state is
/// cheap to copy, compare and hash. Built once per model and shared by every state of it.
/// </summary>
internal sealed class ScanStateLayout
{
    public ScanStateLayout(IReadOnlyList<StateSlot> slots)
    {
        Slots = slots;
        PositionOfSlot = new int[slots.Count];
        StorageOfSlot = new SlotStorage[slots.Count];
        var bools = 0;
        var counters = 0;
        var reals = 0;
        for (var index = 0; index < slots.Count; index++)
        {
            var storage = StorageOf(slots[index]);
            StorageOfSlot[index] = storage;
            PositionOfSlot[index] = storage switch
            {
                SlotStorage.Bool => bools++,
                SlotStorage.Counter => counters++,
                _ => reals++,
            };
        }

        BoolCount = bools;
        CounterCount = counters;
        RealCount = reals;
    }

    public IReadOnlyList<StateSlot> Slots { get; }

    public int[] PositionOfSlot { get; }

    public SlotStorage[] StorageOfSlot { get; }

    public int BoolCount { get; }

    public int CounterCount { get; }

    public int RealCount { get; }

    private static SlotStorage StorageOf(StateSlot slot) => slot.Kind switch
    {
        StateSlotKind.TimerCounter => SlotStorage.Counter,
        StateSlotKind.PreviousValue when slot.Type == SignalType.Real => SlotStorage.Real,
        _ => SlotStorage.Bool,
    };
}

internal enum SlotStorage
{
    Bool,
    Counter,
    Real,
}
