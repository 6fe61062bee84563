using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;

namespace MotorLang.Parser;

/// <summary>
/// Checks that 'from' names a feeder and 'like' names a motor, and that neither goes round in a
/// circle. Linear in the number of blocks: each reference is followed once (see <see cref="ReferenceCycles"/>).
/// </summary>
internal sealed class ReferenceChecker(MotorList model, List<Diagnostic> diagnostics)
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
        var feederCycles = CycleMembers(feeders, n => Target<FeederNode>(n.From));
        List<string>? feederTags = null;
        foreach (var feeder in feeders)
        {
            Report(feeder, feeder.From, "from", "feeder", feederCycles, Target<FeederNode>(feeder.From), () => feederTags ??= Tags(feeders));
        }

        var motors = model.Motors.ToList();
        var motorCycles = CycleMembers(motors, n => Target<MotorNode>(n.Like));
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

        // Reported once per member, on the member's own reference.
        if (cycles.Contains(node))
            diagnostics.Add(new Diagnostic(SyntaxCodes.ReferenceCycle, Severity.Error, reference.Range,
                $"'{keyword} {reference.Value}' leads back to '{node.Tag?.Value}': the chain of '{keyword}' goes round in a circle"));
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
