using System.Globalization;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tracing;

/// <summary>
/// Explains a failing value from the concrete values of a trace: starting at the property cell at the failing
/// scan, each equation is split into its deciding terms (for AND that is FALSE, the FALSE operands; for OR that is
/// TRUE, the TRUE ones; NOT and -> likewise), and the cells those terms read are explained in turn, at the same
/// scan for a current read and at the scan before for a previous read, down to <see cref="MaxLevels"/> levels.
/// </summary>
internal sealed class JustificationBuilder
{
    public const int MaxLevels = 4;

    private readonly ScanModel _model;
    private readonly IReadOnlyList<TraceStep> _steps;
    private readonly Dictionary<int, ScanStep> _writer = [];
    private readonly Dictionary<int, int> _previousSlotOfCell = [];
    private readonly Dictionary<int, Dictionary<int, TraceValue>> _cellsByStep = [];
    private readonly Dictionary<int, Dictionary<int, TraceValue>> _memoriesByStep = [];

    public JustificationBuilder(ScanModel model, IReadOnlyList<TraceStep> steps)
    {
        _model = model;
        _steps = steps;
        foreach (var step in model.Steps)
        {
            _writer[step.Target] = step;
        }

        foreach (var slot in model.StateSlots.Where(s => s.Kind == StateSlotKind.PreviousValue))
        {
            _previousSlotOfCell[slot.Cell] = slot.Index;
        }
    }

    public Justification Build(int propertyCell, int failingStep) =>
        new(Explain(propertyCell, failingStep, 0, []) ?? throw new InvalidOperationException("No justification root."));

    private JustificationNode? Explain(int cell, int step, int level, HashSet<(int Cell, int Step)> visited)
    {
        if (!visited.Add((cell, step)))
        {
            return null;
        }

        var info = _model.Cells[cell];
        var value = CellValue(cell, step);
        var scan = _steps[step].LastScan;
        if (info.Kind == CellKind.Input)
        {
            return new JustificationNode(info.Name, value, scan, info.Span, [], []) { Note = "input" };
        }

        if (!_writer.TryGetValue(cell, out var writer))
        {
            return new JustificationNode(info.Name, value, scan, info.Span, [], []) { Note = "not written in this model" };
        }

        var evaluator = Evaluator(step);
        var terms = new List<JustifyingTerm>();
        var reads = new List<ScanExpression>();
        switch (writer)
        {
            case AssignStep assign:
                var leaves = new List<ScanExpression>();
                CollectDeciding(assign.Value, evaluator, leaves);
                terms.AddRange(leaves.Select(l => new JustifyingTerm(ExpressionText.Write(l, _model), evaluator.Evaluate(l))));
                reads.AddRange(leaves);
                break;
            case TimerStep timer:
                terms.Add(Term(timer.Input, evaluator));
                terms.Add(new JustifyingTerm(
                    string.Create(CultureInfo.InvariantCulture, $"{TimerName(timer.Kind)} elapsed scans (preset {timer.PresetScans})"),
                    Memory(timer.StateSlot, step)));
                reads.Add(timer.Input);
                break;
            case EdgeStep edge:
                terms.Add(Term(edge.Clock, evaluator));
                terms.Add(new JustifyingTerm(
                    $"{(edge.Kind == EdgeKind.Rising ? "R_TRIG" : "F_TRIG")} memory (watched value at the previous scan)",
                    Memory(edge.StateSlot, step)));
                reads.Add(edge.Clock);
                break;
            case LatchStep latch:
                terms.Add(Term(latch.Set, evaluator));
                terms.Add(Term(latch.Reset, evaluator));
                terms.Add(new JustifyingTerm(
                    $"{(latch.Kind == LatchKind.SetDominant ? "SR" : "RS")} output at the previous scan",
                    Memory(latch.StateSlot, step)));
                reads.Add(latch.Set);
                reads.Add(latch.Reset);
                break;
        }

        if (level + 1 >= MaxLevels)
        {
            return new JustificationNode(info.Name, value, scan, writer.Span, terms, []) { Note = "not explained further" };
        }

        var causes = new List<JustificationNode>();
        foreach (var read in reads.SelectMany(CellReads).Distinct())
        {
            var cause = read.Timing == ReadTiming.Current
                ? Explain(read.Cell, step, level + 1, visited)
                : step > 0
                    ? Explain(read.Cell, step - 1, level + 1, visited)
                    : PowerUpNode(read.Cell);
            if (cause is not null)
            {
                causes.Add(cause);
            }
        }

        return new JustificationNode(info.Name, value, scan, writer.Span, terms, causes);
    }

