using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language.Binding;
using LogicProof.Language.Parsing;
using LogicProof.Language.Reading;

namespace LogicProof.Language;

/// <summary>
/// Reads, parses and binds one <c>.lpl</c> file. Never throws for bad input: every problem is a diagnostic with a
/// code and a place. Parsing and binding run on a large stack (see <see cref="LargeStack"/>).
/// </summary>
public static class FrontEnd
{
    public static FrontEndResult Load(string path)
    {
        var diagnostics = new DiagnosticBag();
        var source = SourceReader.Read(path, diagnostics);
        return Analyze(source, diagnostics);
    }

    public static FrontEndResult LoadText(string path, string text)
    {
        var diagnostics = new DiagnosticBag();
        var source = new SourceText(path, text);
        SourceReader.CheckText(source, diagnostics);
        return Analyze(source, diagnostics);
    }

    /// <summary>Parses and binds text that was read without error; otherwise gives only the diagnostics.</summary>
    private static FrontEndResult Analyze(SourceText source, DiagnosticBag diagnostics)
    {
        if (diagnostics.HasErrors)
        {
            return new FrontEndResult(source, null, null, diagnostics.ToList());
        }

        try
        {
            return LargeStack.Run(() =>
            {
                var syntax = SchemeParser.Parse(source, diagnostics);
                var scheme = syntax is null ? null : SchemeBinder.Bind(syntax, diagnostics);
                return new FrontEndResult(source, syntax, scheme, diagnostics.ToList());
            });
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            // A defect of ours, not of the file: still a diagnostic, never a stack trace.
            diagnostics.Error(InternalCodes.InternalError, $"internal error while reading the scheme: {ex.GetType().Name}: {ex.Message}", source.Span(0, 0));
            return new FrontEndResult(source, null, null, diagnostics.ToList());
        }
    }
}
