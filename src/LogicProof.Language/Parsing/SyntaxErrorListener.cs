using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Turns every parser error into a <see cref="LanguageCodes.SyntaxError"/> diagnostic at the offending token.
/// The message comes from <see cref="PlainWordsErrorStrategy"/>. Errors on a line where a stray character or an
/// unclosed text was already reported are left out: they follow from that first error.
/// </summary>
internal sealed class SyntaxErrorListener(SourceText source, DiagnosticBag diagnostics, IReadOnlySet<int> linesWithLexicalErrors)
    : BaseErrorListener
{
    public override void SyntaxError(
        TextWriter output,
        IRecognizer recognizer,
        IToken offendingSymbol,
        int line,
        int charPositionInLine,
        string msg,
        RecognitionException e)
    {
        if (linesWithLexicalErrors.Contains(line))
        {
            return;
        }

        var start = Math.Clamp(offendingSymbol.StartIndex, 0, source.Content.Length);
        var length = Math.Max(0, offendingSymbol.StopIndex - offendingSymbol.StartIndex + 1);
        diagnostics.Error(LanguageCodes.SyntaxError, msg, source.Span(start, length));
    }
}
