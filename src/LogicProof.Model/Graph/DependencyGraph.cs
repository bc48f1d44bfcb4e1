using LogicProof.Language.Binding;
using QuikGraph;
using QuikGraph.Algorithms;
using QuikGraph.Algorithms.Search;

namespace LogicProof.Model.Graph;

/// <summary>
/// Which names of a scheme read which, built from the bound scheme. Vertices are the inputs, locals, outputs and
/// function-block call sites (and, when asked, the require/assume formulas; past-time monitors never appear). An
/// edge A -> B means B reads A, labelled with the read timing the scan model uses. Every cycle goes through at
/// least one last-scan edge, since same-scan reads only look back in scan order. A call site is always its own
/// vertex (<c>FAIL.TON#1 -> FAIL</c>), also when it is the whole equation and the scan model lets it write the
/// variable's cell directly; numbering is the model's (evaluation order within the equation).
/// </summary>
public sealed class DependencyGraph
{
    private readonly BidirectionalGraph<DependencyVertex, DependencyEdge> _graph;
    private readonly Dictionary<string, DependencyVertex> _byName;

    internal DependencyGraph(string schemeName, IReadOnlyList<DependencyVertex> vertices, IReadOnlyList<DependencyEdge> edges)
    {
        SchemeName = schemeName;
        Vertices = vertices;
        Edges = edges;
        _byName = new Dictionary<string, DependencyVertex>(vertices.Count, StringComparer.OrdinalIgnoreCase);
        _graph = new BidirectionalGraph<DependencyVertex, DependencyEdge>(allowParallelEdges: true, vertices.Count);
        for (var i = 0; i < vertices.Count; i++)
        {
            vertices[i].Order = i;
            _byName.Add(vertices[i].Name, vertices[i]);
            _graph.AddVertex(vertices[i]);
        }

        _graph.AddEdgeRange(edges);
    }

    public string SchemeName { get; }

    /// <summary>Inputs and variables in declaration order, then call sites and formulas in scan order.</summary>
    public IReadOnlyList<DependencyVertex> Vertices { get; }

    /// <summary>In scan order of the reading equation; at most one edge per source, target and read kind.</summary>
    public IReadOnlyList<DependencyEdge> Edges { get; }

    /// <summary>The graph for QuikGraph algorithms (read it, do not change it).</summary>
    public IBidirectionalGraph<DependencyVertex, DependencyEdge> Graph => _graph;

    public static DependencyGraph Build(BoundScheme scheme, bool includeFormulas = false) =>
        DependencyGraphBuilder.Build(scheme, includeFormulas);

    public DependencyVertex? Find(string name) => _byName.GetValueOrDefault(name);

    public IEnumerable<DependencyEdge> ReadsBy(DependencyVertex vertex) => _graph.InEdges(vertex);

    /// <summary>
    /// The cone of influence of a name: the name itself and every vertex that can affect it through equations,
    /// function blocks and last-scan reads, transitively; in <see cref="Vertices"/> order.
    /// </summary>
    /// <exception cref="ArgumentException">The name is not a vertex (check with <see cref="Find"/>).</exception>
    public IReadOnlyList<DependencyVertex> ConeOfInfluence(string name)
    {
        var root = Find(name) ?? throw new ArgumentException($"'{name}' is not a vertex of the dependency graph", nameof(name));
        var reversed = new ReversedBidirectionalGraph<DependencyVertex, DependencyEdge>(_graph);
        var search = new BreadthFirstSearchAlgorithm<DependencyVertex, SReversedEdge<DependencyVertex, DependencyEdge>>(reversed);
        var reached = new HashSet<DependencyVertex>();
        search.DiscoverVertex += vertex => reached.Add(vertex);
        search.Compute(root);
        return [.. reached.OrderBy(v => v.Order)];
    }

    /// <summary>The names in the cone of influence of <paramref name="name"/> (see <see cref="ConeOfInfluence"/>).</summary>
    public IReadOnlyList<string> ConeNames(string name) => [.. ConeOfInfluence(name).Select(v => v.Name)];

    /// <summary>The subgraph made of the cone of influence of <paramref name="name"/> and the edges among it.</summary>
    public DependencyGraph Cone(string name)
    {
        var kept = ConeOfInfluence(name);
        var keptSet = kept.ToHashSet();
        var copies = kept.ToDictionary(v => v, v => new DependencyVertex(v.Name, v.Kind, v.Span, v.Detail));
        var edges = Edges
            .Where(e => keptSet.Contains(e.Source) && keptSet.Contains(e.Target))
            .Select(e => new DependencyEdge(copies[e.Source], copies[e.Target], e.Read, e.Span))
            .ToList();
        return new DependencyGraph(SchemeName, [.. kept.Select(v => copies[v])], edges);
    }

    /// <summary>
    /// Feedback loops: the strongly connected components that contain a cycle (more than one vertex, or a vertex
    /// reading itself). Each holds state through its last-scan reads, like a latch. Members in vertex order, loops
    /// ordered by their first member.
    /// </summary>
    public IReadOnlyList<IReadOnlyList<DependencyVertex>> FeedbackLoops()
    {
        var components = new Dictionary<DependencyVertex, int>();
        _graph.StronglyConnectedComponents(components);
        var members = new Dictionary<int, List<DependencyVertex>>();
        foreach (var vertex in Vertices)
        {
            var component = components[vertex];
            if (!members.TryGetValue(component, out var list))
            {
                members.Add(component, list = []);
            }

            list.Add(vertex);
        }

        return [.. members.Values
            .Where(list => list.Count > 1 || _graph.OutEdges(list[0]).Any(e => e.Target == list[0]))
            .OrderBy(list => list[0].Order)
            .Select(list => (IReadOnlyList<DependencyVertex>)list)];
    }
}
