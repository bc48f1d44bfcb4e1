using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary>
/// The syntax tree of one <c>.lpl</c> file: immutable, every node carrying its source span. Sections may appear
/// more than once in a file; their contents are concatenated here in the order written.
/// </summary>
public sealed record SchemeSyntax(
    string Name,
    string? Description,
    Fraction FrequencyHz,
    DurationSyntax ScanInterval,
    IReadOnlyList<InputDeclarationSyntax> Inputs,
    IReadOnlyList<SettingDeclarationSyntax> Settings,
    IReadOnlyList<VariableDeclarationSyntax> Variables,
    IReadOnlyList<EquationSyntax> Equations,
    IReadOnlyList<RoleBindingSyntax> Roles,
    BreakerModelSyntax? BreakerModel,
    IReadOnlyList<AssumptionSyntax> Assumptions,
    IReadOnlyList<RequirementSyntax> Requirements,
    SourceSpan Span);
