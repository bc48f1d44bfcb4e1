using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Parsing;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Rules;

/// <summary>
/// Turns the selected built-in rules into properties of a scheme: for each rule, decides whether it applies (see
/// <see cref="RuleDefinition"/>), chooses its variant, writes its formula with the scheme's names, and parses and
/// binds that text with the language's own parser and binder against <paramref name="scheme"/> (the scheme the model
/// is built from, which may be the one with a breaker model). Each property is named by the rule id and points at
/// the roles that bind it.
/// </summary>
public static class RuleExpander
{
    public static RuleExpansion Expand(BoundScheme scheme, RoleBindings roles, RuleSelection selection, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(roles);
        ArgumentNullException.ThrowIfNull(selection);
        ArgumentNullException.ThrowIfNull(diagnostics);
        if (!CheckSelection(selection, diagnostics))
        {
            return new RuleExpansion([], [], []);
        }

        var applied = new List<AppliedRule>();
        var notApplicable = new List<NotApplicableRule>();
        var skipped = new List<RuleDefinition>();
        foreach (var rule in RuleCatalog.All)
        {
            if (!selection.Selects(rule.Id))
            {
                skipped.Add(rule);
                continue;
            }

            var (variant, missing, reason) = Choose(rule, roles);
            if (variant is null)
            {
                notApplicable.Add(new NotApplicableRule(rule, missing, reason!));
                continue;
            }

            var formula = RuleTemplate.Render(variant.Template, role => roles.Find(role)?.FormulaText)
                ?? throw new InvalidOperationException($"rule {rule.Id}: the chosen variant needs a role that is not bound");
            var property = Bind(scheme, roles, rule, formula, diagnostics);
            if (property is not null)
            {
                applied.Add(new AppliedRule(rule, variant, formula, property));
            }
        }

        return new RuleExpansion(applied, notApplicable, skipped);
    }

    /// <summary>Reports every id of the selection that no rule has; true when all are known.</summary>
    public static bool CheckSelection(RuleSelection selection, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(selection);
        ArgumentNullException.ThrowIfNull(diagnostics);
        var ok = true;
        foreach (var (ids, option) in new[] { (selection.Only ?? [], "--rules"), (selection.Skip, "--skip-rules") })
        {
            foreach (var id in ids.Where(id => RuleCatalog.Find(id) is null))
            {
                diagnostics.Error(
                    RuleCodes.UnknownRuleId,
                    $"{option}: '{id}' is not the id of a built-in rule; the rules are {string.Join(", ", RuleCatalog.All.Select(r => r.Id))}",
                    SourceSpan.None with { File = option });
                ok = false;
            }
        }

        return ok;
    }

    private static (RuleVariant? Variant, IReadOnlyList<string> Missing, string? Reason) Choose(RuleDefinition rule, RoleBindings roles)
    {
        var missing = rule.RequiredRoles.Where(role => !roles.IsBound(role)).ToList();
        var reasons = new List<string>();
        if (missing.Count > 0)
        {
            reasons.Add($"needs {string.Join(", ", missing)}");
        }

        if (rule.OneOfRoles.Count > 0 && !rule.OneOfRoles.Any(roles.IsBound))
        {
            missing.AddRange(rule.OneOfRoles);
            reasons.Add($"needs one of {string.Join(", ", rule.OneOfRoles)}");
        }

        if (missing.Count > 0)
        {
            return (null, missing, string.Join("; ", reasons));
        }

        foreach (var role in rule.ComputedRoles)
        {
            var input = roles.Get(role).Signals.FirstOrDefault(s => s.Kind == SymbolKind.Input);
            if (input is not null)
            {
                return (null, [], $"{role} '{input.Name}' is an input: the rule checks a latch the scheme computes, and this one is outside the logic");
            }
        }

        var matching = rule.Variants.Where(v => v.MatchesPolicy(roles)).ToList();
        if (matching.Count == 0)
        {
            var policy = rule.Variants.First(v => v.PolicyRole is not null).PolicyRole!;
            var words = rule.Variants.Where(v => v.PolicyRole == policy).Select(v => v.PolicyWord);
            return (null, [policy], $"needs {policy} ({string.Join(" or ", words)}): the rule has no form without it");
        }

        var chosen = matching.FirstOrDefault(v => v.NeedsRoles.All(roles.IsBound));
        if (chosen is not null)
        {
            return (chosen, [], null);
        }

        var first = matching[0];
        var lacking = first.NeedsRoles.Where(role => !roles.IsBound(role)).ToList();
        var withPolicy = first.PolicyRole is null ? string.Empty : $"with {first.PolicyRole} = {first.PolicyWord} it ";
        return (null, lacking, $"{withPolicy}needs {string.Join(", ", lacking)}");
    }

    private static ExtraProperty? Bind(BoundScheme scheme, RoleBindings roles, RuleDefinition rule, string formula, DiagnosticBag diagnostics)
    {
        var span = rule.AllRoles.Select(roles.Find).FirstOrDefault(role => role is not null)?.Span ?? SourceSpan.None;
        var problems = new DiagnosticBag();
        var syntax = FormulaReader.Parse($"rule {rule.Id}", formula, problems);
        var bound = syntax is null ? null : FormulaBinder.Bind(scheme, syntax, problems, $"the formula of rule {rule.Id}");
        if (bound is null || problems.HasErrors)
        {
            var detail = string.Join("; ", problems.Where(d => d.IsError).Select(d => $"{d.Code} {d.Message}"));
            diagnostics.Error(
                RuleCodes.RuleFormulaInvalid,
                $"internal error: the formula of rule {rule.Id}, '{formula}', does not fit this scheme ({detail}); skip the rule with --skip-rules {rule.Id}",
                span);
            return null;
        }

        return new ExtraProperty(rule.Id, bound, PropertyOrigin.Rule, span, rule.Statement);
    }
}
