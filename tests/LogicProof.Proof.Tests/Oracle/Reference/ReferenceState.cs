using Fractions;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// Everything the reference interpreter carries from one scan to the next: flags (bools), counts (elapsed scans of
/// timers and windows) and reals (last values of real variables and PREV of reals, kept in lowest terms). Two
/// states are equal when every memory is.
/// </summary>
internal sealed class ReferenceState(bool[] flags, int[] counts, Fraction[] reals) : IEquatable<ReferenceState>
{
    public bool[] Flags { get; } = flags;

    public int[] Counts { get; } = counts;

    public Fraction[] Reals { get; } = reals;

    public ReferenceState Copy() => new((bool[])Flags.Clone(), (int[])Counts.Clone(), (Fraction[])Reals.Clone());

    public bool Equals(ReferenceState? other) =>
        other is not null && Flags.AsSpan().SequenceEqual(other.Flags) && Counts.AsSpan().SequenceEqual(other.Counts)
        && Reals.AsSpan().SequenceEqual(other.Reals);

    public override bool Equals(object? obj) => Equals(obj as ReferenceState);

    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var flag in Flags)
        {
            hash.Add(flag);
        }

        foreach (var count in Counts)
        {
            hash.Add(count);
        }

        foreach (var real in Reals)
        {
            hash.Add(real);
        }

        return hash.ToHashCode();
    }
}
