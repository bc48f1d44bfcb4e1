using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Model.Rules;

/// <summary>
/// Checks the scheme's <c>roles</c> section against the fixed roles (<see cref="RoleCatalog"/>) and the scheme's
/// declarations. Strictness: every mistake that would make a rule check something other than what the user meant is
/// an error (an unknown role name, a role bound twice, a value of the wrong kind, an undeclared name, a real or a
/// setting where a bool signal is needed, several names for a one-name role, an unknown policy word, an input where
/// the scheme must compute the signal); a name repeated within one role is only a warning. A role with an error is
/// left unbound, so the rules needing it become not applicable instead of being checked wrongly.
/// </summary>
public static class RoleBinder
{
    public static RoleBindings Bind(BoundScheme scheme, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(diagnostics);
        var bound = new List<BoundRole>();
        var firstBinding = new Dictionary<string, RoleBindingSyntax>(StringComparer.OrdinalIgnoreCase);
        foreach (var binding in scheme.Syntax.Roles)
        {
            var definition = RoleCatalog.Find(binding.Role);
            if (definition is null)
            {
                diagnostics.Error(
                    RuleCodes.UnknownRole,
                    $"'{binding.Role}' is not a role; the roles are {string.Join(", ", RoleCatalog.All.Select(r => r.Name))}",
                    binding.RoleSpan);
                continue;
            }

            if (!firstBinding.TryAdd(definition.Name, binding))
            {
                diagnostics.Add(new Diagnostic(RuleCodes.RoleBoundTwice, Severity.Error, $"the role {definition.Name} is bound twice", binding.RoleSpan)
                {
                    Related = [new RelatedLocation($"the first binding of {definition.Name}", firstBinding[definition.Name].RoleSpan)],
                });
                continue;
            }

            var role = definition.Kind switch
            {
                RoleValueKind.Duration => BindDuration(scheme, definition, binding, diagnostics),
                RoleValueKind.Policy => BindPolicy(definition, binding, diagnostics),
                _ => BindSignals(scheme, definition, binding, diagnostics),
            };
            if (role is not null)
            {
                bound.Add(role);
            }
        }

        return new RoleBindings(bound);
    }

    private static BoundRole? BindSignals(BoundScheme scheme, RoleDefinition definition, RoleBindingSyntax binding, DiagnosticBag diagnostics)
    {
        if (!TakesThisManyValues(definition, binding, diagnostics))
        {
            return null;
        }

        var signals = new List<Symbol>();
        var ok = true;
        foreach (var value in binding.Values)
        {
            if (value is not NameRoleValueSyntax name)
            {
                diagnostics.Error(
                    RuleCodes.RoleValueKind,
                    $"the role {definition.Name} takes {(definition.TakesSeveral ? "names" : "the name")} of bool signals, not {Describe(value)}",
                    value.Span);
                ok = false;
                continue;
            }

            var symbol = Signal(scheme, definition, name, diagnostics);
            if (symbol is null)
            {
                ok = false;
            }
            else if (signals.Contains(symbol))
            {
                diagnostics.Warning(RuleCodes.RoleNameRepeated, $"'{symbol.Name}' is given twice to the role {definition.Name}", name.Span);
            }
            else
            {
                signals.Add(symbol);
            }
        }

        return ok ? new BoundRole(definition, binding.Span) { Signals = signals } : null;
    }

