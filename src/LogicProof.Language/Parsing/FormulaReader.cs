using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language.Generated;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Parses one expression or formula given as text (not a whole scheme), with the same lexer, lexical checks,
/// nesting guard, parser rule <c>expr</c> and syntax-tree builder as a scheme file, so that generated formulas
/// (built-in rules, the breaker model) obey exactly the language users write. Text after a complete expression is
/// a syntax error. Spans point into a source named <c>origin</c>. Returns null after reporting any error.
/// Never throws for bad input.
/// </summary>
public static class FormulaReader
{
    public static ExpressionSyntax? Parse(string origin, string text, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(origin);
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(diagnostics);
        return LargeStack.Run(() => ParseOnCurrentStack(new SourceText(origin, text), diagnostics));
    }

    private static ExpressionSyntax? ParseOnCurrentStack(SourceText source, DiagnosticBag diagnostics)
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
        var parser = new LogicProofParser(tokens, TextWriter.Null, TextWriter.Null)
        {
            ErrorHandler = new PlainWordsErrorStrategy(),
        };
        parser.RemoveErrorListeners();
        parser.AddErrorListener(new SyntaxErrorListener(source, diagnostics, linesWithLexicalErrors));
        var tree = parser.expr();
        if (diagnostics.Count(d => d.IsError) == errorsBefore && tokens.LT(1) is { Type: not TokenConstants.EOF } extra)
        {
            diagnostics.Error(
                LanguageCodes.SyntaxError,
                $"the formula is complete before {TokenDescriber.DescribeFound(extra)}; an operator such as AND or OR is missing, or a parenthesis is unbalanced",
                source.SpanOf(extra));
        }

        if (diagnostics.Count(d => d.IsError) > errorsBefore)
        {
            return null;
        }

        var literals = new LiteralReader(source, diagnostics);
        var expression = new ExpressionBuilder(source, literals).Build(tree);
        return diagnostics.Count(d => d.IsError) > errorsBefore ? null : expression;
    }
}
