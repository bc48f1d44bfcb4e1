using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Graph;

/// <summary>
/// Cuts a scan model down to the cone of influence of some cells, so an engine only encodes what can affect the
/// property it checks.
/// <para>
/// The cone is closed under the reads of the step writing each cell (this scan and last scan alike) and under a
/// function block's own memory. Kept: those cells (in their original order, so inputs stay first), the steps
/// writing them (in order), the state slots those steps use, the properties whose cell is in the cone, and the
/// roundings of kept timers. Everything is re-indexed; <see cref="ScanModel.OriginalCells"/> maps each kept cell
/// back to the original model for traces.
/// </para>
/// <para>
/// Assumptions: one is kept when its own cone shares a cell with the kept cone, or when it reads no input at all
/// (then it constrains every trace alike, e.g. <c>assume FALSE</c>); its cone then joins the kept cone, which may
/// bring in further assumptions (repeated until nothing changes). A dropped assumption reads only inputs and
/// memories that cannot affect the roots, so dropping it only adds traces: a proof on the slice holds for the
/// whole model, and a violation on the slice is a violation of the whole model as long as the dropped assumptions
/// can be met by the other inputs.
/// </para>
/// </summary>
public static class ConeSlicer
{
    public static ScanModel Slice(ScanModel model, IReadOnlyList<int> rootCells)
    {
        var cellCount = model.Cells.Count;
        var inCone = new bool[cellCount];
        foreach (var root in rootCells)
        {
            if (root < 0 || root >= cellCount)
            {
                throw new ArgumentOutOfRangeException(nameof(rootCells), $"cell {root} is not in the model");
            }
        }

        Close(model, rootCells, inCone);
        var keptAssumptions = KeepAssumptions(model, inCone);
        return Rebuild(model, inCone, keptAssumptions);
    }

    /// <summary>Marks every cell the given cells depend on; returns the cells newly marked.</summary>
    private static List<int> Close(ScanModel model, IEnumerable<int> roots, bool[] inCone)
    {
        var marked = new List<int>();
        var pending = new Stack<int>();
        var collector = new CellReadCollector();
        var reads = new List<CellReadExpression>();
        foreach (var root in roots)
        {
            if (!inCone[root])
            {
                inCone[root] = true;
                marked.Add(root);
                pending.Push(root);
            }
        }

        while (pending.Count > 0)
        {
            var writer = model.WriterOfCell[pending.Pop()];
            if (writer < 0)
            {
                continue;
            }

            reads.Clear();
            collector.Collect(model.Steps[writer], reads);
            foreach (var read in reads)
            {
                if (!inCone[read.Cell])
                {
                    inCone[read.Cell] = true;
                    marked.Add(read.Cell);
                    pending.Push(read.Cell);
                }
            }
        }

        return marked;
    }

    private static List<ModelAssumption> KeepAssumptions(ScanModel model, bool[] inCone)
    {
        var cones = new List<(ModelAssumption Assumption, List<int> Cells)>();
        foreach (var assumption in model.Assumptions)
        {
            cones.Add((assumption, Close(model, [assumption.Cell], new bool[model.Cells.Count])));
        }

        var kept = new bool[cones.Count];
        bool changed;
        do
        {
            changed = false;
            for (var i = 0; i < cones.Count; i++)
            {
                var cells = cones[i].Cells;
                var readsNoInput = !cells.Exists(c => model.Cells[c].Kind == CellKind.Input);
                if (!kept[i] && (readsNoInput || cells.Exists(c => inCone[c])))
                {
                    kept[i] = true;
                    changed = true;
                    foreach (var cell in cells)
                    {
                        inCone[cell] = true;
                    }
                }
            }
        }
        while (changed);

        return [.. cones.Where((_, i) => kept[i]).Select(c => c.Assumption)];
    }

