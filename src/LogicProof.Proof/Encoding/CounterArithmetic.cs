using System.Numerics;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// Counter terms as unsigned bit-vectors or as integers. The bit-vector width leaves room for twice the largest
/// counter value, so <c>c + m</c> with c and m both at most that value never wraps.
/// </summary>
internal sealed class CounterArithmetic
{
    private readonly Context _context;
    private readonly Dictionary<long, Expr> _constants = [];

    public CounterArithmetic(Context context, CounterEncoding encoding, long largestValue)
    {
        _context = context;
        Encoding = encoding;
        if (encoding == CounterEncoding.BitVector)
        {
            Width = (uint)BitsFor((2 * Math.Max(largestValue, 1)) + 2) + 1;
            Sort = context.MkBitVecSort(Width);
        }
        else
        {
            Sort = context.IntSort;
        }
    }

    public CounterEncoding Encoding { get; }

    public uint Width { get; }

    public Sort Sort { get; }

    public Expr Constant(long value)
    {
        if (!_constants.TryGetValue(value, out var term))
        {
            term = Encoding == CounterEncoding.BitVector
                ? _context.MkBV((ulong)value, Width)
                : _context.MkInt(value);
            _constants[value] = term;
        }

        return term;
    }

    public Expr Fresh(string name) => _context.MkConst(name, Sort);

    public Expr Add(Expr left, Expr right) => Encoding == CounterEncoding.BitVector
        ? _context.MkBVAdd((BitVecExpr)left, (BitVecExpr)right)
        : _context.MkAdd((IntExpr)left, (IntExpr)right);

    public BoolExpr LessOrEqual(Expr left, Expr right) => Encoding == CounterEncoding.BitVector
        ? _context.MkBVULE((BitVecExpr)left, (BitVecExpr)right)
        : _context.MkLe((IntExpr)left, (IntExpr)right);

    public BoolExpr Less(Expr left, Expr right) => Encoding == CounterEncoding.BitVector
        ? _context.MkBVULT((BitVecExpr)left, (BitVecExpr)right)
        : _context.MkLt((IntExpr)left, (IntExpr)right);

    /// <summary>The counter as an Int term (for lemmas and sums that must not wrap).</summary>
    public IntExpr ToInteger(Expr counter) => Encoding == CounterEncoding.BitVector
        ? _context.MkBV2Int((BitVecExpr)counter, false)
        : (IntExpr)counter;

    /// <summary>The value of an evaluated counter term (a numeral from a model).</summary>
    public static BigInteger ReadNumeral(Expr numeral) => numeral switch
    {
        BitVecNum bits => bits.BigInteger,
        IntNum integer => integer.BigInteger,
        _ => throw new InvalidOperationException($"Expected a counter numeral, got '{numeral}'."),
    };

    private static int BitsFor(long value)
    {
        var bits = 1;
        while ((1L << bits) <= value)
        {
            bits++;
        }

        return bits;
    }
}
