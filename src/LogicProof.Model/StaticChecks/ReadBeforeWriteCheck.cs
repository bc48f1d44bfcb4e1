using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;

namespace LogicProof.Model.StaticChecks;

/// <summary>
/// An equation that reads a name written by a later equation sees that name's value from the last scan: a
/// one-scan delay, which relays and PLCs have but which is easy to miss. Reported once per reading equation and
/// name, at the first read, with the writing equation as a related place. Reading the equation's own target (a
/// seal-in) is a feedback loop, reported by <see cref="FeedbackLoopCheck"/>.
/// </summary>
internal static class ReadBeforeWriteCheck
{
    public static void Run(BoundScheme scheme, DiagnosticBag diagnostics)
    {
        var writer = new Dictionary<string, BoundEquation>(StringComparer.OrdinalIgnoreCase);
        foreach (var equation in scheme.Equations)
        {
            writer[equation.Target.Name] = equation;
        }

        var reported = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var equation in scheme.Equations)
        {
            reported.Clear();
            foreach (var node in BoundTree.PreOrder(equation.Expression))
            {
                if (node is not BoundSymbolReference reference
                    || !writer.TryGetValue(reference.Symbol.Name, out var writing)
                    || writing.Index <= equation.Index
                    || !reported.Add(reference.Symbol.Name))
                {
                    continue;
                }

                var name = reference.Symbol.Name;
                var diagnostic = new Diagnostic(
                    ModelCodes.ReadBeforeWrite,
                    Severity.Warning,
                    $"'{name}' is read here before its equation runs, so this equation sees its value from the last scan " +
                    $"(a one-scan delay); move the equation of '{name}' before this one if that is not intended",
                    reference.Span)
                {
                    Related = [new RelatedLocation($"'{name}' is written here, later in scan order", writing.Syntax.Span)],
                };
                diagnostics.Add(diagnostic);
            }
        }
    }
}
