using Antlr4.Runtime;
using LogicProof.Core.Text;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Spans and texts of parse-tree nodes from token offsets and the source text. ANTLR's own GetText() recurses over
/// the whole subtree and would overflow on long chains, so it is never used.
/// </summary>
internal static class ParseTreeSpans
{
    public static SourceSpan SpanOf(this SourceText source, ParserRuleContext context) =>
        source.Between(context.Start.StartIndex, context.Stop.StopIndex + 1);

    public static SourceSpan SpanOf(this SourceText source, IToken token) =>
        source.Between(token.StartIndex, token.StopIndex + 1);

    public static SourceSpan Between(this SourceText source, int start, int end) => source.Span(start, Math.Max(0, end - start));

    public static string TextOf(this SourceText source, IToken token) =>
        source.Content.Substring(token.StartIndex, token.StopIndex - token.StartIndex + 1);
}
