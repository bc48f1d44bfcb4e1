using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Turns a lexer error into an <see cref="LanguageCodes.UnexpectedCharacter"/> diagnostic. The grammar ends with a
/// catch-all token, so this is a safety net; stray characters are normally reported by <see cref="LexicalChecks"/>.
/// </summary>
internal sealed class LexerErrorListener(SourceText source, DiagnosticBag diagnostics) : IAntlrErrorListener<int>
{
    public void SyntaxError(
        TextWriter output,
        IRecognizer recognizer,
        int offendingSymbol,
        int line,
        int charPositionInLine,
        string msg,
        RecognitionException e)
    {
        var offset = e is LexerNoViableAltException lexerError ? lexerError.StartIndex : 0;
        offset = Math.Clamp(offset, 0, source.Content.Length);
        var shown = offset < source.Content.Length ? source.Content[offset].ToString() : "end of file";
        diagnostics.Error(LanguageCodes.UnexpectedCharacter, $"unexpected character '{shown}'", source.Span(offset, 1));
    }
}
