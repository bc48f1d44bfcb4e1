using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// One solver term per state slot (indexed like <c>ScanModel.StateSlots</c>): a Bool for bool previous values,
/// edge and latch memories, a Real for real previous values, and a counter term (bit-vector or Int, see
/// <see cref="CounterEncoding"/>) for timer counters.
/// </summary>
public sealed class SymbolicState
{
    public SymbolicState(IReadOnlyList<Expr> slots)
    {
        Slots = slots;
    }

    public IReadOnlyList<Expr> Slots { get; }

    public Expr this[int slot] => Slots[slot];
}
