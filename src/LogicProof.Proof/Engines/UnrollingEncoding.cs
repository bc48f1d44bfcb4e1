using LogicProof.Proof.Encoding;

namespace LogicProof.Proof.Engines;

/// <summary>
/// The counter encoding for an unrolling. Measured here (Z3 4.8, bay-control schemes with 3 to 5 timers):
/// single-scan unrollings are much faster with bit-vectors (a counter only steps by one or resets, which bit-blasting
/// handles well: BMC to depth 200 in 91 s against over 120 s with Ints), but accelerated unrollings are much faster
/// with Ints (depth 15 in 1.9 s against 72 s with bit-vectors; 31 s against 0.5 s at depth 10 on another scheme),
/// because refuting a path then needs sums of free strides, which linear arithmetic reasons about directly.
/// </summary>
internal static class UnrollingEncoding
{
    public static CounterEncoding For(bool accelerate) => accelerate ? CounterEncoding.Integer : CounterEncoding.BitVector;
}
