using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;

namespace LogicProof.Cli.Output;

/// <summary>
/// Prints diagnostics the way compilers do (file:line:column, severity, code, message, the source line and a
/// caret; see <see cref="DiagnosticFormatter"/>), one after another, to the error stream.
/// </summary>
public static class DiagnosticPrinter
{
    public static DiagnosticCounts Print(TextWriter error, IEnumerable<Diagnostic> diagnostics, SourceText? source)
    {
        var printed = diagnostics.ToList();
        foreach (var diagnostic in printed)
        {
            error.WriteLine(DiagnosticFormatter.Format(diagnostic, source));
        }

        return DiagnosticCounts.Of(printed);
    }
}
