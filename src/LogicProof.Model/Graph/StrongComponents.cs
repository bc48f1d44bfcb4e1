namespace LogicProof.Model.Graph;

/// <summary>
/// Strongly connected components of a graph over vertices 0..n-1 given as adjacency arrays, by Tarjan's algorithm
/// with an explicit stack (no recursion, so a chain of 100,000 equations is fine on any thread). Used on the
/// cell graph of a model, where speed matters; the name-level <see cref="DependencyGraph"/> uses QuikGraph.
/// </summary>
internal static class StrongComponents
{
    /// <summary>The component number of each vertex; two vertices share a number exactly when each reaches the other.</summary>
    public static int[] Compute(int vertexCount, int[] edgeStart, int[] edgeTargets)
    {
        var index = new int[vertexCount];
        var lowLink = new int[vertexCount];
        var component = new int[vertexCount];
        var onStack = new bool[vertexCount];
        Array.Fill(index, -1);
        var tarjanStack = new Stack<int>();
        var callStack = new Stack<(int Vertex, int NextEdge)>();
        var nextIndex = 0;
        var componentCount = 0;

        for (var root = 0; root < vertexCount; root++)
        {
            if (index[root] >= 0)
            {
                continue;
            }

            callStack.Push((root, edgeStart[root]));
            index[root] = lowLink[root] = nextIndex++;
            tarjanStack.Push(root);
            onStack[root] = true;

            while (callStack.Count > 0)
            {
                var (vertex, nextEdge) = callStack.Pop();
                if (nextEdge < edgeStart[vertex + 1])
                {
                    callStack.Push((vertex, nextEdge + 1));
                    var successor = edgeTargets[nextEdge];
                    if (index[successor] < 0)
                    {
                        index[successor] = lowLink[successor] = nextIndex++;
                        tarjanStack.Push(successor);
                        onStack[successor] = true;
                        callStack.Push((successor, edgeStart[successor]));
                    }
                    else if (onStack[successor])
                    {
                        lowLink[vertex] = Math.Min(lowLink[vertex], index[successor]);
                    }

                    continue;
                }

                if (lowLink[vertex] == index[vertex])
                {
                    int member;
                    do
                    {
                        member = tarjanStack.Pop();
                        onStack[member] = false;
                        component[member] = componentCount;
                    }
                    while (member != vertex);
                    componentCount++;
                }

                if (callStack.Count > 0)
                {
                    var parent = callStack.Peek().Vertex;
                    lowLink[parent] = Math.Min(lowLink[parent], lowLink[vertex]);
                }
            }
        }

        return component;
    }

    /// <summary>Builds the adjacency arrays (compressed rows) from an edge list.</summary>
    public static (int[] EdgeStart, int[] EdgeTargets) Adjacency(int vertexCount, IReadOnlyList<int> sources, IReadOnlyList<int> targets)
    {
        var edgeStart = new int[vertexCount + 1];
        foreach (var source in sources)
        {
            edgeStart[source + 1]++;
        }

        for (var v = 0; v < vertexCount; v++)
        {
            edgeStart[v + 1] += edgeStart[v];
        }

        var fill = (int[])edgeStart.Clone();
        var edgeTargets = new int[sources.Count];
        for (var e = 0; e < sources.Count; e++)
        {
            edgeTargets[fill[sources[e]]++] = targets[e];
        }

        return (edgeStart, edgeTargets);
    }
}
