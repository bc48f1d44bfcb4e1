using Antlr4.Runtime;
using Antlr4.Runtime.Misc;
using LogicProof.Language.Generated;

namespace LogicProof.Language.Parsing;

/// <summary>
/// ANTLR's default recovery (so every error of a file is found), with messages in plain words: what was found and
/// what was expected, never parser jargon. When a ';' would have fitted and the offending token starts a later line
/// than the token before it (a forgotten ';'), the error is placed just after that earlier token, where the writer
/// left it out, rather than at the start of the next line.
/// </summary>
internal sealed class PlainWordsErrorStrategy : DefaultErrorStrategy
{
    protected override void ReportNoViableAlternative(Parser recognizer, NoViableAltException e) =>
        Report(recognizer, e.OffendingToken, ExpectedAt(recognizer, e), e);

    protected override void ReportInputMismatch(Parser recognizer, InputMismatchException e) =>
        Report(recognizer, e.OffendingToken, ExpectedAt(recognizer, e), e);

    protected override void ReportFailedPredicate(Parser recognizer, FailedPredicateException e) =>
        Report(recognizer, e.OffendingToken, recognizer.GetExpectedTokens(), e);

    protected override void ReportUnwantedToken(Parser recognizer) => ReportAtCurrentToken(recognizer);

    protected override void ReportMissingToken(Parser recognizer) => ReportAtCurrentToken(recognizer);

    /// <summary>An extra or a missing token: reported once, at the current token, unless already recovering.</summary>
    private void ReportAtCurrentToken(Parser recognizer)
    {
        if (InErrorRecoveryMode(recognizer))
        {
            return;
        }

        BeginErrorCondition(recognizer);
        Report(recognizer, recognizer.CurrentToken, GetExpectedTokens(recognizer), null);
    }

    private static IntervalSet ExpectedAt(Parser recognizer, RecognitionException e)
    {
        var expected = e.GetExpectedTokens();
        return expected is null || expected.IsNil ? recognizer.GetExpectedTokens() : expected;
    }

    private static void Report(Parser recognizer, IToken found, IntervalSet expected, RecognitionException? e)
    {
        var what = TokenDescriber.DescribeExpected(expected);
        var previous = PreviousVisible(recognizer, found);
        if (previous is not null && previous.Line < found.Line && expected.Contains(LogicProofParser.SEMI))
        {
            recognizer.NotifyErrorListeners(
                AfterToken(previous),
                $"expected {what} after {TokenDescriber.DescribeFound(previous)} but found {TokenDescriber.DescribeFound(found)}",
                e);
            return;
        }

        recognizer.NotifyErrorListeners(found, $"expected {what} but found {TokenDescriber.DescribeFound(found)}", e);
    }

    private static IToken? PreviousVisible(Parser recognizer, IToken found)
    {
        if (recognizer.InputStream is not BufferedTokenStream tokens)
        {
            return null;
        }

        for (var i = found.TokenIndex - 1; i >= 0; i--)
        {
            var token = tokens.Get(i);
            if (token.Channel == TokenConstants.DefaultChannel)
            {
                return token;
            }
        }

        return null;
    }

    /// <summary>A zero-length place just after <paramref name="token"/>.</summary>
    private static CommonToken AfterToken(IToken token) => new(token.Type)
    {
        StartIndex = token.StopIndex + 1,
        StopIndex = token.StopIndex,
        Line = token.Line,
        Column = token.Column + (token.StopIndex - token.StartIndex + 1),
    };
}
