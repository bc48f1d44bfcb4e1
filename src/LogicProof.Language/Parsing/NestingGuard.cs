using System.Globalization;
using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Refuses, before parsing, a file the generated parser would recurse too deeply on: a stack overflow cannot be
/// caught in .NET, so the check must come first and must not itself recurse. The parser recurses once per open
/// parenthesis (limit <see cref="MaxParenthesisDepth"/>), and once per prefix operator (NOT, unary minus) and per
/// <c>-&gt;</c>, each of which stays open until the end of its expression: the closing parenthesis, the next
/// argument or the end of the statement (limit <see cref="MaxOperatorDepth"/> for the two counts together;
/// at that depth parsing still takes only seconds on the large stack).
/// </summary>
internal static class NestingGuard
{
    public const int MaxParenthesisDepth = 1000;

    public const int MaxOperatorDepth = 100_000;

    /// <summary>Returns false (and reports) when the file must not be parsed.</summary>
    public static bool Check(SourceText source, IList<IToken> tokens, DiagnosticBag diagnostics)
    {
        // openOperators[k]: prefix operators and -> still open at parenthesis level k.
        var openOperators = new List<int> { 0 };
        var operatorDepth = 0;
        var previousType = TokenConstants.InvalidType;
        foreach (var token in tokens)
        {
            if (token.Channel != TokenConstants.DefaultChannel)
            {
                continue;
            }

            switch (token.Type)
            {
                case LogicProofParser.LPAREN:
                    openOperators.Add(0);
                    if (openOperators.Count - 1 > MaxParenthesisDepth)
                    {
                        Report(source, token, diagnostics, $"parentheses nest deeper than {MaxParenthesisDepth} levels here; split the expression into several equations");
                        return false;
                    }

                    break;
                case LogicProofParser.RPAREN when openOperators.Count > 1:
                    operatorDepth -= openOperators[^1];
                    openOperators.RemoveAt(openOperators.Count - 1);
                    break;
                case LogicProofParser.COMMA or LogicProofParser.SEMI:
                    operatorDepth -= openOperators[^1];
                    openOperators[^1] = 0;
                    break;
                case LogicProofParser.NOT or LogicProofParser.IMPLIES:
                case LogicProofParser.MINUS when !EndsOperand(previousType):
                    openOperators[^1]++;
                    operatorDepth++;
                    if (operatorDepth > MaxOperatorDepth)
                    {
                        Report(source, token, diagnostics, $"this expression nests more than {MaxOperatorDepth} NOT, unary minus and -> operators; split it into several equations");
                        return false;
                    }

                    break;
            }

            previousType = token.Type;
        }

        return true;
    }

    private static bool EndsOperand(int tokenType) => tokenType is LogicProofParser.IDENT or LogicProofParser.NUMBER
        or LogicProofParser.RPAREN or LogicProofParser.TRUE or LogicProofParser.FALSE or LogicProofParser.TIME_LITERAL;

    private static void Report(SourceText source, IToken token, DiagnosticBag diagnostics, FormattableString message) =>
        diagnostics.Error(LanguageCodes.NestingTooDeep, FormattableString.Invariant(message), source.Span(token.StartIndex, token.StopIndex - token.StartIndex + 1));
}
