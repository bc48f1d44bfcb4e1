using System.Globalization;
using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// The symbolic scan of a <see cref="ScanModel"/>: given a term for every state slot and every input at one step,
/// builds the term of every cell and of every next state slot, exactly as the model's documentation states
/// (steps in order, current and previous reads, IEC function blocks). Reals are Z3 Reals (exact rationals, linear
/// arithmetic); counters are bit-vectors or Ints (<see cref="CounterEncoding"/>) constrained to 0..CounterMax by
/// <see cref="StateRange"/>. One encoder belongs to one Z3 <see cref="Context"/> and is not thread-safe.
/// </summary>
public sealed class ScanEncoder
{
    private readonly Dictionary<int, int> _previousSlotOfCell = [];
    private readonly Dictionary<int, TimerStep> _timerOfSlot = [];
    private readonly FunctionBlockEncoder _blocks;
    private readonly TimeAcceleration _acceleration;
    private readonly LemmaEncoder _lemmas;

    public ScanEncoder(Context context, ScanModel model, CounterEncoding counterEncoding)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(model);
        Context = context;
        Model = model;
        IndexSlots();
        var largest = model.StateSlots
            .Where(s => s.Kind == StateSlotKind.TimerCounter)
            .Select(s => (long)Math.Max(s.CounterMax, _timerOfSlot[s.Index].PresetScans))
            .DefaultIfEmpty(1)
            .Max();
        Counters = new CounterArithmetic(context, counterEncoding, largest);
        LargestStride = Math.Max(1, largest);
        _blocks = new FunctionBlockEncoder(context, Counters);
        _acceleration = new TimeAcceleration(this);
        _lemmas = new LemmaEncoder(this);
    }

    public Context Context { get; }

    public ScanModel Model { get; }

    public CounterEncoding CounterEncoding => Counters.Encoding;

    /// <summary>The sort of counter slots and strides: a bit-vector sort or Int.</summary>
    public Sort CounterSort => Counters.Sort;

    /// <summary>The largest stride an accelerated step can take (the largest timer preset, at least 1).</summary>
    public long LargestStride { get; }

    internal CounterArithmetic Counters { get; }

    public Sort SlotSort(int slot)
    {
        var s = Model.StateSlots[slot];
        return s.Kind switch
        {
            StateSlotKind.TimerCounter => Counters.Sort,
            StateSlotKind.PreviousValue when s.Type == SignalType.Real => Context.RealSort,
            _ => Context.BoolSort,
        };
    }

    public Sort CellSort(int cell) => Model.Cells[cell].Type == SignalType.Real ? Context.RealSort : Context.BoolSort;

    /// <summary>Fresh constants for every slot, named <c>prefix.slotName</c>.</summary>
    public SymbolicState NewState(string prefix) =>
        new(Model.StateSlots.Select(s => Context.MkConst(string.Create(CultureInfo.InvariantCulture, $"{prefix}.{s.Name}#{s.Index}"), SlotSort(s.Index))).ToArray());

    /// <summary>Fresh constants for every input cell, named <c>prefix.cellName</c>.</summary>
    public SymbolicInputs NewInputs(string prefix) =>
        new(Model.Inputs.ToDictionary(c => c, c => Context.MkConst(string.Create(CultureInfo.InvariantCulture, $"{prefix}.{Model.Cells[c].Name}#{c}"), CellSort(c))));

    /// <summary>A fresh stride term (counter sort); constrain it with <see cref="SymbolicStep.Allowed"/>.</summary>
    public Expr NewStride(string name) => Counters.Fresh(name);

    public Expr CounterConstant(long value) => Counters.Constant(value);

    /// <summary>Every slot with a known power-up value takes it; Unknown slots stay free.</summary>
    public BoolExpr InitialCondition(SymbolicState state)
    {
        var terms = new List<BoolExpr>();
        foreach (var slot in Model.StateSlots)
        {
            Expr? value = slot.PowerUp switch
            {
                KnownBoolPowerUp b => Context.MkBool(b.Value),
                KnownRealPowerUp r => RealTerms.Constant(Context, r.Value),
                KnownCounterPowerUp c => Counters.Constant(c.Value),
                UnknownPowerUp => null,
                _ => throw new InvalidOperationException($"Unknown power-up kind for slot '{slot.Name}'."),
            };
            if (value is not null)
            {
                terms.Add(Context.MkEq(state[slot.Index], value));
            }
        }

        return Context.MkAnd(terms);
    }

    /// <summary>Every counter within 0..CounterMax (bit-vectors are unsigned, so only the upper end is needed).</summary>
    public BoolExpr StateRange(SymbolicState state)
    {
        var terms = new List<BoolExpr>();
        foreach (var slot in Model.StateSlots.Where(s => s.Kind == StateSlotKind.TimerCounter))
        {
            terms.Add(Counters.LessOrEqual(state[slot.Index], Counters.Constant(CounterMax(slot.Index))));
            if (CounterEncoding == CounterEncoding.Integer)
            {
                terms.Add(Counters.LessOrEqual(Counters.Constant(0), state[slot.Index]));
            }
        }

        return Context.MkAnd(terms);
    }

    /// <summary>Every real input within its declared range, both ends included.</summary>
    public BoolExpr InputRange(SymbolicInputs inputs)
    {
        var terms = new List<BoolExpr>();
        foreach (var cell in Model.Inputs)
        {
            if (Model.Cells[cell].Range is { } range)
            {
                var value = (ArithExpr)inputs[cell];
                terms.Add(Context.MkLe(RealTerms.Constant(Context, range.Low), value));
                terms.Add(Context.MkLe(value, RealTerms.Constant(Context, range.High)));
            }
        }

        return Context.MkAnd(terms);
    }

    /// <summary>One ordinary scan from <paramref name="start"/> under <paramref name="inputs"/>.</summary>
    public SymbolicScan EncodeScan(SymbolicState start, SymbolicInputs inputs)
    {
        var cells = new Expr?[Model.Cells.Count];
        foreach (var cell in Model.Inputs)
        {
            cells[cell] = inputs[cell];
        }

        var next = new Expr?[Model.StateSlots.Count];
        var expressions = new ScanExpressionEncoder(
            Context,
            cell => cells[cell] ?? throw new InvalidOperationException(
                $"Cell '{Model.Cells[cell].Name}' is read in this scan before the step that writes it has run."),
            cell => start[PreviousSlot(cell)]);
        foreach (var step in Model.Steps)
        {
            switch (step)
            {
                case AssignStep assign:
                    cells[assign.Target] = expressions.Encode(assign.Value);
                    break;
                case TimerStep timer:
                    var (timerOutput, nextCounter) = _blocks.Timer(
                        timer.Kind, expressions.Bool(timer.Input), start[timer.StateSlot], timer.PresetScans);
                    cells[timer.Target] = timerOutput;
                    next[timer.StateSlot] = nextCounter;
                    break;
                case EdgeStep edge:
                    var (edgeOutput, nextMemory) = _blocks.Edge(
                        edge.Kind, expressions.Bool(edge.Clock), (BoolExpr)start[edge.StateSlot]);
                    cells[edge.Target] = edgeOutput;
                    next[edge.StateSlot] = nextMemory;
                    break;
                case LatchStep latch:
                    var latchOutput = _blocks.Latch(
                        latch.Kind, expressions.Bool(latch.Set), expressions.Bool(latch.Reset), (BoolExpr)start[latch.StateSlot]);
                    cells[latch.Target] = latchOutput;
                    next[latch.StateSlot] = latchOutput;
                    break;
                default:
                    throw new InvalidOperationException($"Unsupported scan step {step.GetType().Name}.");
            }
        }

        foreach (var slot in Model.StateSlots.Where(s => s.Kind == StateSlotKind.PreviousValue))
        {
            next[slot.Index] = cells[slot.Cell] ?? throw new InvalidOperationException(
                $"Slot '{slot.Name}' keeps the previous value of cell '{Model.Cells[slot.Cell].Name}', which no step writes.");
        }

        var nextSlots = next.Select((term, i) => term ?? throw new InvalidOperationException(
            $"State slot '{Model.StateSlots[i].Name}' is not written by any step.")).ToArray();
        return new SymbolicScan(start, inputs, cells, new SymbolicState(nextSlots));
    }

    /// <summary>
    /// A step of <paramref name="stride"/> scans (see <see cref="TimeAcceleration"/> for when a stride above 1 is
    /// allowed and why it is exact). Pass <c>null</c> for an ordinary scan (acceleration off).
    /// </summary>
    public SymbolicStep EncodeStep(SymbolicState start, SymbolicInputs inputs, Expr? stride)
    {
        var scan = EncodeScan(start, inputs);
        return stride is null
            ? new SymbolicStep(scan, Counters.Constant(1), Context.MkTrue(), scan.Next)
            : _acceleration.Encode(scan, stride);
    }

    public BoolExpr StatesEqual(SymbolicState left, SymbolicState right) =>
        Context.MkAnd(Model.StateSlots.Select(s => Context.MkEq(left[s.Index], right[s.Index])));

    /// <summary>Every assumption of the model holds in this scan.</summary>
    public BoolExpr AssumptionsHold(SymbolicScan scan) =>
        Context.MkAnd(Model.Assumptions.Select(a => scan.BoolCell(a.Cell)));

    /// <summary>A lemma over the slots of <paramref name="state"/>.</summary>
    public BoolExpr EncodeLemma(Lemma lemma, SymbolicState state) => _lemmas.Encode(lemma.Expression, state);

    /// <summary>The upper end of a counter slot's range.</summary>
    public int CounterMax(int slot) => Math.Max(Model.StateSlots[slot].CounterMax, TimerOf(slot).PresetScans);

    internal TimerStep TimerOf(int slot) => _timerOfSlot.TryGetValue(slot, out var timer)
        ? timer
        : throw new InvalidOperationException($"Slot '{Model.StateSlots[slot].Name}' is not a timer counter.");

    internal int PreviousSlot(int cell) => _previousSlotOfCell.TryGetValue(cell, out var slot)
        ? slot
        : throw new InvalidOperationException(
            $"Cell '{Model.Cells[cell].Name}' is read from the previous scan but has no previous-value slot.");

    private void IndexSlots()
    {
        foreach (var slot in Model.StateSlots)
        {
            if (slot.Index < 0 || slot.Index >= Model.StateSlots.Count || Model.StateSlots[slot.Index] != slot)
            {
                throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"State slot '{slot.Name}' has index {slot.Index} out of place."));
            }

            if (slot.Kind == StateSlotKind.PreviousValue)
            {
                _previousSlotOfCell[slot.Cell] = slot.Index;
            }
        }

        foreach (var timer in Model.Steps.OfType<TimerStep>())
        {
            if (Model.StateSlots[timer.StateSlot].Kind != StateSlotKind.TimerCounter)
            {
                throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"Timer writing cell {timer.Target} does not use a counter slot."));
            }

            _timerOfSlot[timer.StateSlot] = timer;
        }

        foreach (var slot in Model.StateSlots.Where(s => s.Kind == StateSlotKind.TimerCounter))
        {
            if (!_timerOfSlot.ContainsKey(slot.Index))
            {
                throw new InvalidOperationException($"Counter slot '{slot.Name}' belongs to no timer step.");
            }
        }
    }
}
