using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;

namespace LogicProof.Proof.Tests.Support;

/// <summary>Source text to scan model through the product's own front end and lowering, with every diagnostic.</summary>
internal static class SchemeLoader
{
    public static (ScanModel? Model, IReadOnlyList<Diagnostic> Diagnostics) TryLoad(string source, string path)
    {
        var front = FrontEnd.LoadText(path, source);
        if (front.Scheme is null)
        {
            return (null, front.Diagnostics);
        }

        var built = ModelBuilder.Build(front.Scheme);
        return (built.Model, [.. front.Diagnostics, .. built.Diagnostics]);
    }

    /// <summary>The model of a scheme that must be free of errors; an error fails the test with the diagnostics.</summary>
    public static ScanModel Load(string source, string path = "test.lpl")
    {
        var (model, diagnostics) = TryLoad(source, path);
        return model ?? throw new InvalidOperationException(
            "the scheme has errors:" + Environment.NewLine + Describe(diagnostics) + Environment.NewLine + source);
    }

    public static ModelProperty Property(ScanModel model, string name) =>
        model.Properties.Single(p => string.Equals(p.Name, name, StringComparison.OrdinalIgnoreCase));

    public static int Cell(ScanModel model, string name) =>
        model.Cells.Single(c => string.Equals(c.Name, name, StringComparison.OrdinalIgnoreCase)).Index;

    public static int CounterSlotOf(ScanModel model, string cellName) =>
        model.StateSlots.Single(s => s.Kind == StateSlotKind.TimerCounter && s.Cell == Cell(model, cellName)).Index;

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null)));
}