    private static void CollectDeciding(ScanExpression expression, ConcreteEvaluator evaluator, List<ScanExpression> leaves)
    {
        switch (expression)
        {
            case AndExpression and:
                var allTrue = evaluator.Bool(and);
                foreach (var operand in and.Operands.Where(o => allTrue || !evaluator.Bool(o)))
                {
                    CollectDeciding(operand, evaluator, leaves);
                }

                break;
            case OrExpression or:
                var anyTrue = evaluator.Bool(or);
                foreach (var operand in or.Operands.Where(o => !anyTrue || evaluator.Bool(o)))
                {
                    CollectDeciding(operand, evaluator, leaves);
                }

                break;
            case NotExpression not:
                CollectDeciding(not.Operand, evaluator, leaves);
                break;
            case ImpliesExpression implies when !evaluator.Bool(implies):
                CollectDeciding(implies.Left, evaluator, leaves);
                CollectDeciding(implies.Right, evaluator, leaves);
                break;
            case ImpliesExpression implies:
                CollectDeciding(evaluator.Bool(implies.Left) ? implies.Right : implies.Left, evaluator, leaves);
                break;
            default:
                leaves.Add(expression);
                break;
        }
    }

    private static IEnumerable<CellReadExpression> CellReads(ScanExpression expression) => expression switch
    {
        CellReadExpression read => [read],
        NotExpression not => CellReads(not.Operand),
        AndExpression and => and.Operands.SelectMany(CellReads),
        OrExpression or => or.Operands.SelectMany(CellReads),
        XorExpression xor => CellReads(xor.Left).Concat(CellReads(xor.Right)),
        ImpliesExpression implies => CellReads(implies.Left).Concat(CellReads(implies.Right)),
        CompareExpression compare => CellReads(compare.Left).Concat(CellReads(compare.Right)),
        AddExpression add => CellReads(add.Left).Concat(CellReads(add.Right)),
        SubtractExpression subtract => CellReads(subtract.Left).Concat(CellReads(subtract.Right)),
        NegateExpression negate => CellReads(negate.Operand),
        ScaleExpression scale => CellReads(scale.Operand),
        AbsExpression abs => CellReads(abs.Operand),
        MinExpression min => CellReads(min.Left).Concat(CellReads(min.Right)),
        MaxExpression max => CellReads(max.Left).Concat(CellReads(max.Right)),
        _ => [],
    };

    private static string TimerName(TimerKind kind) => kind switch
    {
        TimerKind.OnDelay => "TON",
        TimerKind.OffDelay => "TOF",
        _ => "TP",
    };

    private JustifyingTerm Term(ScanExpression expression, ConcreteEvaluator evaluator) =>
        new(ExpressionText.Write(expression, _model), evaluator.Evaluate(expression));

    private JustificationNode? PowerUpNode(int cell)
    {
        if (!_previousSlotOfCell.TryGetValue(cell, out var slot))
        {
            return null;
        }

        var info = _model.Cells[cell];
        return new JustificationNode(info.Name, Memory(slot, 0), -1, info.Span, [], []) { Note = "power-up value" };
    }

    private ConcreteEvaluator Evaluator(int step) => new(
        cell => CellValue(cell, step),
        cell => _previousSlotOfCell.TryGetValue(cell, out var slot)
            ? Memory(slot, step)
            : throw new InvalidOperationException($"Cell {cell} has no previous-value slot."));

    private TraceValue CellValue(int cell, int step) => Lookup(_cellsByStep, step, s => s.Inputs.Concat(s.Cells), cell);

    private TraceValue Memory(int slot, int step) => Lookup(_memoriesByStep, step, s => s.Memories, slot);

    private TraceValue Lookup(
        Dictionary<int, Dictionary<int, TraceValue>> cache,
        int step,
        Func<TraceStep, IEnumerable<NamedValue>> values,
        int index)
    {
        if (!cache.TryGetValue(step, out var map))
        {
            map = [];
            foreach (var named in values(_steps[step]))
            {
                map[named.Index] = named.Value;
            }

            cache[step] = map;
        }

        return map.TryGetValue(index, out var value)
            ? value
            : throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"The trace has no value for index {index} at step {step}."));
    }
}
