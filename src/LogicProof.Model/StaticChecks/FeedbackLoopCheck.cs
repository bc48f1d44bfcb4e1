using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Graph;

namespace LogicProof.Model.StaticChecks;

/// <summary>
/// Lists each feedback loop through last-scan values (one per strongly connected component of the dependency
/// graph): such a loop holds its state like a latch. Its memories are the names read at the last scan inside the
/// loop; when one has no declared <c>init</c>, its power-up is unknown and every rule must hold from either value,
/// so the loop is a warning; with every power-up declared it is a note. The place is the first last-scan read of
/// the loop in scan order; the memories' declarations are related places.
/// </summary>
internal static class FeedbackLoopCheck
{
    /// <summary>Names listed in one message; a generated scheme can have loops of thousands.</summary>
    private const int MaxNamesListed = 12;

    public static void Run(BoundScheme scheme, DependencyGraph graph, DiagnosticBag diagnostics)
    {
        var loops = graph.FeedbackLoops();
        var loopOf = new Dictionary<DependencyVertex, int>();
        for (var i = 0; i < loops.Count; i++)
        {
            foreach (var member in loops[i])
            {
                loopOf.Add(member, i);
            }
        }

        var lastScanEdges = loops.Select(_ => new List<DependencyEdge>()).ToList();
        foreach (var edge in graph.Edges)
        {
            if (edge.Read == DependencyReadKind.LastScan
                && loopOf.TryGetValue(edge.Source, out var loop)
                && loopOf.TryGetValue(edge.Target, out var targetLoop)
                && loop == targetLoop)
            {
                lastScanEdges[loop].Add(edge);
            }
        }

        for (var i = 0; i < loops.Count; i++)
        {
            Report(scheme, loops[i], lastScanEdges[i], diagnostics);
        }
    }

    private static void Report(BoundScheme scheme, IReadOnlyList<DependencyVertex> loop, List<DependencyEdge> lastScanEdges, DiagnosticBag diagnostics)
    {
        var memories = lastScanEdges.Select(e => e.Source).Distinct().OrderBy(v => v.Order).ToList();
        var undeclared = memories
            .Where(v => !scheme.Symbols.TryGetValue(v.Name, out var symbol) || symbol is { PowerUp: null, Retained: false })
            .ToHashSet();
        var powerUp = undeclared.Count == 0
            ? $"power-up declared (init) for {List(memories)}"
            : $"no power-up value declared for {List(memories.Where(undeclared.Contains))}: unknown at power-up, " +
              "so every rule must hold from either value (declare it with init, or init retained for a non-volatile memory)";
        var diagnostic = new Diagnostic(
            ModelCodes.FeedbackLoop,
            undeclared.Count == 0 ? Severity.Info : Severity.Warning,
            $"feedback loop through last-scan values (an implicit latch): {List(loop)}; {powerUp}",
            lastScanEdges[0].Span)
        {
            Related = [.. memories.Take(MaxNamesListed).Select(v => new RelatedLocation(
                undeclared.Contains(v) ? $"'{v.Name}' is declared here without init" : $"'{v.Name}' is declared here with init",
                v.Span))],
        };
        diagnostics.Add(diagnostic);
    }

    private static string List(IEnumerable<DependencyVertex> vertices)
    {
        var all = vertices.ToList();
        var shown = string.Join(", ", all.Take(MaxNamesListed).Select(v => v.Name));
        return all.Count <= MaxNamesListed
            ? shown
            : string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{shown} and {all.Count - MaxNamesListed} more");
    }
}
