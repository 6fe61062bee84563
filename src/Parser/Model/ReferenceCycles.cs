namespace MotorLang.Parser.Model;

/// <summary>Cycles among references where each node names at most one other ('from', 'like').</summary>
public static class ReferenceCycles
{
    /// <summary>
    /// The nodes that lie on a cycle. Every walk either ends, joins a walk made before (whose
    /// nodes are finished), or comes back to a node of its own walk: then that node and the ones
    /// after it form a cycle. Each reference is followed once in all, without recursion, so a
    /// chain of any length needs no stack. <paramref name="steps"/> counts the nodes visited.
    /// </summary>
    public static HashSet<T> Members<T>(IEnumerable<T> nodes, Func<T, T?> next, ref long steps) where T : class
    {
        var onCycle = new HashSet<T>(ReferenceEqualityComparer.Instance);
        var finished = new HashSet<T>(ReferenceEqualityComparer.Instance);
        var walk = new List<T>();
        var position = new Dictionary<T, int>(ReferenceEqualityComparer.Instance);
        foreach (var start in nodes)
        {
            walk.Clear();
            position.Clear();
            for (var n = start; n is not null && !finished.Contains(n); n = next(n))
            {
                steps++;
                if (position.TryGetValue(n, out var first))
                {
                    for (var i = first; i < walk.Count; i++) onCycle.Add(walk[i]);
                    break;
                }

                position[n] = walk.Count;
                walk.Add(n);
            }

            finished.UnionWith(walk);
        }

        return onCycle;
    }
}
