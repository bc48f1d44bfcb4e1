using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;

namespace LogicProof.Proof.Tests.Support;

/// <summary>Builds the scan model of a scheme given as source text; a scheme with an error fails the test.</summary>
internal static class SchemeLoader
{
    public static ScanModel Load(string source, string path = "test.lpl")
    {
        var front = FrontEnd.LoadText(path, source);
        if (front.Scheme is null)
        {
            throw new InvalidOperationException(Describe(front.Diagnostics));
        }

        var built = ModelBuilder.Build(front.Scheme);
        return built.Model ?? throw new InvalidOperationException(Describe(built.Diagnostics));
    }

    public static ModelProperty Property(ScanModel model, string name) =>
        model.Properties.Single(p => string.Equals(p.Name, name, StringComparison.OrdinalIgnoreCase));

    public static int Cell(ScanModel model, string name) =>
        model.Cells.Single(c => string.Equals(c.Name, name, StringComparison.OrdinalIgnoreCase)).Index;

    private static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null)));
}
