using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Model.Lowering;

namespace LogicProof.Model.StaticChecks;

/// <summary>
/// Unused inputs and locals, and variables no equation writes. A name counts as used when another equation, a
/// formula, a role or a breaker-model setting names it; a variable read only by its own equation is unused (its
/// value goes nowhere). Outputs are never unused: they drive the relay's contacts.
/// </summary>
internal static class UsageCheck
{
    public static void Run(BoundScheme scheme, DiagnosticBag diagnostics)
    {
        var used = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        var written = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var equation in scheme.Equations)
        {
            written.Add(equation.Target.Name);
            foreach (var node in BoundTree.PreOrder(equation.Expression))
            {
                if (node is BoundSymbolReference reference
                    && !string.Equals(reference.Symbol.Name, equation.Target.Name, StringComparison.OrdinalIgnoreCase))
                {
                    used.Add(reference.Symbol.Name);
                }
            }
        }

        var formulas = scheme.Requirements.Select(r => r.Formula).Concat(scheme.Assumptions.Select(a => a.Formula));
        foreach (var node in formulas.SelectMany(BoundTree.PreOrder))
        {
            if (node is BoundSymbolReference reference)
            {
                used.Add(reference.Symbol.Name);
            }
        }

        foreach (var role in scheme.Syntax.Roles)
        {
            used.UnionWith(role.Values.OfType<NameRoleValueSyntax>().Select(v => v.Name));
        }

        if (scheme.Syntax.BreakerModel is { } breaker)
        {
            used.UnionWith(breaker.Settings.Select(s => s.Value).OfType<NamePlantValueSyntax>().Select(v => v.Name));
        }

        foreach (var input in scheme.Syntax.Inputs)
        {
            if (!used.Contains(input.Name))
            {
                var symbol = scheme.Symbols[input.Name];
                diagnostics.Warning(
                    ModelCodes.UnusedInput,
                    $"input '{symbol.Name}' is not read by any equation, formula or role",
                    symbol.DeclarationSpan);
            }
        }

        foreach (var variable in scheme.Syntax.Variables)
        {
            var symbol = scheme.Symbols[variable.Name];
            if (symbol.Kind == SymbolKind.Local && !used.Contains(symbol.Name))
            {
                diagnostics.Warning(
                    ModelCodes.UnusedLocal,
                    $"local '{symbol.Name}' is not read by any other equation, formula or role",
                    symbol.DeclarationSpan);
            }

            if (!written.Contains(symbol.Name))
            {
                var what = symbol.Kind == SymbolKind.Output ? "output" : "local";
                var value = symbol.Retained ? "its retained value" : symbol.PowerUp is null ? "FALSE or 0" : "its init value";
                diagnostics.Warning(
                    ModelCodes.UndrivenVariable,
                    $"{what} '{symbol.Name}' is not written by any equation: it keeps its power-up value ({value}) for ever",
                    symbol.DeclarationSpan);
            }
        }
    }
}
