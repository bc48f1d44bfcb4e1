using LogicProof.Model.Scan;

namespace LogicProof.Model.Graph;

/// <summary>Copies steps and expressions with cell and slot indexes mapped to a sliced model's.</summary>
internal sealed class CellIndexRewriter(int[] newCell)
{
    public ScanStep Rewrite(ScanStep step, int[] newSlot) => step switch
    {
        AssignStep assign => assign with { Target = Cell(assign.Target), Value = Rewrite(assign.Value) },
        TimerStep timer => timer with { Target = Cell(timer.Target), Input = Rewrite(timer.Input), StateSlot = Slot(newSlot, timer.StateSlot) },
        EdgeStep edge => edge with { Target = Cell(edge.Target), Clock = Rewrite(edge.Clock), StateSlot = Slot(newSlot, edge.StateSlot) },
        LatchStep latch => latch with
        {
            Target = Cell(latch.Target),
            Set = Rewrite(latch.Set),
            Reset = Rewrite(latch.Reset),
            StateSlot = Slot(newSlot, latch.StateSlot),
        },
        _ => throw new InvalidOperationException($"unknown step type {step.GetType().Name}"),
    };

    // Recursive: expression depth is bounded by the source's nesting (AND/OR chains are flat); run big models
    // inside LargeStack.Run.
    public ScanExpression Rewrite(ScanExpression expression) => expression switch
    {
        CellReadExpression read => read with { Cell = Cell(read.Cell) },
        BoolConstantExpression or RealConstantExpression => expression,
        NotExpression not => new NotExpression(Rewrite(not.Operand)),
        AndExpression and => new AndExpression([.. and.Operands.Select(Rewrite)]),
        OrExpression or => new OrExpression([.. or.Operands.Select(Rewrite)]),
        XorExpression xor => new XorExpression(Rewrite(xor.Left), Rewrite(xor.Right)),
        ImpliesExpression implies => new ImpliesExpression(Rewrite(implies.Left), Rewrite(implies.Right)),
        CompareExpression compare => compare with { Left = Rewrite(compare.Left), Right = Rewrite(compare.Right) },
        AddExpression add => new AddExpression(Rewrite(add.Left), Rewrite(add.Right)),
        SubtractExpression subtract => new SubtractExpression(Rewrite(subtract.Left), Rewrite(subtract.Right)),
        NegateExpression negate => new NegateExpression(Rewrite(negate.Operand)),
        ScaleExpression scale => scale with { Operand = Rewrite(scale.Operand) },
        AbsExpression abs => new AbsExpression(Rewrite(abs.Operand)),
        MinExpression min => new MinExpression(Rewrite(min.Left), Rewrite(min.Right)),
        MaxExpression max => new MaxExpression(Rewrite(max.Left), Rewrite(max.Right)),
        _ => throw new InvalidOperationException($"unknown scan expression {expression.GetType().Name}"),
    };

    private int Cell(int original) =>
        newCell[original] >= 0 ? newCell[original] : throw new InvalidOperationException($"cell {original} is outside the cone");

    private static int Slot(int[] newSlot, int original) =>
        newSlot[original] >= 0 ? newSlot[original] : throw new InvalidOperationException($"slot {original} is outside the cone");
}
