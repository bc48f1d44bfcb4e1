using LogicProof.Model.Scan;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// Time acceleration: one step of the encoding covers m &gt;= 1 scans, so that waiting out a long timer costs one
/// step instead of thousands.
/// <para>
/// Definition. Let (cells, s1) be one ordinary scan from state s under inputs i. The step may take m &gt; 1 only if
/// (a) every non-counter slot is at a fixpoint (s1 = s there), (b) every counter either stays (s1.c = s.c) or
/// advances by one (s1.c = s.c + 1), (c) at least one counter advances, and (d) every advancing counter c of a timer
/// with preset n has s.c + m &lt;= n. The state after the step is s with each advancing counter increased by m and
/// every other slot as after the ordinary scan (for m = 1 this is exactly the ordinary scan; for m &gt; 1 the other
/// slots equal s by (a)). m is also bounded by the largest preset, which keeps bit-vector sums from wrapping.
/// </para>
/// <para>
/// Why it is exact. Hold the inputs i for the m scans. Claim: at the j-th scan of the step (0 &lt;= j &lt; m) the state
/// is s with each advancing counter at s.c + j, every cell has the value it has in the first scan, and the scan
/// moves advancing counters to s.c + j + 1 and leaves every other slot unchanged. Cells read inputs (held), slots
/// (non-counters unchanged) and timer outputs; a timer's output depends on its counter only through the
/// comparisons c = 0 and c &lt; n, so it suffices that those do not change within the step:
/// TON advancing means IN and c &lt; n (Q = FALSE, c' = c + 1); with c + j &lt; n the same holds at every j.
/// TOF advancing means not IN and c &lt; n (Q = TRUE, c' = c + 1); same argument.
/// TP advancing means either idle (c = 0) with IN, giving Q = TRUE and c' = 1, or pulsing (0 &lt; c &lt; n), giving
/// Q = TRUE and c' = c + 1; for j &gt;= 1 the counter c + j is in 1..n-1 (by (d)), pulsing, so Q stays TRUE and the
/// counter keeps advancing by one whatever IN is.
/// A counter that stays keeps its value, so its timer sees the same IN and the same counter at every scan and stays
/// again. Hence every cell (including every property and assumption cell) has the same value at all m scans, the
/// non-counter slots keep their values by (a), and the states passed through are exactly those m ordinary scans
/// visit: nothing is added or lost. Properties and assumptions are therefore checked once per step.
/// </para>
/// </summary>
internal sealed class TimeAcceleration
{
    private readonly ScanEncoder _encoder;

    public TimeAcceleration(ScanEncoder encoder)
    {
        _encoder = encoder;
    }

    public SymbolicStep Encode(SymbolicScan scan, Expr stride)
    {
        var context = _encoder.Context;
        var counters = _encoder.Counters;
        var model = _encoder.Model;
        var start = scan.Start;
        var one = counters.Constant(1);

        var fixpoint = new List<BoolExpr>();
        var counterMoves = new List<BoolExpr>();
        var anyAdvances = new List<BoolExpr>();
        var next = new Expr[model.StateSlots.Count];
        foreach (var slot in model.StateSlots)
        {
            var before = start[slot.Index];
            var after = scan.Next[slot.Index];
            if (slot.Kind != StateSlotKind.TimerCounter)
            {
                fixpoint.Add(context.MkEq(after, before));
                next[slot.Index] = after;
                continue;
            }

            var advances = context.MkEq(after, counters.Add(before, one));
            var stays = context.MkEq(after, before);
            var preset = counters.Constant(_encoder.TimerOf(slot.Index).PresetScans);
            counterMoves.Add(context.MkOr(stays, advances));
            counterMoves.Add(context.MkImplies(advances, counters.LessOrEqual(counters.Add(before, stride), preset)));
            anyAdvances.Add(advances);
            next[slot.Index] = context.MkITE(advances, counters.Add(before, stride), after);
        }

        var longStep = counters.Less(one, stride);
        var allowed = context.MkAnd(
            counters.LessOrEqual(one, stride),
            counters.LessOrEqual(stride, counters.Constant(_encoder.LargestStride)),
            context.MkImplies(
                longStep,
                context.MkAnd(fixpoint.Concat(counterMoves).Append(context.MkOr(anyAdvances)))));
        return new SymbolicStep(scan, stride, allowed, new SymbolicState(next));
    }
}
