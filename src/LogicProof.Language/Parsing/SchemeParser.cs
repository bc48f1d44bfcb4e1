using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Source text of a whole scheme to its syntax tree (see <see cref="TwoStageParser"/> for the parse itself).
/// Returns null when the file has syntax errors. Callers run this on a large stack (see FrontEnd).
/// </summary>
internal static class SchemeParser
{
    public static SchemeSyntax? Parse(SourceText source, DiagnosticBag diagnostics)
    {
        var parsed = TwoStageParser.Parse(source, diagnostics, parser => parser.scheme());
        return parsed is null ? null : new SyntaxTreeBuilder(source, diagnostics).Build(parsed.Value.Tree);
    }
}
