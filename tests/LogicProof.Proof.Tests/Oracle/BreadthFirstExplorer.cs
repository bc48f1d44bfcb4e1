namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The brute-force oracle: every reachable state of a scheme by breadth-first search over a stepper's states. Start
/// states: every power-up state. From each state, every input vector is one scan. A scan at which some assumption is
/// FALSE is a dead end: neither its property values nor the state after it count (a sequence counts only while every
/// assumption has held). A property is violated iff some counted scan has it FALSE; because states are expanded in
/// order of depth, the first such scan found is a shortest violation, and its length in scans (counting the failing
/// one) is reported.
/// </summary>
internal static class BreadthFirstExplorer
{
    /// <summary>Explores at most <paramref name="maxStates"/> states; beyond that the result is marked incomplete.</summary>
    public static Exploration<TState> Explore<TState>(IScanStepper<TState> stepper, int maxStates)
        where TState : notnull
    {
        var idOf = new Dictionary<TState, int>();
        var nodes = new List<(TState State, int Depth, int Parent, int Vector)>();
        foreach (var start in stepper.PowerUpStates())
        {
            if (idOf.TryAdd(start, nodes.Count))
            {
                nodes.Add((start, 0, -1, -1));
            }
        }

        var shortest = new long?[stepper.PropertyCount];
        var witness = new string?[stepper.PropertyCount];
        var properties = new bool[stepper.PropertyCount];
        var complete = true;
        for (var id = 0; id < nodes.Count; id++)
        {
            var (state, depth, _, _) = nodes[id];
            for (var vector = 0; vector < stepper.InputVectorCount; vector++)
            {
                if (!stepper.Step(state, vector, properties, out var next))
                {
                    continue;
                }

                for (var p = 0; p < shortest.Length; p++)
                {
                    if (shortest[p] is null && !properties[p])
                    {
                        shortest[p] = depth + 1;
                        witness[p] = Witness(stepper, nodes, id, vector);
                    }
                }

                if (!idOf.ContainsKey(next))
                {
                    if (nodes.Count >= maxStates)
                    {
                        complete = false;
                        continue;
                    }

                    idOf.Add(next, nodes.Count);
                    nodes.Add((next, depth + 1, id, vector));
                }
            }
        }

        return new Exploration<TState>(shortest, witness, [.. nodes.Select(n => n.State)], complete);
    }

    private static string Witness<TState>(IScanStepper<TState> stepper, List<(TState State, int Depth, int Parent, int Vector)> nodes, int id, int lastVector)
        where TState : notnull
    {
        var vectors = new List<int> { lastVector };
        for (var at = id; nodes[at].Parent >= 0; at = nodes[at].Parent)
        {
            vectors.Add(nodes[at].Vector);
        }

        vectors.Reverse();
        return string.Join("; ", vectors.Select((v, scan) => $"scan {scan}: {stepper.DescribeInputs(v)}"));
    }
}
