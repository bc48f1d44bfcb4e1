using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;

namespace LogicProof.Language;

/// <summary>
/// What the front end made of one file. <see cref="Syntax"/> is set when the file was read and parsed (it may still
/// carry errors listed in <see cref="Diagnostics"/>, such as an invalid duration or an undefined name);
/// <see cref="Scheme"/> is set only when there is no error at all.
/// </summary>
public sealed record FrontEndResult(
    SourceText Source,
    SchemeSyntax? Syntax,
    BoundScheme? Scheme,
    IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Diagnostics.Any(d => d.IsError);
}
