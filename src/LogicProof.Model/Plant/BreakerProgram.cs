using System.Text;

namespace LogicProof.Model.Plant;

/// <summary>
/// The breaker model as it is added to a scheme, written in the language: free inputs the checker chooses, locals
/// (all start FALSE), equations that run first in every scan (the breaker), equations that run last (the coil
/// outputs latched for the breaker to see at the next scan) and assumptions (the travel times, close-into-fault).
/// <see cref="DrivenStatuses"/> are the scheme's status inputs that become locals driven by the model.
/// <see cref="ToText"/> gives the whole program as a reader would write it.
/// </summary>
public sealed record BreakerProgram(
    string Prefix,
    IReadOnlyList<BreakerProgramDeclaration> Inputs,
    IReadOnlyList<BreakerProgramDeclaration> Locals,
    IReadOnlyList<BreakerProgramStatement> FirstEquations,
    IReadOnlyList<BreakerProgramStatement> LastEquations,
    IReadOnlyList<BreakerProgramStatement> Assumptions,
    IReadOnlyList<string> DrivenStatuses)
{
    public string ToText()
    {
        var text = new StringBuilder();
        text.Append("// The breaker model, as the checker adds it to the scheme. ")
            .Append(string.Join(" and ", DrivenStatuses))
            .Append(DrivenStatuses.Count == 1 ? " is no longer an input: the equations below drive it.\n" : " are no longer inputs: the equations below drive them.\n");
        text.Append("inputs\n");
        foreach (var input in Inputs)
        {
            text.Append("    ").Append(input.Name).Append(" : bool \"").Append(input.Description).Append("\";\n");
        }

        text.Append("end\nlocals\n");
        foreach (var local in Locals)
        {
            text.Append("    ").Append(local.Name).Append(" : bool init FALSE \"").Append(local.Description).Append("\";\n");
        }

        text.Append("end\nlogic\n    // first in every scan, before the scheme's own equations\n");
        AppendEquations(text, FirstEquations);
        text.Append("    // last in every scan, after the scheme's own equations\n");
        AppendEquations(text, LastEquations);
        text.Append("end\n");
        foreach (var assumption in Assumptions)
        {
            text.Append("assume ").Append(assumption.Name).Append(": ").Append(assumption.Formula).Append(";\n");
        }

        return text.ToString();
    }

    private static void AppendEquations(StringBuilder text, IEnumerable<BreakerProgramStatement> equations)
    {
        foreach (var equation in equations)
        {
            text.Append("    ").Append(equation.Name).Append(" := ").Append(equation.Formula).Append(";\n");
        }
    }
}
