using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// A property that does not come from a <c>require</c> of the scheme, such as a built-in close-supervision rule
/// applied through the roles. Its formula is lowered like a requirement: it must hold at every scan.
/// </summary>
public sealed record ExtraProperty(string Name, BoundExpression Formula, PropertyOrigin Origin, SourceSpan Span, string? Statement);
