using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>
/// Name resolution and type checking of a whole scheme: declarations, equations (in scan order; each target a local
/// or output assigned once), require and assume formulas (bool; past-time operators and -> allowed only there).
/// Reports every error it finds; returns the bound scheme only when the diagnostics hold no error at all.
/// Roles and the breaker model are left to the rules layer. Runs on a large stack, since expression trees of long
/// chains are deep.
/// </summary>
public static class SchemeBinder
{
    public static BoundScheme? Bind(SchemeSyntax scheme, DiagnosticBag diagnostics) =>
        LargeStack.Run(() => BindOnCurrentStack(scheme, diagnostics));

    private static BoundScheme? BindOnCurrentStack(SchemeSyntax scheme, DiagnosticBag diagnostics)
    {
        var symbols = new DeclarationBinder(diagnostics).Declare(scheme);
        var expressions = new ExpressionBinder(symbols, diagnostics);
        var equations = BindEquations(scheme, symbols, expressions, diagnostics);
        var requirements = new List<BoundRequirement>();
        var requirementNames = new Dictionary<string, RequirementSyntax>(StringComparer.OrdinalIgnoreCase);
        foreach (var requirement in scheme.Requirements)
        {
            if (!requirementNames.TryAdd(requirement.Name, requirement))
            {
                ReportDuplicateProperty("requirement", requirement.Name, requirement.NameSpan, requirementNames[requirement.Name].NameSpan, diagnostics);
            }

            var formula = expressions.BindAs(requirement.Formula, ValueType.Bool, inFormula: true, $"the formula of requirement {requirement.Name}");
            if (formula is not null)
            {
                requirements.Add(new BoundRequirement(requirement.Name, formula, requirement));
            }
        }

        var assumptions = new List<BoundAssumption>();
        var assumptionNames = new Dictionary<string, AssumptionSyntax>(StringComparer.OrdinalIgnoreCase);
        foreach (var assumption in scheme.Assumptions)
        {
            if (assumption.Name is { } name && !assumptionNames.TryAdd(name, assumption))
            {
                ReportDuplicateProperty("assumption", name, assumption.Span, assumptionNames[name].Span, diagnostics);
            }

            var formula = expressions.BindAs(assumption.Formula, ValueType.Bool, inFormula: true, "an assumption");
            if (formula is not null)
            {
                assumptions.Add(new BoundAssumption(assumption.Name, formula, assumption));
            }
        }

        return diagnostics.HasErrors ? null : new BoundScheme(scheme, symbols, equations, requirements, assumptions);
    }

    private static List<BoundEquation> BindEquations(
        SchemeSyntax scheme, Dictionary<string, Symbol> symbols, ExpressionBinder expressions, DiagnosticBag diagnostics)
    {
        var equations = new List<BoundEquation>();
        var assigned = new Dictionary<string, EquationSyntax>(StringComparer.OrdinalIgnoreCase);
        foreach (var equation in scheme.Equations)
        {
            var target = Target(equation, symbols, assigned, diagnostics);
            var role = $"the value assigned to {equation.Target}";
            var expression = target is null
                ? expressions.Bind(equation.Expression, inFormula: false)
                : expressions.BindAs(equation.Expression, target.Type, inFormula: false, role);
            if (target is not null && expression is not null)
            {
                equations.Add(new BoundEquation(equations.Count, target, expression, equation));
            }
        }

        return equations;
    }

    private static Symbol? Target(
        EquationSyntax equation, Dictionary<string, Symbol> symbols, Dictionary<string, EquationSyntax> assigned, DiagnosticBag diagnostics)
    {
        if (!symbols.TryGetValue(equation.Target, out var target))
        {
            diagnostics.Error(LanguageCodes.UndefinedName, $"'{equation.Target}' is not declared; declare it under locals or outputs", equation.TargetSpan);
            return null;
        }

        if (target.Kind is SymbolKind.Input or SymbolKind.Setting)
        {
            diagnostics.Error(
                LanguageCodes.TargetNotAssignable,
                $"'{target.Name}' is {(target.Kind == SymbolKind.Input ? "an input" : "a setting")} and cannot be assigned; only locals and outputs can",
                equation.TargetSpan,
                new RelatedLocation($"'{target.Name}' is declared here", target.DeclarationSpan));
            return null;
        }

        if (!assigned.TryAdd(target.Name, equation))
        {
            diagnostics.Error(
                LanguageCodes.AssignedTwice,
                $"'{target.Name}' is assigned by two equations; each local or output has exactly one",
                equation.TargetSpan,
                new RelatedLocation($"the first equation of '{target.Name}'", assigned[target.Name].TargetSpan));
            return null;
        }

        return target;
    }

    private static void ReportDuplicateProperty(string what, string name, SourceSpan span, SourceSpan first, DiagnosticBag diagnostics) =>
        diagnostics.Error(
            LanguageCodes.DuplicatePropertyName, $"two {what}s are named '{name}'", span, new RelatedLocation($"the first {what} named '{name}'", first));
}
