namespace TrussWeb.Core.Analysis;

/// <summary>
/// Reverse Cuthill–McKee ordering of the nodes of a graph (Cuthill and McKee 1969, reversed as
/// George 1971 proposed): breadth-first from a pseudo-peripheral node, neighbours by increasing degree,
/// then reversed. Keeps the stiffness matrix bandwidth small so the banded factorisation stays cheap.
/// </summary>
public static class ReverseCuthillMcKee
{
    /// <summary>Returns order[newIndex] = oldIndex for a graph given by adjacency lists (every component included).</summary>
    public static int[] Order(IReadOnlyList<IReadOnlyList<int>> adjacency)
    {
        ArgumentNullException.ThrowIfNull(adjacency);
        var n = adjacency.Count;
        var visited = new bool[n];
        var order = new List<int>(n);
        var level = new int[n];

        for (var seed = 0; seed < n; seed++)
        {
            if (visited[seed])
            {
                continue;
            }

            var start = PseudoPeripheral(adjacency, seed, level);
            var queue = new Queue<int>();
            queue.Enqueue(start);
            visited[start] = true;
            var scratch = new List<int>();
            while (queue.Count > 0)
            {
                var v = queue.Dequeue();
                order.Add(v);
                scratch.Clear();
                foreach (var w in adjacency[v])
                {
                    if (!visited[w])
                    {
                        visited[w] = true;
                        scratch.Add(w);
                    }
                }

                scratch.Sort((p, q) => adjacency[p].Count != adjacency[q].Count ? adjacency[p].Count.CompareTo(adjacency[q].Count) : p.CompareTo(q));
                foreach (var w in scratch)
                {
                    queue.Enqueue(w);
                }
            }
        }

        order.Reverse();
        return [.. order];
    }

    /// <summary>Half-bandwidth (in nodes) of a graph under an ordering: max |new(a) − new(b)| over edges.</summary>
    public static int NodeBandwidth(IReadOnlyList<IReadOnlyList<int>> adjacency, IReadOnlyList<int> order)
    {
        ArgumentNullException.ThrowIfNull(adjacency);
        ArgumentNullException.ThrowIfNull(order);
        var position = new int[order.Count];
        for (var i = 0; i < order.Count; i++)
        {
            position[order[i]] = i;
        }

        var bw = 0;
        for (var v = 0; v < adjacency.Count; v++)
        {
            foreach (var w in adjacency[v])
            {
                bw = Math.Max(bw, Math.Abs(position[v] - position[w]));
            }
        }

        return bw;
    }

    private static int PseudoPeripheral(IReadOnlyList<IReadOnlyList<int>> adjacency, int seed, int[] level)
    {
        // Repeated BFS: move to a minimum-degree node of the last level while the eccentricity grows (cap 8 sweeps).
        var current = seed;
        var eccentricity = -1;
        for (var sweep = 0; sweep < 8; sweep++)
        {
            var (last, depth) = Bfs(adjacency, current, level);
            if (depth <= eccentricity)
            {
                break;
            }

            eccentricity = depth;
            current = last;
        }

        return current;
    }

    private static (int Last, int Depth) Bfs(IReadOnlyList<IReadOnlyList<int>> adjacency, int start, int[] level)
    {
        var seen = new HashSet<int> { start };
        var queue = new Queue<int>();
        queue.Enqueue(start);
        level[start] = 0;
        var best = start;
        var depth = 0;
        while (queue.Count > 0)
        {
            var v = queue.Dequeue();
            if (level[v] > depth || (level[v] == depth && adjacency[v].Count < adjacency[best].Count))
            {
                depth = level[v];
                best = v;
            }

            foreach (var w in adjacency[v])
            {
                if (seen.Add(w))
                {
                    level[w] = level[v] + 1;
                    queue.Enqueue(w);
                }
            }
        }

        return (best, depth);
    }
}
