namespace LogicProof.Proof.Encoding;

/// <summary>
/// How timer counters and the stride of an accelerated step are represented in the solver. Bit-vectors are much
/// faster for incremental unrolling (BMC, k-induction); integers suit Horn-clause engines (Spacer), whose
/// interpolation works over linear arithmetic. Either way a counter is constrained to 0..CounterMax.
/// </summary>
public enum CounterEncoding
{
    BitVector,
    Integer,
}
