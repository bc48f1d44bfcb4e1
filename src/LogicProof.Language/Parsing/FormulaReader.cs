using Antlr4.Runtime;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Parses one expression or formula given as text (not a whole scheme), with the same lexer, lexical checks,
/// nesting guard and two-stage parse (<see cref="TwoStageParser"/>, from the parser rule <c>expr</c>) and the same
/// syntax-tree builder as a scheme file, so that generated formulas (built-in rules, the breaker model) obey exactly
/// the language users write. Text after a complete expression is a syntax error. Spans point into a source named
/// <c>origin</c>. Returns null after reporting any error. Never throws for bad input.
/// </summary>
public static class FormulaReader
{
    public static ExpressionSyntax? Parse(string origin, string text, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(origin);
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(diagnostics);
        var found = new DiagnosticBag();
        var expression = LargeStack.Run(() => ParseOnCurrentStack(new SourceText(origin, text), found));
        diagnostics.AddRange(found);
        return found.HasErrors ? null : expression;
    }

    private static ExpressionSyntax? ParseOnCurrentStack(SourceText source, DiagnosticBag diagnostics)
    {
        var parsed = TwoStageParser.Parse(source, diagnostics, parser => parser.expr());
        if (parsed is null)
        {
            return null;
        }

        var (tree, tokens) = parsed.Value;
        if (tokens.LT(1) is { Type: not TokenConstants.EOF } extra)
        {
            diagnostics.Error(
                LanguageCodes.SyntaxError,
                $"the formula is complete before {TokenDescriber.DescribeFound(extra)}; an operator such as AND or OR is missing, or a parenthesis is unbalanced",
                source.SpanOf(extra));
            return null;
        }

        return new ExpressionBuilder(source, new LiteralReader(source, diagnostics)).Build(tree);
    }
}
