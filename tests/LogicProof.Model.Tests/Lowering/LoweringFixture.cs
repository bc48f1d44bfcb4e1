using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Lowering;

/// <summary>Loads <c>.lpl</c> text through the real front end, for the lowering, graph and static-check tests.</summary>
internal static class LoweringFixture
{
    public const string FileName = "bay.lpl";

    /// <summary>A header with a 2 ms scan at 60 Hz; the tests append sections to it (so line 4 is the first after it).</summary>
    public const string Header = "scheme QM7_TEST;\nfrequency 60 Hz;\nscan 2 ms;\n";

    public static BoundScheme BindScheme(string text)
    {
        var front = FrontEnd.LoadText(FileName, text);
        Assert.False(front.HasErrors, Describe(front.Diagnostics));
        return front.Scheme!;
    }

    public static ScanModel BuildModel(string text, IReadOnlyList<ExtraProperty>? extra = null)
    {
        var built = ModelBuilder.Build(BindScheme(text), extra);
        Assert.False(built.HasErrors, Describe(built.Diagnostics));
        return built.Model!;
    }

    public static Cell CellNamed(this ScanModel model, string name) =>
        model.Cells.Single(cell => cell.Name.Equals(name, StringComparison.OrdinalIgnoreCase));

    public static ScanStep WriterOf(this ScanModel model, string name) =>
        model.Steps[model.WriterOfCell[model.CellNamed(name).Index]];

    public static StateSlot PreviousSlotOf(this ScanModel model, string name) =>
        model.StateSlots.Single(slot => slot.Kind == StateSlotKind.PreviousValue && slot.Cell == model.CellNamed(name).Index);

    public static bool HasPreviousSlot(this ScanModel model, string name) =>
        model.StateSlots.Any(slot => slot.Kind == StateSlotKind.PreviousValue && slot.Cell == model.CellNamed(name).Index);

    /// <summary>Every cell read of a step's expressions, with its timing, in evaluation order.</summary>
    public static List<CellReadExpression> ReadsOf(ScanStep step)
    {
        var reads = new List<CellReadExpression>();
        var roots = step switch
        {
            AssignStep a => new[] { a.Value },
            TimerStep t => new[] { t.Input },
            EdgeStep e => new[] { e.Clock },
            LatchStep l => new[] { l.Set, l.Reset },
            _ => throw new InvalidOperationException(),
        };
        foreach (var root in roots)
        {
            Collect(root, reads);
        }

        return reads;
    }

    private static void Collect(ScanExpression expression, List<CellReadExpression> reads)
    {
        switch (expression)
        {
            case CellReadExpression read:
                reads.Add(read);
                break;
            case NotExpression e:
                Collect(e.Operand, reads);
                break;
            case AndExpression e:
                e.Operands.ToList().ForEach(o => Collect(o, reads));
                break;
            case OrExpression e:
                e.Operands.ToList().ForEach(o => Collect(o, reads));
                break;
            case XorExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case ImpliesExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case CompareExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case AddExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case SubtractExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case ScaleExpression e:
                Collect(e.Operand, reads);
                break;
            case NegateExpression e:
                Collect(e.Operand, reads);
                break;
            case AbsExpression e:
                Collect(e.Operand, reads);
                break;
            case MinExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
            case MaxExpression e:
                Collect(e.Left, reads);
                Collect(e.Right, reads);
                break;
        }
    }

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => $"{d.Span}: {d.Code} {d.Message}"));
}
