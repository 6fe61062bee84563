using MotorLang.Parser.Collections;

namespace MotorLang.Parser.Model;

/// <summary>The typed model of one document: the project block and the feeders with their motors and loads.</summary>
public sealed class MotorList
{
    private readonly LayeredMap<string, CircuitNode> _byTag;

    internal MotorList(ProjectNode? project, IReadOnlyList<FeederNode> feeders, Dictionary<string, CircuitNode> byTag)
        : this(project, feeders, LayeredMap<string, CircuitNode>.Over(byTag))
    {
    }

    private MotorList(ProjectNode? project, IReadOnlyList<FeederNode> feeders, LayeredMap<string, CircuitNode> byTag)
    {
        Project = project;
        Feeders = feeders;
        _byTag = byTag;
    }

    public ProjectNode? Project { get; }

    public IReadOnlyList<FeederNode> Feeders { get; }

    public IEnumerable<MotorNode> Motors => Feeders.SelectMany(f => f.Motors);

    public IEnumerable<LoadNode> Loads => Feeders.SelectMany(f => f.Loads);

    /// <summary>
    /// This model with one feeder (and everything in it) replaced by a copy; every other node is
    /// shared, which is safe because nodes are never changed once the model is built.
    /// </summary>
    internal MotorList WithFeeder(FeederNode old, FeederNode replacement, IReadOnlyDictionary<CircuitNode, CircuitNode> copies)
    {
        var feeders = Feeders.ToArray();
        feeders[Array.IndexOf(feeders, old)] = replacement;
        var byTag = _byTag.ToBuilder();
        foreach (var (was, now) in copies)
        {
            // Only where the tag was registered to this node: a duplicate tag stays with its first user.
            if (was.Tag is { } tag && byTag.TryGetValue(tag.Value, out var registered) && ReferenceEquals(registered, was)) byTag[tag.Value] = now;
        }

        return new MotorList(Project, feeders, byTag.ToMap());
    }

    /// <summary>The innermost block whose lines include <paramref name="line"/>, found by binary search over the ordered blocks.</summary>
    public BlockNode? BlockAt(int line)
    {
        if (Project is { } p && line >= p.Header.Line.Index && line <= p.LastLine) return p;
        var feeder = Find(Feeders, line);
        if (feeder is null) return null;
        return (BlockNode?)Find(feeder.Motors, line) ?? (BlockNode?)Find(feeder.Loads, line) ?? feeder;
    }

    /// <summary>
    /// The motors whose header lines lie between <paramref name="first"/> and <paramref name="last"/>
    /// (inclusive), in line order: a binary search to the first feeder that can hold one, then only
    /// the blocks in the range, so a visible window costs the same in a short list and a long one.
    /// </summary>
    public IEnumerable<MotorNode> MotorsBetween(int first, int last)
    {
        var start = StartOf(Feeders, first);
        for (var i = start; i < Feeders.Count && Feeders[i].Header.Line.Index <= last; i++)
        {
            var motors = Feeders[i].Motors;
            for (var j = StartOf(motors, first); j < motors.Count && motors[j].Header.Line.Index <= last; j++)
            {
                if (motors[j].Header.Line.Index >= first) yield return motors[j];
            }
        }
    }

    /// <summary>The index of the first block that ends at or after <paramref name="line"/> (blocks are ordered and do not overlap).</summary>
    private static int StartOf<T>(IReadOnlyList<T> blocks, int line) where T : BlockNode
    {
        int lo = 0, hi = blocks.Count;
        while (lo < hi)
        {
            var mid = (lo + hi) / 2;
            if (blocks[mid].LastLine < line) lo = mid + 1;
            else hi = mid;
        }

        return lo;
    }

    private static T? Find<T>(IReadOnlyList<T> blocks, int line) where T : BlockNode
    {
        int lo = 0, hi = blocks.Count - 1, found = -1;
        while (lo <= hi)
        {
            var mid = (lo + hi) / 2;
            if (blocks[mid].Header.Line.Index <= line)
            {
                found = mid;
                lo = mid + 1;
            }
            else
            {
                hi = mid - 1;
            }
        }

        return found >= 0 && line <= blocks[found].LastLine ? blocks[found] : null;
    }

    /// <summary>Finds a feeder, motor or load by tag; tags compare without regard to case.</summary>
    public CircuitNode? Find(string tag) => _byTag.GetValueOrDefault(tag);
}
