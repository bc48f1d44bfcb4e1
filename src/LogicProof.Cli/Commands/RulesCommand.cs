using System.CommandLine;
using System.Globalization;
using LogicProof.Cli.Output;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Rules;

namespace LogicProof.Cli.Commands;

/// <summary>
/// The <c>rules</c> command: lists the built-in close-supervision rules (id, statement, roles needed), explains one
/// with <c>--explain ID</c> (statement, reason in the trade, roles, formula templates and the condition for each),
/// or lists the roles a scheme can bind with <c>--roles</c>. An unknown id is an input error (exit 3).
/// Everything printed comes from <see cref="RuleCatalog"/> and <see cref="RoleCatalog"/>.
/// </summary>
public static class RulesCommand
{
    public static Command Create()
    {
        var explain = new Option<string>("--explain")
        {
            Description = "Explain one rule: statement, reason, roles and formula.",
            HelpName = "ID",
        };
        var roles = new Option<bool>("--roles") { Description = "List the roles a scheme binds in its roles section." };
        var command = new Command("rules", "List the built-in close-supervision rules, or explain one.");
        command.Options.Add(explain);
        command.Options.Add(roles);
        command.SetAction(parseResult =>
        {
            var output = parseResult.InvocationConfiguration.Output;
            var error = parseResult.InvocationConfiguration.Error;
            if (parseResult.GetValue(explain) is { } id)
            {
                return Explain(id, output, error);
            }

            if (parseResult.GetValue(roles))
            {
                ListRoles(output);
                return ExitCodes.Success;
            }

            ListRules(output);
            return ExitCodes.Success;
        });
        return command;
    }

    private static void ListRules(TextWriter output)
    {
        output.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"{RuleCatalog.All.Count} built-in close-supervision rules ('logicproof rules --explain ID' gives the reason and the formula):"));
        foreach (var rule in RuleCatalog.All)
        {
            output.WriteLine();
            output.WriteLine(rule.Id);
            output.WriteLine($"    {rule.Statement}");
            output.WriteLine($"    needs: {rule.NeededRolesText}");
        }
    }

    private static void ListRoles(TextWriter output)
    {
        output.WriteLine("Roles, bound in a scheme's roles section as 'role = NAME, NAME;':");
        foreach (var role in RoleCatalog.All)
        {
            var value = role.Kind switch
            {
                RoleValueKind.Duration => "a duration or a time setting",
                RoleValueKind.Policy => string.Join(" | ", role.Choices),
                RoleValueKind.ComputedSignal => "a bool local or output",
                _ => role.TakesSeveral ? "one or more bool signals" : "a bool signal",
            };
            output.WriteLine($"  {role.Name,-24} {value}: {role.Description}");
        }
    }

    private static int Explain(string id, TextWriter output, TextWriter error)
    {
        if (RuleCatalog.Find(id) is not { } rule)
        {
            var unknown = new Diagnostic(
                RuleCodes.UnknownRuleId,
                Severity.Error,
                $"'{id}' is not the id of a built-in rule; the rules are {string.Join(", ", RuleCatalog.All.Select(r => r.Id))}",
                SourceSpan.None with { File = "--explain" });
            DiagnosticPrinter.Print(error, [unknown], null);
            return ExitCodes.InputError;
        }

        output.WriteLine(rule.Id);
        output.WriteLine($"  statement: {rule.Statement}");
        output.WriteLine($"  reason:    {rule.Reason}");
        output.WriteLine($"  needs:     {rule.NeededRolesText}");
        output.WriteLine($"  may use:   {(rule.OptionalRoles.Count == 0 ? "no other role" : string.Join(", ", rule.OptionalRoles))}");
        if (rule.ComputedRoles.Count > 0)
        {
            output.WriteLine($"  applies only when {string.Join(", ", rule.ComputedRoles)} is computed by the scheme (a local or output)");
        }

        output.WriteLine(rule.Variants.Count == 1 ? "  formula (must hold at every scan):" : "  formulas (must hold at every scan; the first that fits is used):");
        foreach (var variant in rule.Variants)
        {
            output.WriteLine($"    {variant.Condition}:");
            output.WriteLine($"      {variant.Template}");
        }

        output.WriteLine("  {role} stands for the names bound to the role, (A OR B) for several; a part in [ ] is left out when its role is not bound.");
        if (rule.DesignNote is { } note)
        {
            output.WriteLine($"  note:      {note}");
        }

        return ExitCodes.Success;
    }
}