    private static Symbol? Signal(BoundScheme scheme, RoleDefinition definition, NameRoleValueSyntax name, DiagnosticBag diagnostics)
    {
        if (!scheme.Symbols.TryGetValue(name.Name, out var symbol))
        {
            diagnostics.Error(RuleCodes.RoleNameUndeclared, $"'{name.Name}' is not declared; the role {definition.Name} needs a bool input, local or output of the scheme", name.Span);
            return null;
        }

        string? problem = null;
        var code = RuleCodes.RoleNeedsBoolSignal;
        if (symbol.Kind == SymbolKind.Setting)
        {
            problem = $"'{symbol.Name}' is a setting, a constant; the role {definition.Name} needs a bool signal (an input, local or output)";
        }
        else if (symbol.Type != ValueType.Bool)
        {
            problem = $"'{symbol.Name}' is {TypeWord(symbol.Type)}; the role {definition.Name} needs a bool signal";
        }
        else if (definition.Kind == RoleValueKind.ComputedSignal && symbol.Kind == SymbolKind.Input)
        {
            code = RuleCodes.RoleNeedsComputedSignal;
            problem = $"'{symbol.Name}' is an input; the role {definition.Name} needs a local or output that the scheme computes";
        }

        if (problem is null)
        {
            return symbol;
        }

        diagnostics.Add(new Diagnostic(code, Severity.Error, problem, name.Span)
        {
            Related = [new RelatedLocation($"'{symbol.Name}' is declared here", symbol.DeclarationSpan)],
        });
        return null;
    }

    private static BoundRole? BindDuration(BoundScheme scheme, RoleDefinition definition, RoleBindingSyntax binding, DiagnosticBag diagnostics)
    {
        if (!TakesThisManyValues(definition, binding, diagnostics))
        {
            return null;
        }

        var value = binding.Values[0];
        switch (value)
        {
            case DurationRoleValueSyntax duration:
                return new BoundRole(definition, binding.Span) { Duration = duration.Duration };
            case NameRoleValueSyntax name when scheme.Symbols.TryGetValue(name.Name, out var symbol)
                                               && symbol is { Kind: SymbolKind.Setting, SettingValue: BoundDurationConstant setting }:
                return new BoundRole(definition, binding.Span) { Duration = setting.Duration, DurationSetting = symbol.Name };
            case NameRoleValueSyntax name when !scheme.Symbols.ContainsKey(name.Name):
                diagnostics.Error(RuleCodes.RoleNameUndeclared, $"'{name.Name}' is not declared; the role {definition.Name} needs a duration or a setting of type time", name.Span);
                return null;
            default:
                diagnostics.Error(
                    RuleCodes.RoleNeedsDuration,
                    $"the role {definition.Name} needs a duration (such as T#500ms or 30 cyc) or a setting of type time, not {Describe(value)}",
                    value.Span);
                return null;
        }
    }

    private static BoundRole? BindPolicy(RoleDefinition definition, RoleBindingSyntax binding, DiagnosticBag diagnostics)
    {
        if (!TakesThisManyValues(definition, binding, diagnostics))
        {
            return null;
        }

        var value = binding.Values[0];
        var choice = value is NameRoleValueSyntax name
            ? definition.Choices.FirstOrDefault(c => string.Equals(c, name.Name, StringComparison.OrdinalIgnoreCase))
            : null;
        if (choice is null)
        {
            diagnostics.Error(
                RuleCodes.UnknownPolicyWord,
                $"{Describe(value)} is not a choice of {definition.Name}; write {string.Join(" or ", definition.Choices)}",
                value.Span);
            return null;
        }

        return new BoundRole(definition, binding.Span) { Policy = choice };
    }

    private static bool TakesThisManyValues(RoleDefinition definition, RoleBindingSyntax binding, DiagnosticBag diagnostics)
    {
        if (definition.TakesSeveral || binding.Values.Count <= 1)
        {
            return true;
        }

        var what = definition.Kind switch
        {
            RoleValueKind.Duration => "one duration",
            RoleValueKind.Policy => "one word",
            _ => "one name",
        };
        diagnostics.Error(
            RuleCodes.RoleTakesOneValue,
            string.Create(CultureInfo.InvariantCulture, $"the role {definition.Name} takes {what}, not {binding.Values.Count}"),
            binding.Values[1].Span);
        return false;
    }

    private static string Describe(RoleValueSyntax value) => value switch
    {
        NameRoleValueSyntax name => $"'{name.Name}'",
        DurationRoleValueSyntax duration => $"the duration {duration.Duration.Text}",
        BoolRoleValueSyntax b => b.Value ? "TRUE" : "FALSE",
        _ => "this value",
    };

    private static string TypeWord(ValueType type) => type switch
    {
        ValueType.Real => "a real",
        ValueType.Time => "a time",
        _ => "a bool",
    };
}
