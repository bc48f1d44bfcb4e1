using Antlr4.Runtime;
using Antlr4.Runtime.Atn;
using Antlr4.Runtime.Misc;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;

namespace LogicProof.Language.Parsing;

/// <summary>
/// The parse shared by a scheme file and a single formula. Lexes, runs the lexical checks and the nesting guard,
/// then parses from the given start rule in two stages: SLL prediction with a strategy that bails at the first error
/// (fast, and right for every valid text), and only if that fails full LL with error recovery, so that every syntax
/// error is reported. Callers run this on a large stack.
/// </summary>
internal static class TwoStageParser
{
    /// <summary>
    /// The parse tree and the token stream positioned just after it, or null when the text was not parsed or any
    /// error was reported.
    /// </summary>
    public static (TTree Tree, ITokenStream Tokens)? Parse<TTree>(
        SourceText source, DiagnosticBag diagnostics, Func<LogicProofParser, TTree> startRule)
        where TTree : ParserRuleContext
    {
        var errorsBefore = diagnostics.Count(d => d.IsError);
        var lexer = new LogicProofLexer(new AntlrInputStream(source.Content));
        lexer.RemoveErrorListeners();
        lexer.AddErrorListener(new LexerErrorListener(source, diagnostics));
        var tokens = new CommonTokenStream(lexer);
        tokens.Fill();
        var tokenList = tokens.GetTokens();
        var linesWithLexicalErrors = LexicalChecks.Apply(source, tokenList, diagnostics);
        if (linesWithLexicalErrors is null || !NestingGuard.Check(source, tokenList, diagnostics))
        {
            return null;
        }

        tokens.Seek(0);
        var tree = ParseInTwoStages(tokens, new SyntaxErrorListener(source, diagnostics, linesWithLexicalErrors), startRule);
        return diagnostics.Count(d => d.IsError) > errorsBefore ? null : (tree, tokens);
    }

    private static TTree ParseInTwoStages<TTree>(CommonTokenStream tokens, SyntaxErrorListener listener, Func<LogicProofParser, TTree> startRule)
    {
        var sll = NewParser(tokens);
        sll.Interpreter.PredictionMode = PredictionMode.SLL;
        sll.ErrorHandler = new BailErrorStrategy();
        try
        {
            return startRule(sll);
        }
        catch (ParseCanceledException)
        {
            // Either a real syntax error or a construct SLL cannot decide; full LL settles which, and reports.
        }

        // A fresh parser, not a reset one: a bail out of a left-recursive rule such as expr leaves the parser's
        // state number behind, and error recovery would then read a stale invoking state.
        tokens.Seek(0);
        var ll = NewParser(tokens);
        ll.Interpreter.PredictionMode = PredictionMode.LL;
        ll.ErrorHandler = new PlainWordsErrorStrategy();
        ll.AddErrorListener(listener);
        return startRule(ll);
    }

    private static LogicProofParser NewParser(CommonTokenStream tokens)
    {
        var parser = new LogicProofParser(tokens, TextWriter.Null, TextWriter.Null);
        parser.RemoveErrorListeners();
        return parser;
    }
}
