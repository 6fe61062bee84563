using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;

namespace MotorLang.Analysis;

/// <summary>What an update after edits inside lines must size again, and the parse findings it replaces.</summary>
internal static class UpdateScope
{
    /// <summary>
    /// The edited motors, and every motor of an edited feeder (they inherit its settings); then every
    /// motor written 'like' one of those, directly or through others, since it takes their values
    /// and defers to their findings.
    /// </summary>
    internal static HashSet<MotorNode> MotorsToResize(ModelEdit edit, MotorList model, List<MotorNode> likeUsers)
    {
        var changed = new HashSet<MotorNode>();
        foreach (var block in edit.Edited)
        {
            if (block is FeederNode feeder) changed.UnionWith(feeder.Motors);
            else if (block is MotorNode motor) changed.Add(motor);
        }

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
    /// The replaced feeders, the feeders of the re-sized motors, and every feeder those are supplied
    /// from (their loads include the motors further down).
    /// </summary>
    internal static HashSet<FeederNode> FeedersToResize(ModelEdit edit, HashSet<MotorNode> resize, SizingPass run)
    {
        var affected = new HashSet<FeederNode>(edit.Feeders.Values);
        foreach (var motor in resize) affected.Add(motor.Feeder);
        foreach (var feeder in affected.ToList())
        {
            for (var up = run.Supplier(feeder); up is not null && affected.Add(up); up = run.Supplier(up))
            {
            }
        }

        return affected;
    }

    /// <summary>The parse findings with the edited lines' replaced; the replaced ones go to <paramref name="removed"/>, the new ones to <paramref name="added"/>.</summary>
    internal static ImmutableArray<Finding> SpliceLines(ImmutableArray<Finding> before, ImmutableArray<Diagnostic> diagnostics, IReadOnlyList<int> lines,
        HashSet<Finding> removed, List<RankedFinding> added)
    {
        if (lines.Count == 0) return before;
        var edited = lines.Count == 1 ? null : lines.ToHashSet();
        bool Edited(int line) => edited?.Contains(line) ?? line == lines[0];

        // One pass over both lists (each in line order), however many lines were edited.
        var builder = ImmutableArray.CreateBuilder<Finding>(before.Length);
        var changed = false;
        var d = 0;
        var freshLine = -1;
        var freshIndex = 0;
        void TakeFreshUpTo(int line, bool inclusive)
        {
            while (d < diagnostics.Length && diagnostics[d].Range.Start.Line is var l && (l < line || (inclusive && l == line)))
            {
                if (Edited(l))
                {
                    var f = Finding.From(diagnostics[d]);
                    freshIndex = l == freshLine ? freshIndex + 1 : 0;
                    freshLine = l;
                    added.Add(new RankedFinding(f, RankedFinding.ParseRank(l, freshIndex)));
                    builder.Add(f);
                    changed = true;
                }

                d++;
            }
        }

        foreach (var f in before)
        {
            var line = f.Range.Start.Line;
            if (Edited(line))
            {
                TakeFreshUpTo(line, inclusive: true);
                removed.Add(f);
                changed = true;
                continue;
            }

            TakeFreshUpTo(line, inclusive: true);
            builder.Add(f);
        }

        TakeFreshUpTo(int.MaxValue, inclusive: true);
        return changed ? builder.ToImmutable() : before;
    }
}
