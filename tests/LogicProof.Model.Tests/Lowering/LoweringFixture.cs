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
        new CellReadCollector().Collect(step, reads);
        return reads;
    }

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => $"{d.Span}: {d.Code} {d.Message}"));
}
