using LogicProof.Model.Scan;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// The IEC 61131-3 function blocks of the scan model, exactly as documented on <see cref="TimerStep"/>,
/// <see cref="EdgeStep"/> and <see cref="LatchStep"/>: each gives the block's output in this scan and its memory
/// at the end of the scan.
/// </summary>
internal sealed class FunctionBlockEncoder
{
    private readonly Context _context;
    private readonly CounterArithmetic _counters;

    public FunctionBlockEncoder(Context context, CounterArithmetic counters)
    {
        _context = context;
        _counters = counters;
    }

    public (BoolExpr Output, Expr NextCounter) Timer(TimerKind kind, BoolExpr input, Expr counter, int preset)
    {
        var zero = _counters.Constant(0);
        var one = _counters.Constant(1);
        var n = _counters.Constant(preset);
        var belowPreset = _counters.Less(counter, n);

        // min(c + 1, n) for every c, not only for c within range.
        var countedUp = _context.MkITE(belowPreset, _counters.Add(counter, one), n);
        switch (kind)
        {
            case TimerKind.OnDelay:
                return (_context.MkAnd(input, _context.MkNot(belowPreset)), _context.MkITE(input, countedUp, zero));
            case TimerKind.OffDelay:
                return (_context.MkOr(input, belowPreset), _context.MkITE(input, zero, countedUp));
            case TimerKind.Pulse:
                if (preset == 0)
                {
                    return (_context.MkFalse(), zero);
                }

                var idle = _context.MkEq(counter, zero);
                var output = (BoolExpr)_context.MkITE(idle, input, belowPreset);
                var next = _context.MkITE(
                    idle,
                    _context.MkITE(input, one, zero),
                    _context.MkITE(belowPreset, _counters.Add(counter, one), _context.MkITE(input, n, zero)));
                return (output, next);
            default:
                throw new InvalidOperationException($"Unknown timer kind {kind}.");
        }
    }

    public (BoolExpr Output, BoolExpr NextMemory) Edge(EdgeKind kind, BoolExpr clock, BoolExpr memory)
    {
        var watched = kind == EdgeKind.Rising ? clock : _context.MkNot(clock);
        return (_context.MkAnd(watched, _context.MkNot(memory)), watched);
    }

    public BoolExpr Latch(LatchKind kind, BoolExpr set, BoolExpr reset, BoolExpr previous) => kind switch
    {
        LatchKind.SetDominant => _context.MkOr(set, _context.MkAnd(_context.MkNot(reset), previous)),
        LatchKind.ResetDominant => _context.MkAnd(_context.MkNot(reset), _context.MkOr(set, previous)),
        _ => throw new InvalidOperationException($"Unknown latch kind {kind}."),
    };
}