    private static ScanModel Rebuild(ScanModel model, bool[] inCone, List<ModelAssumption> assumptions)
    {
        var newCell = new int[model.Cells.Count];
        Array.Fill(newCell, -1);
        var originalCells = new List<int>();
        var cells = new List<Cell>();
        for (var c = 0; c < model.Cells.Count; c++)
        {
            if (inCone[c])
            {
                newCell[c] = cells.Count;
                originalCells.Add(c);
                cells.Add(model.Cells[c] with { Index = cells.Count });
            }
        }

        var keptSteps = new List<(ScanStep Step, int OriginalIndex)>();
        for (var s = 0; s < model.Steps.Count; s++)
        {
            if (inCone[model.Steps[s].Target])
            {
                keptSteps.Add((model.Steps[s], s));
            }
        }

        var rewriter = new CellIndexRewriter(newCell);
        var newSlot = KeepSlots(model, keptSteps, newCell, out var slots);
        var steps = keptSteps.Select(k => rewriter.Rewrite(k.Step, newSlot)).ToList();
        var keptTimerSpans = keptSteps.Select(k => k.Step).OfType<TimerStep>().Select(t => t.Span).ToList();

        var sliced = new ScanModel(
            model.Name,
            model.Timing,
            cells,
            [.. model.Inputs.Where(i => inCone[i]).Select(i => newCell[i])],
            steps,
            slots,
            [.. model.Properties.Where(p => inCone[p.Cell]).Select(p => p with { Cell = newCell[p.Cell] })],
            [.. assumptions.Select(a => a with { Cell = newCell[a.Cell] })])
        {
            EquationStepCount = keptSteps.Count(k => k.OriginalIndex < model.EquationStepCount),
            WriterOfCell = ModelConsistency.WriterOfCell(cells.Count, steps),
            Roundings = [.. model.Roundings.Where(r => keptTimerSpans.Exists(span => Contains(span, r.Span)))],
            OriginalCells = model.OriginalCells is { } older ? [.. originalCells.Select(c => older[c])] : originalCells,
        };
        ModelConsistency.Verify(sliced);
        return sliced;
    }

    /// <summary>Keeps the slots the kept steps use: their own memories and the last-scan values they read.</summary>
    private static int[] KeepSlots(ScanModel model, List<(ScanStep Step, int OriginalIndex)> keptSteps, int[] newCell, out List<StateSlot> slots)
    {
        var used = new bool[model.StateSlots.Count];
        var previousSlotOfCell = new Dictionary<int, int>();
        foreach (var slot in model.StateSlots)
        {
            if (slot.Kind == StateSlotKind.PreviousValue)
            {
                previousSlotOfCell.Add(slot.Cell, slot.Index);
            }
        }

        var collector = new CellReadCollector();
        var reads = new List<CellReadExpression>();
        foreach (var (step, _) in keptSteps)
        {
            switch (step)
            {
                case TimerStep timer:
                    used[timer.StateSlot] = true;
                    break;
                case EdgeStep edge:
                    used[edge.StateSlot] = true;
                    break;
                case LatchStep latch:
                    used[latch.StateSlot] = true;
                    break;
            }

            reads.Clear();
            collector.Collect(step, reads);
            foreach (var read in reads)
            {
                if (read.Timing == ReadTiming.Previous)
                {
                    used[previousSlotOfCell[read.Cell]] = true;
                }
            }
        }

        var newSlot = new int[model.StateSlots.Count];
        Array.Fill(newSlot, -1);
        slots = [];
        foreach (var slot in model.StateSlots)
        {
            if (used[slot.Index])
            {
                newSlot[slot.Index] = slots.Count;
                slots.Add(slot with { Index = slots.Count, Cell = newCell[slot.Cell] });
            }
        }

        return newSlot;
    }

    private static bool Contains(Core.Text.SourceSpan outer, Core.Text.SourceSpan inner) =>
        outer.File == inner.File && inner.Offset >= outer.Offset && inner.Offset + inner.Length <= outer.Offset + outer.Length;
}
