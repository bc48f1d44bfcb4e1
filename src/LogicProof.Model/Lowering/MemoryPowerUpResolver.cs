using Fractions;
using LogicProof.Model.Graph;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Decides the power-up of each declared variable's PreviousValue slot, in this order:
/// <list type="number">
/// <item>a declared <c>init</c> value (<c>init retained</c>: unknown);</item>
/// <item>a variable no equation writes keeps its power-up value for ever: FALSE or 0;</item>
/// <item>a variable written by an SR/RS that is its whole equation, without <c>init</c>: unknown, like the latch
/// memory it mirrors (the two unknowns are independent, which only adds behaviours);</item>
/// <item>a seal-in: the slot feeds, through this scan's equations and last-scan reads, back into the variable
/// itself (the slot is read by a step whose target is in the variable's strongly connected component): unknown;</item>
/// <item>otherwise FALSE or 0.</item>
/// </list>
/// </summary>
internal static class MemoryPowerUpResolver
{
    public static void Resolve(
        ModelAssembly model,
        int equationStepCount,
        IReadOnlyList<int> variableCells,
        IReadOnlyDictionary<int, PowerUp> declaredPowerUps,
        int[] writerEquationOfCell,
        ISet<int> wholeLatchCellsWithoutInit)
    {
        var sealIn = FindSealIns(model, equationStepCount);
        foreach (var cell in variableCells)
        {
            var slot = model.PreviousSlotOrNone(cell);
            if (slot < 0)
            {
                continue;
            }

            var type = model.Cells[cell].Type;
            PowerUp powerUp;
            if (declaredPowerUps.TryGetValue(cell, out var declared))
            {
                powerUp = declared;
            }
            else if (writerEquationOfCell[cell] < 0)
            {
                powerUp = Default(type);
            }
            else if (wholeLatchCellsWithoutInit.Contains(cell) || sealIn[cell])
            {
                powerUp = new UnknownPowerUp();
            }
            else
            {
                powerUp = Default(type);
            }

            model.SetPowerUp(slot, powerUp);
        }
    }

    public static PowerUp Default(SignalType type) =>
        type == SignalType.Real ? new KnownRealPowerUp(Fraction.Zero) : new KnownBoolPowerUp(false);

    /// <summary>For each cell: its PreviousValue slot is read by a step whose result feeds back into the cell.</summary>
    private static bool[] FindSealIns(ModelAssembly model, int equationStepCount)
    {
        var cellCount = model.Cells.Count;
        var sources = new List<int>(equationStepCount * 4);
        var targets = new List<int>(equationStepCount * 4);
        var lastScan = new List<bool>(equationStepCount * 4);
        var collector = new CellReadCollector();
        var reads = new List<CellReadExpression>();
        for (var s = 0; s < equationStepCount; s++)
        {
            var target = model.Steps[s].Target;
            reads.Clear();
            collector.Collect(model.Steps[s], reads);
            foreach (var read in reads)
            {
                sources.Add(read.Cell);
                targets.Add(target);
                lastScan.Add(read.Timing == ReadTiming.Previous);
            }
        }

        var (edgeStart, edgeTargets) = StrongComponents.Adjacency(cellCount, sources, targets);
        var component = StrongComponents.Compute(cellCount, edgeStart, edgeTargets);
        var sealIn = new bool[cellCount];
        for (var e = 0; e < sources.Count; e++)
        {
            if (lastScan[e] && component[sources[e]] == component[targets[e]])
            {
                sealIn[sources[e]] = true;
            }
        }

        return sealIn;
    }
}
