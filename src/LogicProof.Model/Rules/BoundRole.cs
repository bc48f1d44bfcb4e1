using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;

namespace LogicProof.Model.Rules;

/// <summary>
/// A role the scheme binds, checked: its signals (declared bool names, in the order written), or its duration
/// (a literal, or the time setting it names), or its policy word (lower case). <see cref="Span"/> is the binding
/// line in the roles section.
/// </summary>
public sealed record BoundRole(RoleDefinition Definition, SourceSpan Span)
{
    public IReadOnlyList<Symbol> Signals { get; init; } = [];

    public DurationSyntax? Duration { get; init; }

    /// <summary>The time setting the duration comes from, when the role names one.</summary>
    public string? DurationSetting { get; init; }

    public string? Policy { get; init; }

    /// <summary>How a rule formula reads the role: <c>A</c>, <c>(A OR B)</c>, a duration or setting name, or the policy word.</summary>
    public string FormulaText =>
        Definition.Kind switch
        {
            RoleValueKind.Duration => DurationSetting ?? Duration?.Text ?? string.Empty,
            RoleValueKind.Policy => Policy ?? string.Empty,
            _ when Signals.Count == 1 => Signals[0].Name,
            _ => "(" + string.Join(" OR ", Signals.Select(s => s.Name)) + ")",
        };
}
