using Antlr4.Runtime;
using Antlr4.Runtime.Atn;
using Antlr4.Runtime.Misc;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Source text to syntax tree. Lexes, runs the lexical checks and the nesting guard, then parses in two stages:
/// SLL prediction with a strategy that bails at the first error (fast, and right for every valid file), and only
/// if that fails full LL with error recovery, so that every syntax error of the file is reported.
/// Returns null when the file has syntax errors. Callers run this on a large stack (see FrontEnd).
/// </summary>
internal static class SchemeParser
{
    public static SchemeSyntax? Parse(SourceText source, DiagnosticBag diagnostics)
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
        var tree = ParseTwoStage(tokens, new SyntaxErrorListener(source, diagnostics, linesWithLexicalErrors));
        if (diagnostics.Count(d => d.IsError) > errorsBefore)
        {
            return null;
        }

        return new SyntaxTreeBuilder(source, diagnostics).Build(tree);
    }

    private static LogicProofParser.SchemeContext ParseTwoStage(CommonTokenStream tokens, SyntaxErrorListener listener)
    {
        var parser = new LogicProofParser(tokens, TextWriter.Null, TextWriter.Null);
        parser.RemoveErrorListeners();
        parser.Interpreter.PredictionMode = PredictionMode.SLL;
        parser.ErrorHandler = new BailErrorStrategy();
        try
        {
            return parser.scheme();
        }
        catch (ParseCanceledException)
        {
            // Either a real syntax error or a construct SLL cannot decide; full LL settles which, and reports.
        }

        tokens.Seek(0);
        parser.Reset();
        parser.Interpreter.PredictionMode = PredictionMode.LL;
        parser.ErrorHandler = new PlainWordsErrorStrategy();
        parser.AddErrorListener(listener);
        return parser.scheme();
    }
}
