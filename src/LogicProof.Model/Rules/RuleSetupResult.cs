using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Plant;

namespace LogicProof.Model.Rules;

/// <summary>
/// Everything <c>check</c> needs from the roles, the rules and the breaker model for one scheme.
/// <see cref="ModelScheme"/> is the scheme to lower (with the breaker added when the file has a breaker_model
/// block); it is null when <see cref="Diagnostics"/> hold an error (an input error: exit 3).
/// </summary>
public sealed record RuleSetupResult(
    BoundScheme? ModelScheme,
    RoleBindings Roles,
    RuleExpansion Rules,
    BreakerModelExpansion Breaker,
    IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Diagnostics.Any(d => d.IsError);

    /// <summary>The applied rules as properties, for <c>ModelBuilder.Build(ModelScheme, ExtraProperties)</c>.</summary>
    public IReadOnlyList<ExtraProperty> ExtraProperties => Rules.Properties;

    public IReadOnlyList<NotApplicableRule> NotApplicable => Rules.NotApplicable;

    /// <summary>TRUE when 52a/52b are driven by the breaker model, FALSE when they are free inputs.</summary>
    public bool BreakerModelled => Breaker.StatusModelled;
}
