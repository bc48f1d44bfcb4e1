using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Model.Lowering;

namespace LogicProof.Model.Graph;

/// <summary>
/// Builds the <see cref="DependencyGraph"/> with the same read timing and call-site names as the model builder
/// (<c>TARGET.KIND#n</c>, numbered in evaluation order). Walks are iterative, so deep expressions are fine.
/// </summary>
internal sealed class DependencyGraphBuilder
{
    private readonly List<DependencyVertex> _vertices = [];
    private readonly List<DependencyEdge> _edges = [];
    private readonly Dictionary<string, DependencyVertex> _byName = new(StringComparer.OrdinalIgnoreCase);
    private readonly HashSet<(DependencyVertex, DependencyVertex, DependencyReadKind)> _edgeKeys = [];
    private readonly Dictionary<string, int> _writerEquation = new(StringComparer.OrdinalIgnoreCase);

    public static DependencyGraph Build(BoundScheme scheme, bool includeFormulas)
    {
        var builder = new DependencyGraphBuilder();
        builder.AddDeclarations(scheme);
        foreach (var equation in scheme.Equations)
        {
            builder._writerEquation[equation.Target.Name] = equation.Index;
        }

        foreach (var equation in scheme.Equations)
        {
            var target = builder._byName[equation.Target.Name];
            builder.AddReads(equation.Expression, target, equation.Index, equation.Syntax.Span);
        }

        if (includeFormulas)
        {
            foreach (var requirement in scheme.Requirements)
            {
                var vertex = builder.AddVertex(requirement.Name, DependencyVertexKind.Requirement, requirement.Syntax.Span, null);
                builder.AddReads(requirement.Formula, vertex, -1, requirement.Syntax.Span);
            }

            for (var i = 0; i < scheme.Assumptions.Count; i++)
            {
                var assumption = scheme.Assumptions[i];
                var name = HiddenNames.Assumption(assumption.Name, i);
                var vertex = builder.AddVertex(name, DependencyVertexKind.Assumption, assumption.Syntax.Span, null);
                builder.AddReads(assumption.Formula, vertex, -1, assumption.Syntax.Span);
            }
        }

        return new DependencyGraph(scheme.Syntax.Name, builder._vertices, builder._edges);
    }

    private void AddDeclarations(BoundScheme scheme)
    {
        foreach (var input in scheme.Syntax.Inputs)
        {
            var symbol = scheme.Symbols[input.Name];
            AddVertex(symbol.Name, DependencyVertexKind.Input, symbol.DeclarationSpan, symbol.Description);
        }

        foreach (var variable in scheme.Syntax.Variables)
        {
            var symbol = scheme.Symbols[variable.Name];
            var kind = symbol.Kind == SymbolKind.Output ? DependencyVertexKind.Output : DependencyVertexKind.Local;
            AddVertex(symbol.Name, kind, symbol.DeclarationSpan, symbol.Description);
        }
    }

    /// <param name="equationIndex">The reading equation's index in scan order, or -1 for a formula (reads this scan).</param>
    private void AddReads(BoundExpression root, DependencyVertex owner, int equationIndex, SourceSpan span)
    {
        var numbers = BoundTree.NumberInstances(root);
        var children = new List<BoundExpression>();
        var stack = new Stack<(BoundExpression Node, DependencyVertex Consumer)>();
        stack.Push((root, owner));
        while (stack.Count > 0)
        {
            var (node, consumer) = stack.Pop();
            switch (node)
            {
                case BoundSymbolReference reference:
                    AddEdge(_byName[reference.Symbol.Name], consumer, ReadKind(reference.Symbol, equationIndex), span);
                    continue;
                case BoundFunctionBlockCall call:
                    var kindName = BoundTree.BlockName(call.Kind);
                    var name = HiddenNames.Instance(owner.Name, kindName, numbers[call]);
                    var detail = call.Preset is { } preset ? $"{kindName} {preset.Value.Text}" : kindName;
                    var instance = AddVertex(name, DependencyVertexKind.FunctionBlock, call.Span, detail);
                    AddEdge(instance, consumer, DependencyReadKind.SameScan, span);
                    consumer = instance;
                    break;
            }

            children.Clear();
            BoundTree.AddChildren(node, children);
            for (var i = children.Count - 1; i >= 0; i--)
            {
                stack.Push((children[i], consumer));
            }
        }
    }

    private DependencyReadKind ReadKind(Symbol symbol, int equationIndex)
    {
        if (symbol.Kind == SymbolKind.Input || equationIndex < 0)
        {
            return DependencyReadKind.SameScan;
        }

        return _writerEquation.TryGetValue(symbol.Name, out var writer) && writer < equationIndex
            ? DependencyReadKind.SameScan
            : DependencyReadKind.LastScan;
    }

    private DependencyVertex AddVertex(string name, DependencyVertexKind kind, SourceSpan span, string? detail)
    {
        var unique = HiddenNames.Unique(name, _byName);
        var vertex = new DependencyVertex(unique, kind, span, detail);
        _vertices.Add(vertex);
        _byName.Add(unique, vertex);
        return vertex;
    }

    private void AddEdge(DependencyVertex source, DependencyVertex target, DependencyReadKind read, SourceSpan span)
    {
        if (_edgeKeys.Add((source, target, read)))
        {
            _edges.Add(new DependencyEdge(source, target, read, span));
        }
    }
}
