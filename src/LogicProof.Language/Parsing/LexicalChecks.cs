using System.Globalization;
using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Reports stray characters, unclosed texts and unclosed comments before parsing, then moves the tokens involved
/// off the parser's channel so the parser does not report the same place again in parser terms.
/// A run of adjacent stray characters is one diagnostic. Returns the lines that had such an error (parser errors
/// there are their consequences), or null when the rest of the file is a comment and is not worth parsing.
/// </summary>
internal static class LexicalChecks
{
    public static HashSet<int>? Apply(SourceText source, IList<IToken> tokens, DiagnosticBag diagnostics)
    {
        var content = source.Content;
        var lines = new HashSet<int>();
        for (var i = 0; i < tokens.Count; i++)
        {
            var token = tokens[i];
            if (token.Type == LogicProofParser.LPAREN && token.StartIndex + 1 < content.Length && content[token.StartIndex + 1] == '*')
            {
                // A closed "(* ... *)" would have been lexed as a comment, so this one is never closed.
                diagnostics.Error(
                    LanguageCodes.UnterminatedComment,
                    "the comment opened with '(*' is never closed with '*)'",
                    source.Span(token.StartIndex, 2));
                HideFrom(tokens, i, int.MaxValue);
                return null;
            }

            if (token.Type != LogicProofParser.UNEXPECTED_CHAR)
            {
                continue;
            }

            if (content[token.StartIndex] == '"')
            {
                var lineEnd = content.IndexOf('\n', token.StartIndex);
                lineEnd = lineEnd < 0 ? content.Length : lineEnd;
                diagnostics.Error(
                    LanguageCodes.UnterminatedString,
                    "the text in double quotes is not closed on its line (write \"\" for a quote inside a text)",
                    source.Span(token.StartIndex, lineEnd - token.StartIndex));
                lines.Add(token.Line);
                i = HideFrom(tokens, i, lineEnd) - 1;
                continue;
            }

            var last = i;
            while (last + 1 < tokens.Count && tokens[last + 1].Type == LogicProofParser.UNEXPECTED_CHAR
                   && tokens[last + 1].StartIndex == tokens[last].StopIndex + 1 && content[tokens[last + 1].StartIndex] != '"')
            {
                last++;
            }

            var start = token.StartIndex;
            var length = tokens[last].StopIndex - start + 1;
            diagnostics.Error(LanguageCodes.UnexpectedCharacter, Describe(content.Substring(start, length)), source.Span(start, length));
            lines.Add(token.Line);
            for (var k = i; k <= last; k++)
            {
                Hide(tokens[k]);
            }

            i = last;
        }

        return lines;
    }

    private static string Describe(string characters)
    {
        var isPair = char.IsSurrogatePair(characters, 0);
        var first = isPair ? char.ConvertToUtf32(characters, 0) : characters[0];
        var shown = char.IsControl(characters[0]) ? string.Empty : $"'{characters}' ";
        var code = string.Create(CultureInfo.InvariantCulture, $"U+{first:X4}");
        return characters.Length > (isPair ? 2 : 1)
            ? $"the characters {shown}(starting with {code}) are not part of the language"
            : $"the character {shown}({code}) is not part of the language";
    }

    /// <summary>Hides tokens from index <paramref name="from"/> that start before <paramref name="endOffset"/>; returns the first index not hidden.</summary>
    private static int HideFrom(IList<IToken> tokens, int from, int endOffset)
    {
        var i = from;
        for (; i < tokens.Count && tokens[i].Type != TokenConstants.EOF && tokens[i].StartIndex < endOffset; i++)
        {
            Hide(tokens[i]);
        }

        return i;
    }

    private static void Hide(IToken token)
    {
        if (token is IWritableToken writable)
        {
            writable.Channel = TokenConstants.HiddenChannel;
        }
    }
}
