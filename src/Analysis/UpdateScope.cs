using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;

namespace MotorLang.Analysis;

/// <summary>What an update after a one-line edit must size again, and the parse findings it replaces.</summary>
internal static class UpdateScope
{
    /// <summary>
    /// The edited motor, or every motor of an edited feeder (they inherit its settings); then every
    /// motor written 'like' one of those, directly or through others, since it takes their values
    /// and defers to their findings.
    /// </summary>
    internal static HashSet<MotorNode> MotorsToResize(ModelEdit edit, MotorList model, List<MotorNode> likeUsers)
    {
        var changed = edit.Edited switch
        {
            FeederNode feeder => feeder.Motors.ToHashSet(),
            MotorNode motor => [motor],
            _ => new HashSet<MotorNode>(),
        };

        var resize = new HashSet<MotorNode>(changed);
        if (changed.Count == 0) return resize;

        // Walk the 'like' references backwards from the changed motors, once: a motor whose chain
        // reaches a changed one is reached from it. Linear in the number of 'like' users, where
        // walking every user's chain forwards would be quadratic on a long chain.
        var likedBy = new Dictionary<MotorNode, List<MotorNode>>();
        foreach (var user in likeUsers)
        {
            if (user.Like is { } like && model.Find(like.Value) is MotorNode target)
            {
                if (!likedBy.TryGetValue(target, out var users)) likedBy[target] = users = [];
                users.Add(user);
            }
        }

        var pending = new Stack<MotorNode>(changed);
        while (pending.Count > 0)
        {
            if (!likedBy.TryGetValue(pending.Pop(), out var users)) continue;
            foreach (var user in users)
            {
                if (resize.Add(user)) pending.Push(user);
            }
        }

        return resize;
    }

    /// <summary>
    /// The edited feeder, the feeders of the re-sized motors, and every feeder those are supplied
    /// from (their loads include the motors further down).
    /// </summary>
    internal static HashSet<FeederNode> FeedersToResize(ModelEdit edit, HashSet<MotorNode> resize, SizingPass run)
    {
        var affected = new HashSet<FeederNode> { edit.NewFeeder };
        foreach (var motor in resize) affected.Add(motor.Feeder);
        foreach (var feeder in affected.ToList())
        {
            for (var up = run.Supplier(feeder); up is not null && affected.Add(up); up = run.Supplier(up))
            {
            }
        }

        return affected;
    }

    /// <summary>The parse findings with the edited line's replaced; the replaced ones go to <paramref name="removed"/>, the new ones to <paramref name="added"/>.</summary>
    internal static ImmutableArray<Finding> SpliceLine(ImmutableArray<Finding> before, ImmutableArray<Diagnostic> diagnostics, int line,
        HashSet<Finding> removed, List<RankedFinding> added)
    {
        var fresh = diagnostics.Where(d => d.Range.Start.Line == line).Select(Finding.From).ToList();
        var first = 0;
        while (first < before.Length && before[first].Range.Start.Line < line) first++;
        var end = first;
        while (end < before.Length && before[end].Range.Start.Line == line) end++;
        if (first == end && fresh.Count == 0) return before;
        for (var i = first; i < end; i++) removed.Add(before[i]);
        for (var i = 0; i < fresh.Count; i++) added.Add(new RankedFinding(fresh[i], RankedFinding.ParseRank(line, i)));
        var builder = ImmutableArray.CreateBuilder<Finding>(before.Length - (end - first) + fresh.Count);
        builder.AddRange(before.AsSpan()[..first]);
        builder.AddRange(fresh);
        builder.AddRange(before.AsSpan()[end..]);
        return builder.MoveToImmutable();
    }
}
