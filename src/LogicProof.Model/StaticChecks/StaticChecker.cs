using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Graph;

namespace LogicProof.Model.StaticChecks;

/// <summary>
/// Static checks of a bound scheme (LP30xx codes, see <see cref="ModelCodes"/>): unused inputs and locals,
/// undriven variables, reads before writes, feedback loops (implicit latches), timer presets of zero or not a whole
/// number of scans, and F_TRIG power-up pulses. None is an error: they point at logic that runs, but maybe not as
/// meant. Diagnostics come sorted by position. Walks are iterative, so big schemes are fine on any thread.
/// </summary>
public static class StaticChecker
{
    public static IReadOnlyList<Diagnostic> Check(BoundScheme scheme) => Check(scheme, DependencyGraph.Build(scheme));

    /// <param name="graph">The scheme's dependency graph, without formulas.</param>
    public static IReadOnlyList<Diagnostic> Check(BoundScheme scheme, DependencyGraph graph)
    {
        var diagnostics = new DiagnosticBag();
        UsageCheck.Run(scheme, diagnostics);
        ReadBeforeWriteCheck.Run(scheme, diagnostics);
        FeedbackLoopCheck.Run(scheme, graph, diagnostics);
        FunctionBlockCheck.Run(scheme, diagnostics);
        return [.. diagnostics
            .Select((diagnostic, order) => (diagnostic, order))
            .OrderBy(d => d.diagnostic.Span.Line)
            .ThenBy(d => d.diagnostic.Span.Column)
            .ThenBy(d => d.order)
            .Select(d => d.diagnostic)];
    }
}
