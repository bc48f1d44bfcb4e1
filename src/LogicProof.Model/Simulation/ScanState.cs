using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// The full state of a model between two scans: one value per <see cref="StateSlot"/>, addressed by the slot's
/// index. Everything else a scan computes follows from this state and the scan's inputs, so two equal states
/// behave identically under equal inputs. <see cref="Equals(ScanState?)"/> and <see cref="GetHashCode"/> compare
/// the values (not the instance), which lets an explicit-state explorer keep visited states in a hash set.
/// A state belongs to the simulator that created it; states of different models never compare equal.
/// </summary>
public sealed class ScanState : IEquatable<ScanState>
{
    internal ScanState(ScanStateLayout layout)
    {
        Layout = layout;
        Bools = new bool[layout.BoolCount];
        Counters = new int[layout.CounterCount];
        Reals = new Fraction[layout.RealCount];
        Array.Fill(Reals, Fraction.Zero);
    }

    private ScanState(ScanState source)
    {
        Layout = source.Layout;
        Bools = (bool[])source.Bools.Clone();
        Counters = (int[])source.Counters.Clone();
        Reals = (Fraction[])source.Reals.Clone();
    }

    internal ScanStateLayout Layout { get; }

    internal bool[] Bools { get; }

    internal int[] Counters { get; }

    internal Fraction[] Reals { get; }

    /// <summary>A bool slot: a previous bool value, an edge memory M or a latch memory (previous Q1).</summary>
    public bool GetBool(int slot) => Bools[Position(slot, SlotStorage.Bool)];

    public void SetBool(int slot, bool value) => Bools[Position(slot, SlotStorage.Bool)] = value;

    /// <summary>A timer's scan counter, 0 to the slot's <see cref="StateSlot.CounterMax"/>.</summary>
    public int GetCounter(int slot) => Counters[Position(slot, SlotStorage.Counter)];

    public void SetCounter(int slot, int value)
    {
        var max = Layout.Slots[slot].CounterMax;
        if (value < 0 || value > max)
        {
            throw new ArgumentOutOfRangeException(
                nameof(value), value, $"timer counter '{Layout.Slots[slot].Name}' ranges over 0..{max}.");
        }

        Counters[Position(slot, SlotStorage.Counter)] = value;
    }

    /// <summary>A previous real value.</summary>
    public Fraction GetReal(int slot) => Reals[Position(slot, SlotStorage.Real)];

    public void SetReal(int slot, Fraction value) => Reals[Position(slot, SlotStorage.Real)] = value;

    public ScanState Clone() => new(this);

    /// <summary>Overwrites this state with another state of the same model, without allocating.</summary>
    public void CopyFrom(ScanState other)
    {
        RequireSameModel(other);
        other.Bools.CopyTo(Bools, 0);
        other.Counters.CopyTo(Counters, 0);
        other.Reals.CopyTo(Reals, 0);
    }

    public bool Equals(ScanState? other)
    {
        if (other is null || !ReferenceEquals(Layout, other.Layout))
        {
            return false;
        }

        if (!Bools.AsSpan().SequenceEqual(other.Bools) || !Counters.AsSpan().SequenceEqual(other.Counters))
        {
            return false;
        }

        for (var i = 0; i < Reals.Length; i++)
        {
            if (Reals[i].CompareTo(other.Reals[i]) != 0)
            {
                return false;
            }
        }

        return true;
    }

    public override bool Equals(object? obj) => obj is ScanState other && Equals(other);

    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.AddBytes(System.Runtime.InteropServices.MemoryMarshal.AsBytes(Bools.AsSpan()));
        hash.AddBytes(System.Runtime.InteropServices.MemoryMarshal.AsBytes(Counters.AsSpan()));
        foreach (var real in Reals)
        {
            hash.Add(real.GetHashCode());
        }

        return hash.ToHashCode();
    }

    private void RequireSameModel(ScanState other)
    {
        if (!ReferenceEquals(Layout, other.Layout))
        {
            throw new ArgumentException("the two states belong to different simulators.", nameof(other));
        }
    }

    private int Position(int slot, SlotStorage expected)
    {
        if ((uint)slot >= (uint)Layout.Slots.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(slot), slot, $"the model has {Layout.Slots.Count} state slots.");
        }

        if (Layout.StorageOfSlot[slot] != expected)
        {
            throw new ArgumentException(
                $"state slot {slot} ('{Layout.Slots[slot].Name}') holds a {Layout.StorageOfSlot[slot].ToString().ToLowerInvariant()}, not a {expected.ToString().ToLowerInvariant()}.",
                nameof(slot));
        }

        return Layout.PositionOfSlot[slot];
    }
}
