using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Checks the invariants every consumer of a <see cref="ScanModel"/> relies on. A failure is a bug in the lowering
/// or the slicing, never the user's fault, so it throws.
/// </summary>
internal static class ModelConsistency
{
    public static int[] WriterOfCell(ModelAssembly model) => WriterOfCell(model.Cells.Count, model.Steps);

    public static int[] WriterOfCell(int cellCount, IReadOnlyList<ScanStep> steps)
    {
        var writer = new int[cellCount];
        Array.Fill(writer, -1);
        for (var s = 0; s < steps.Count; s++)
        {
            var target = steps[s].Target;
            if (target < 0 || target >= cellCount)
            {
                throw new InvalidOperationException($"step {s} writes cell {target}, which does not exist");
            }

            if (writer[target] >= 0)
            {
                throw new InvalidOperationException($"cell {target} is written by steps {writer[target]} and {s}");
            }

            writer[target] = s;
        }

        return writer;
    }

    public static void Verify(ScanModel model)
    {
        var cells = model.Cells;
        var previousSlot = new int[cells.Count];
        Array.Fill(previousSlot, -1);
        for (var i = 0; i < model.StateSlots.Count; i++)
        {
            var slot = model.StateSlots[i];
            if (slot.Index != i || slot.Cell < 0 || slot.Cell >= cells.Count || slot.PowerUp is PendingPowerUp)
            {
                Fail($"slot {i} ({slot.Name}) has index {slot.Index}, cell {slot.Cell}, power-up {slot.PowerUp}");
            }

            if (slot.Kind == StateSlotKind.PreviousValue)
            {
                if (previousSlot[slot.Cell] >= 0)
                {
                    Fail($"cell {slot.Cell} has two PreviousValue slots");
                }

                previousSlot[slot.Cell] = i;
            }
        }

        for (var c = 0; c < cells.Count; c++)
        {
            if (cells[c].Index != c || (cells[c].Kind == CellKind.Input) != (model.WriterOfCell[c] < 0))
            {
                Fail($"cell {c} ({cells[c].Name}) has index {cells[c].Index}; an input has no writer, any other cell one");
            }
        }

        var collector = new CellReadCollector();
        var reads = new List<CellReadExpression>();
        for (var s = 0; s < model.Steps.Count; s++)
        {
            reads.Clear();
            collector.Collect(model.Steps[s], reads);
            foreach (var read in reads)
            {
                if (read.Cell < 0 || read.Cell >= cells.Count)
                {
                    Fail($"step {s} reads missing cell {read.Cell}");
                }
                else if (read.Timing == ReadTiming.Previous ? previousSlot[read.Cell] < 0 : model.WriterOfCell[read.Cell] >= s)
                {
                    Fail(read.Timing == ReadTiming.Previous
                        ? $"cell {cells[read.Cell].Name} is read at the last scan but has no slot"
                        : $"step {s} reads cell {cells[read.Cell].Name} in this scan before it is written");
                }
            }
        }
    }

    private static void Fail(string message) => throw new InvalidOperationException("inconsistent scan model: " + message);
}
