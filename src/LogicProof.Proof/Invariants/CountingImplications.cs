using LogicProof.Model.Scan;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Engines;
using Microsoft.Z3;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Decides, for two timers of the same kind, whether one counts whenever the other does in a scan whose assumptions
/// hold, from any state: a TON counts while its input is TRUE, a TOF while it is FALSE. Only pairs whose inputs read
/// a common cell (directly, or through the equation of a cell they read) are asked, at most <c>maxQueries</c> of
/// them; an unanswered query counts as "no". The solver is set up at the first query (most small models have none).
/// </summary>
internal sealed class CountingImplications : IDisposable
{
    private readonly SolverSession _session;
    private readonly ScanEncoder _encoder;
    private readonly ScanModel _model;
    private Solver? _solver;
    private ScanExpressionEncoder? _expressions;
    private int _queriesLeft;
    private int _literals;

    public CountingImplications(SolverSession session, ScanEncoder encoder, int maxQueries)
    {
        _session = session;
        _encoder = encoder;
        _model = encoder.Model;
        _queriesLeft = maxQueries;
    }

    /// <summary>Whether <paramref name="counter"/> counts in every scan in which <paramref name="other"/> counts.</summary>
    public bool CountsWhenever(TimerStep counter, TimerStep other)
    {
        if (counter.Kind != other.Kind || counter.Kind == TimerKind.Pulse || _queriesLeft <= 0
            || !ReadCells(counter.Input).Overlaps(ReadCells(other.Input)))
        {
            return false;
        }

        _queriesLeft--;
        var (solver, expressions) = Setup();
        var context = _session.Context;
        var counting = Counting(expressions, counter);
        var otherCounting = Counting(expressions, other);
        var literal = context.MkBoolConst($"imp.q#{_literals++}");
        solver.Add(context.MkImplies(literal, context.MkAnd(otherCounting, context.MkNot(counting))));
        return _session.Check(solver, literal) == Status.UNSATISFIABLE;
    }

    public void Dispose() => _solver?.Dispose();

    /// <summary>One scan from any state, inputs in range, assumptions TRUE.</summary>
    private (Solver Solver, ScanExpressionEncoder Expressions) Setup()
    {
        if (_solver is null || _expressions is null)
        {
            var state = _encoder.NewState("imp.s");
            var inputs = _encoder.NewInputs("imp.i");
            var scan = _encoder.EncodeScan(state, inputs);
            _solver = _session.Context.MkSimpleSolver();
            _solver.Add(_encoder.StateRange(state));
            _solver.Add(_encoder.InputRange(inputs));
            _solver.Add(_encoder.AssumptionsHold(scan));
            _expressions = new ScanExpressionEncoder(_session.Context, scan.Cell, cell => state[_encoder.PreviousSlot(cell)]);
        }

        return (_solver, _expressions);
    }

    private BoolExpr Counting(ScanExpressionEncoder expressions, TimerStep timer)
    {
        var input = expressions.Bool(timer.Input);
        return timer.Kind == TimerKind.OnDelay ? input : _session.Context.MkNot(input);
    }

    /// <summary>The cells an expression reads, and the cells read by the equations of the current cells it reads.</summary>
    private HashSet<int> ReadCells(ScanExpression expression)
    {
        var cells = new HashSet<int>();
        foreach (var read in Reads(expression))
        {
            cells.Add(read.Cell);
            if (read.Timing == ReadTiming.Current && _model.WriterOfCell.Count > read.Cell
                && _model.WriterOfCell[read.Cell] is var writer and >= 0
                && _model.Steps[writer] is AssignStep assign)
            {
                cells.UnionWith(Reads(assign.Value).Select(r => r.Cell));
            }
        }

        return cells;
    }

    private static IEnumerable<CellReadExpression> Reads(ScanExpression expression) => expression switch
    {
        CellReadExpression read => [read],
        NotExpression e => Reads(e.Operand),
        AndExpression e => e.Operands.SelectMany(Reads),
        OrExpression e => e.Operands.SelectMany(Reads),
        XorExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        ImpliesExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        CompareExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        AddExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        SubtractExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        NegateExpression e => Reads(e.Operand),
        ScaleExpression e => Reads(e.Operand),
        AbsExpression e => Reads(e.Operand),
        MinExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        MaxExpression e => Reads(e.Left).Concat(Reads(e.Right)),
        _ => [],
    };
}
