using LogicProof.Core.Text;
using QuikGraph;

namespace LogicProof.Model.Graph;

/// <summary>
/// <see cref="Source"/> is read by <see cref="Target"/>: by the target's equation, or as an input of a function
/// block, or (edge from a function block to its consumer) its output feeds the target in the same scan.
/// <see cref="Span"/> is the equation or formula where the read is written.
/// </summary>
public sealed class DependencyEdge(DependencyVertex source, DependencyVertex target, DependencyReadKind read, SourceSpan span)
    : IEdge<DependencyVertex>
{
    public DependencyVertex Source { get; } = source;

    public DependencyVertex Target { get; } = target;

    public DependencyReadKind Read { get; } = read;

    public SourceSpan Span { get; } = span;

    public override string ToString() => $"{Source.Name} -> {Target.Name} ({Read})";
}
