using LogicProof.Language.Syntax;

namespace LogicProof.Language.Binding;

/// <summary>
/// A scheme after name resolution and type checking: every name found, every expression typed. Produced only
/// for a file without errors. <see cref="Symbols"/> uses an ordinal case-insensitive comparer.
/// </summary>
public sealed record BoundScheme(
    SchemeSyntax Syntax,
    IReadOnlyDictionary<string, Symbol> Symbols,
    IReadOnlyList<BoundEquation> Equations,
    IReadOnlyList<BoundRequirement> Requirements,
    IReadOnlyList<BoundAssumption> Assumptions);

/// <summary>An equation; <see cref="Index"/> is its position in scan order (0-based).</summary>
public sealed record BoundEquation(int Index, Symbol Target, BoundExpression Expression, EquationSyntax Syntax);

public sealed record BoundRequirement(string Name, BoundExpression Formula, RequirementSyntax Syntax);

public sealed record BoundAssumption(string? Name, BoundExpression Formula, AssumptionSyntax Syntax);
