namespace LogicProof.Model.Scan;

public enum StateSlotKind
{
    /// <summary>The value of <see cref="StateSlot.Cell"/> at the end of the previous scan (bool or real).</summary>
    PreviousValue,

    /// <summary>A timer's scan counter, an integer from 0 to <see cref="StateSlot.CounterMax"/>.</summary>
    TimerCounter,

    /// <summary>An edge detector's memory M (bool).</summary>
    EdgeMemory,

    /// <summary>A bistable's previous Q1 (bool).</summary>
    LatchMemory,
}

/// <summary>
/// One memory carried from scan to scan. The state of the model is exactly the vector of its slots; everything
/// else is recomputed from the state and the inputs every scan.
/// </summary>
public sealed record StateSlot(int Index, StateSlotKind Kind, string Name, PowerUp PowerUp)
{
    /// <summary>The cell whose previous value this is (PreviousValue), or the step's target cell (the others).</summary>
    public int Cell { get; init; }

    /// <summary>Bool or real for a PreviousValue slot; bool for edge and latch memories; not used for counters.</summary>
    public SignalType Type { get; init; } = SignalType.Bool;

    /// <summary>TimerCounter only: the preset in scans; the counter ranges over 0..CounterMax.</summary>
    public int CounterMax { get; init; }
}
