using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;

namespace MotorLang.Parser;

/// <summary>
/// Checks that 'from' names a feeder and 'like' names a motor, and that neither goes round in a
/// circle. Linear in the number of blocks: each reference is followed once (see <see cref="ReferenceCycles"/>).
/// </summary>
internal sealed class ReferenceChecker(MotorList model, List<Diagnostic> diagnostics, Func<int, string> lineName)
{
    /// <summary>
    /// "Did you mean" compares the unknown tag with every tag of its kind; past this many
    /// comparisons in one document the suggestion is left out, so that thousands of unknown
    /// references among thousands of tags do not cost millions of comparisons each.
    /// </summary>
    internal const long SuggestionBudget = 200_000;

    private long _suggestionCost;

    /// <summary>References followed while looking for cycles; tests use it to check the work grows linearly.</summary>
    internal long Steps { get; private set; }

    public void Check()
    {
        var feeders = model.Feeders;
        var feederCycles = FirstOfEachCycle(CycleMembers(feeders, n => Target<FeederNode>(n.From)), n => Target<FeederNode>(n.From));
        List<string>? feederTags = null;
        foreach (var feeder in feeders)
        {
            Report(feeder, feeder.From, "from", "feeder", feederCycles, Target<FeederNode>(feeder.From), () => feederTags ??= Tags(feeders));
        }

        var motors = model.Motors.ToList();
        var motorCycles = FirstOfEachCycle(CycleMembers(motors, n => Target<MotorNode>(n.Like)), n => Target<MotorNode>(n.Like));
        List<string>? motorTags = null;
        foreach (var motor in motors)
        {
            Report(motor, motor.Like, "like", "motor", motorCycles, Target<MotorNode>(motor.Like), () => motorTags ??= Tags(motors));
        }
    }

    private T? Target<T>(Located<string>? reference) where T : CircuitNode =>
        reference is null ? null : model.Find(reference.Value) as T;

    private static List<string> Tags<T>(IEnumerable<T> nodes) where T : CircuitNode => nodes.Select(n => n.Tag?.Value).OfType<string>().ToList();

    private void Report<T>(T node, Located<string>? reference, string keyword, string noun, HashSet<T> cycles, T? target, Func<List<string>> candidates)
        where T : CircuitNode
    {
        if (reference is null) return;
        if (target is null)
        {
            var found = model.Find(reference.Value);
            var what = found is null ? "no" : $"'{reference.Value}' is a {found.Keyword}, not a";
            diagnostics.Add(new Diagnostic(SyntaxCodes.UnknownReference, Severity.Error, reference.Range,
                found is null
                    ? $"'{keyword}' names no {noun} tagged '{reference.Value}'{Suggest(reference.Value, candidates)}"
                    : $"'{keyword}' must name a {noun}; {what} {noun}"));
            return;
        }

        // One diagnostic per cycle, on the reference written first (in a plant: in the first file),
        // naming every member and where it is written, so a loop through several files reads as
        // one mistake, not one per file. Each member's own sizing notes point back to it.
        if (cycles.Contains(node))
            diagnostics.Add(new Diagnostic(SyntaxCodes.ReferenceCycle, Severity.Error, reference.Range,
                $"'{keyword} {reference.Value}' leads back to '{node.Tag?.Value}': the chain of '{keyword}' goes round in a circle: {Loop(node, n => Target<T>(Reference(n, keyword)))}"));
    }

    private static Located<string>? Reference(CircuitNode n, string keyword) => keyword == "from" ? (n as FeederNode)?.From : (n as MotorNode)?.Like;

    /// <summary>
    /// The member of each cycle whose header comes first. Each cycle is walked once, its members
    /// marked as it goes, so finding them all is linear in the number of members.
    /// </summary>
    private HashSet<T> FirstOfEachCycle<T>(HashSet<T> members, Func<T, T?> next) where T : CircuitNode
    {
        var firsts = new HashSet<T>(ReferenceEqualityComparer.Instance);
        var seen = new HashSet<T>(ReferenceEqualityComparer.Instance);
        foreach (var start in members)
        {
            if (!seen.Add(start)) continue;
            var first = start;
            for (var n = next(start); n is not null && seen.Add(n); n = next(n))
            {
                Steps++;
                if (n.Header.Line.Index < first.Header.Line.Index) first = n;
            }

            firsts.Add(first);
        }

        return firsts;
    }

    /// <summary>"A (line 3) → B (b.motors line 1) → A": every member once, then back to the first.</summary>
    private string Loop<T>(T first, Func<T, T?> next) where T : CircuitNode
    {
        // A long loop is named by its first members and a count, so the message stays readable.
        const int shown = 8;
        var parts = new List<string>();
        var count = 0;
        for (T? n = first; n is not null; n = next(n))
        {
            Steps++;
            if (++count <= shown) parts.Add($"{n.Tag?.Value} ({lineName(n.Header.Line.Index)})");
            if (ReferenceEquals(next(n), first)) break;
        }

        if (count > shown) parts.Add($"{count - shown} more");
        return string.Join(" → ", parts) + $" → {first.Tag?.Value}";
    }

    private string Suggest(string tag, Func<List<string>> candidates)
    {
        var all = candidates();
        if (_suggestionCost + all.Count > SuggestionBudget) return "";
        _suggestionCost += all.Count;
        return Suggestions.DidYouMean(tag, all);
    }

    private HashSet<T> CycleMembers<T>(IReadOnlyList<T> nodes, Func<T, T?> next) where T : CircuitNode
    {
        var steps = Steps;
        var members = ReferenceCycles.Members(nodes, next, ref steps);
        Steps = steps;
        return members;
    }
}
