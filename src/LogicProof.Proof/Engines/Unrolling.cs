using System.Globalization;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Lemmas;
using Microsoft.Z3;

namespace LogicProof.Proof.Engines;

/// <summary>
/// A path of steps in one incremental solver: states s0, s1, ... (fresh constants), and for each step k its inputs,
/// stride, cells and the transition to s(k+1). The first state is either the power-up state (known slots fixed,
/// unknown ones free) or an arbitrary state within range (induction). Each step's assumptions are asserted when the
/// step is added, and the transition out of a step when the next one is added, so a query about step k must be made
/// before step k+1 is added: a trace that ends at step k is never cut by a later step's assumptions.
/// Lemmas are asserted at every state.
/// </summary>
internal sealed class Unrolling
{
    /// <summary>Bits added to the counter width for sums of strides: room for a million steps of the largest stride.</summary>
    private const uint ElapsedHeadroomBits = 20;

    private readonly List<SymbolicState> _states = [];
    private readonly List<SymbolicStep> _steps = [];
    private readonly string _name;
    private readonly bool _accelerate;
    private readonly IReadOnlyList<Lemma> _lemmas;
    private readonly List<Expr> _scansBefore = [];
    private bool _trackScans;
    private int _literalCount;

    public Unrolling(ScanEncoder encoder, Solver solver, string name, bool fromPowerUp, bool accelerate, IReadOnlyList<Lemma> lemmas)
    {
        Encoder = encoder;
        Solver = solver;
        _name = name;
        _accelerate = accelerate;
        _lemmas = lemmas;
        var first = NewState(0);
        if (fromPowerUp)
        {
            solver.Add(encoder.InitialCondition(first));
        }
    }

    public ScanEncoder Encoder { get; }

    public Solver Solver { get; }

    public Context Context => Encoder.Context;

    /// <summary>The number of steps added.</summary>
    public int Count => _steps.Count;

    public bool Accelerated => _accelerate;

    public IReadOnlyList<SymbolicState> States => _states;

    public SymbolicStep Step(int index) => _steps[index];

    public SymbolicState State(int index) => _states[index];

    public BoolExpr CellAt(int step, int cell) => _steps[step].Scan.BoolCell(cell);

    /// <summary>Adds step <see cref="Count"/>: its inputs within range, its stride, its assumptions.</summary>
    public SymbolicStep AddStep()
    {
        var k = _steps.Count;
        if (k > 0)
        {
            var next = NewState(k);
            Solver.Add(Encoder.StatesEqual(next, _steps[k - 1].Next));
            if (_trackScans)
            {
                TrackScans(k);
            }
        }

        var inputs = Encoder.NewInputs(string.Create(CultureInfo.InvariantCulture, $"{_name}.i{k}"));
        var stride = _accelerate ? Encoder.NewStride(string.Create(CultureInfo.InvariantCulture, $"{_name}.m{k}")) : null;
        var step = Encoder.EncodeStep(_states[k], inputs, stride);
        Solver.Add(Encoder.InputRange(inputs));
        Solver.Add(step.Allowed);
        Solver.Add(Encoder.AssumptionsHold(step.Scan));
        _steps.Add(step);
        return step;
    }

    /// <summary>A fresh literal that, when passed as an assumption, makes <paramref name="condition"/> hold.</summary>
    public BoolExpr Guard(BoolExpr condition, string purpose)
    {
        var literal = Context.MkBoolConst(string.Create(
            CultureInfo.InvariantCulture, $"{_name}.{purpose}#{_literalCount++}"));
        Solver.Add(Context.MkImplies(literal, condition));
        return literal;
    }

    /// <summary>
    /// "The strides of the steps before <paramref name="step"/> add up to at most b", as a function of b. The first
    /// call starts tracking the scans elapsed before every state, E(i), with the facts c(i) &lt;= c(0) + E(i) for every
    /// counter: true on every path (a counter grows by at most the stride per step), they let the solver refute
    /// "too few scans" queries without rediscovering that chain of additions through bit-blasted adders.
    /// </summary>
    public Func<long, BoolExpr> ScansBeforeAtMost(int step)
    {
        if (!_trackScans)
        {
            _trackScans = true;
            for (var i = 0; i < _states.Count; i++)
            {
                TrackScans(i);
            }
        }

        var elapsed = _scansBefore[step];
        if (elapsed is BitVecExpr bits)
        {
            return bound => Context.MkBVULE(bits, Context.MkBV((ulong)bound, bits.SortSize));
        }

        return bound => Context.MkLe((IntExpr)elapsed, Context.MkInt(bound));
    }

    private void TrackScans(int state)
    {
        var counters = Encoder.Model.StateSlots.Where(s => s.Kind == Model.Scan.StateSlotKind.TimerCounter).Select(s => s.Index);
        if (Encoder.CounterSort is BitVecSort sort)
        {
            var headroom = ElapsedHeadroomBits;
            BitVecExpr elapsed = state == 0
                ? Context.MkBV(0, sort.Size + headroom)
                : Context.MkBVAdd((BitVecExpr)_scansBefore[state - 1], Context.MkZeroExt(headroom, (BitVecExpr)_steps[state - 1].Stride));
            _scansBefore.Add(elapsed);
            foreach (var counter in counters)
            {
                var now = Context.MkZeroExt(headroom, (BitVecExpr)_states[state][counter]);
                var atStart = Context.MkZeroExt(headroom, (BitVecExpr)_states[0][counter]);
                Solver.Add(Context.MkBVULE(now, Context.MkBVAdd(atStart, elapsed)));
            }
        }
        else
        {
            _scansBefore.Add(state == 0
                ? Context.MkInt(0)
                : Context.MkAdd((IntExpr)_scansBefore[state - 1], (IntExpr)_steps[state - 1].Stride));
        }
    }

    private SymbolicState NewState(int index)
    {
        var state = Encoder.NewState(string.Create(CultureInfo.InvariantCulture, $"{_name}.s{index}"));
        Solver.Add(Encoder.StateRange(state));
        foreach (var lemma in _lemmas)
        {
            Solver.Add(Encoder.EncodeLemma(lemma, state));
        }

        _states.Add(state);
        return state;
    }
}
