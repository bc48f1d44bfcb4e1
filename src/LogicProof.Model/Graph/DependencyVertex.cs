using LogicProof.Core.Text;

namespace LogicProof.Model.Graph;

/// <summary>
/// A vertex of the dependency graph: an input, a variable, a function-block call site, or (when asked) a formula.
/// Vertices are compared by identity; names are unique within a graph (ordinal, case-insensitive).
/// </summary>
public sealed class DependencyVertex(string name, DependencyVertexKind kind, SourceSpan span, string? detail)
{
    public string Name { get; } = name;

    public DependencyVertexKind Kind { get; } = kind;

    /// <summary>The declaration, or the call site of a function block.</summary>
    public SourceSpan Span { get; } = span;

    /// <summary>For people: a declaration's description, or a function block's kind and preset ("TON T#500ms").</summary>
    public string? Detail { get; } = detail;

    /// <summary>Position in <see cref="DependencyGraph.Vertices"/>: inputs, variables, then call sites and formulas.</summary>
    public int Order { get; internal set; }

    public override string ToString() => Name;
}
