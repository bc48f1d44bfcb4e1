using System.Text;
using LogicProof.Core.Threading;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Printing;

/// <summary>
/// Syntax tree to canonical source text: the header, then the sections in a fixed order (inputs, settings, locals,
/// outputs, logic, roles, breaker_model, assume, require), keywords in lower case, operators and TRUE/FALSE in
/// upper case, the fewest parentheses, numbers as exact decimals, durations and names as written, lines ending in
/// "\n" on every platform. Comments are not kept. Parsing the output gives the same tree (spans aside).
/// </summary>
public static class SchemePrinter
{
    private const string Indent = "    ";

    public static string Print(SchemeSyntax scheme) => LargeStack.Run(() => PrintOnCurrentStack(scheme));

    /// <summary>One expression in canonical form.</summary>
    public static string Print(ExpressionSyntax expression) => LargeStack.Run(() =>
    {
        var output = new StringBuilder();
        ExpressionPrinter.Write(output, expression);
        return output.ToString();
    });

    private static string PrintOnCurrentStack(SchemeSyntax scheme)
    {
        var output = new StringBuilder();
        output.Append("scheme ").Append(scheme.Name).Append(Description(scheme.Description)).Append(";\n");
        output.Append("frequency ").Append(NumberText.Format(scheme.FrequencyHz)).Append(" Hz;\n");
        output.Append("scan ").Append(scheme.ScanInterval.Text).Append(";\n");
        Section(output, "inputs", scheme.Inputs, Input);
        Section(output, "settings", scheme.Settings, Setting);
        Section(output, "locals", scheme.Variables.Where(v => v.Kind == VariableKind.Local).ToList(), Variable);
        Section(output, "outputs", scheme.Variables.Where(v => v.Kind == VariableKind.Output).ToList(), Variable);
        Section(output, "logic", scheme.Equations, Equation);
        Section(output, "roles", scheme.Roles, Role);
        if (scheme.BreakerModel is { } breakerModel)
        {
            // Printed even when empty: an empty block still says the scheme has a (default) breaker model.
            Section(output, "breaker_model", breakerModel.Settings, PlantSetting, evenIfEmpty: true);
        }

        Statements(output, scheme.Assumptions, Assumption);
        Statements(output, scheme.Requirements, Requirement);
        return output.ToString();
    }

    private static void Section<T>(StringBuilder output, string keyword, IReadOnlyList<T> items, Action<StringBuilder, T> write, bool evenIfEmpty = false)
    {
        if (items.Count == 0 && !evenIfEmpty)
        {
            return;
        }

        output.Append('\n').Append(keyword).Append('\n');
        foreach (var item in items)
        {
            output.Append(Indent);
            write(output, item);
            output.Append(";\n");
        }

        output.Append("end\n");
    }

    private static void Statements<T>(StringBuilder output, IReadOnlyList<T> items, Action<StringBuilder, T> write)
    {
        if (items.Count == 0)
        {
            return;
        }

        output.Append('\n');
        foreach (var item in items)
        {
            write(output, item);
            output.Append(";\n");
        }
    }

    private static void Input(StringBuilder output, InputDeclarationSyntax input)
    {
        output.Append(input.Name).Append(" : ").Append(TypeText.Of(input.Type));
        if (input.Range is { } range)
        {
            output.Append(" range ").Append(NumberText.Format(range.Low))
                .Append(" .. ").Append(NumberText.Format(range.High));
        }

        output.Append(Description(input.Description));
    }

    private static void Setting(StringBuilder output, SettingDeclarationSyntax setting)
    {
        output.Append(setting.Name).Append(" : ").Append(TypeText.Of(setting.Type)).Append(" = ");
        ExpressionPrinter.Write(output, setting.Value);
        output.Append(Description(setting.Description));
    }

    private static void Variable(StringBuilder output, VariableDeclarationSyntax variable)
    {
        output.Append(variable.Name).Append(" : ").Append(TypeText.Of(variable.Type));
        if (variable.Initial is { } initial)
        {
            output.Append(" init ");
            ExpressionPrinter.Write(output, initial);
        }
        else if (variable.Retained)
        {
            output.Append(" init retained");
        }

        output.Append(Description(variable.Description));
    }

    private static void Equation(StringBuilder output, EquationSyntax equation)
    {
        output.Append(equation.Target).Append(" := ");
        ExpressionPrinter.Write(output, equation.Expression);
    }

    private static void Role(StringBuilder output, RoleBindingSyntax role)
    {
        output.Append(role.Role).Append(" = ");
        output.AppendJoin(", ", role.Values.Select(v => v switch
        {
            NameRoleValueSyntax name => name.Name,
            DurationRoleValueSyntax duration => duration.Duration.Text,
            BoolRoleValueSyntax b => b.Value ? "TRUE" : "FALSE",
            _ => throw new InvalidOperationException($"unknown role value form {v.GetType().Name}"),
        }));
    }

    private static void PlantSetting(StringBuilder output, PlantSettingSyntax setting)
    {
        output.Append(setting.Key).Append(" = ");
        output.Append(setting.Value switch
        {
            DurationRangePlantValueSyntax range => $"{range.Low.Text} .. {range.High.Text}",
            DurationPlantValueSyntax duration => duration.Duration.Text,
            BoolPlantValueSyntax b => b.Value ? "TRUE" : "FALSE",
            NamePlantValueSyntax name => name.Name,
            _ => throw new InvalidOperationException($"unknown breaker model value form {setting.Value.GetType().Name}"),
        });
    }

    private static void Assumption(StringBuilder output, AssumptionSyntax assumption)
    {
        output.Append("assume ");
        if (assumption.Name is not null)
        {
            output.Append(assumption.Name).Append(": ");
        }

        ExpressionPrinter.Write(output, assumption.Formula);
    }

    private static void Requirement(StringBuilder output, RequirementSyntax requirement)
    {
        output.Append("require ").Append(requirement.Name).Append(": ");
        ExpressionPrinter.Write(output, requirement.Formula);
    }

    private static string Description(string? description) =>
        description is null ? string.Empty : " \"" + description.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";
}
