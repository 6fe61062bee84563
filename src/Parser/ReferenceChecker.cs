using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;

namespace MotorLang.Parser;

/// <summary>Checks that 'from' names a feeder and 'like' names a motor, and that neither goes round in a circle.</summary>
internal sealed class ReferenceChecker(MotorList model, List<Diagnostic> diagnostics)
{
    public void Check()
    {
        foreach (var feeder in model.Feeders)
        {
            CheckChain(feeder, n => ((FeederNode)n).From, "from", typeof(FeederNode), "feeder");
        }

        foreach (var motor in model.Motors)
        {
            CheckChain(motor, n => ((MotorNode)n).Like, "like", typeof(MotorNode), "motor");
        }
    }

    private void CheckChain(CircuitNode start, Func<CircuitNode, Located<string>?> next, string keyword, Type expected, string noun)
    {
        if (next(start) is not { } reference) return;
        var target = model.Find(reference.Value);
        if (target is null || target.GetType() != expected)
        {
            var candidates = (expected == typeof(FeederNode) ? model.Feeders.Cast<CircuitNode>() : model.Motors)
                .Select(n => n.Tag?.Value).OfType<string>();
            var what = target is null ? "no" : $"'{reference.Value}' is a {target.Keyword}, not a";
            diagnostics.Add(new Diagnostic(SyntaxCodes.UnknownReference, Severity.Error, reference.Range,
                target is null
                    ? $"'{keyword}' names no {noun} tagged '{reference.Value}'{Suggestions.DidYouMean(reference.Value, candidates)}"
                    : $"'{keyword}' must name a {noun}; {what} {noun}"));
            return;
        }

        // Report a cycle once per member, on the member's own reference.
        var seen = new HashSet<CircuitNode> { start };
        var current = target;
        while (current is not null && current.GetType() == expected)
        {
            if (current == start)
            {
                diagnostics.Add(new Diagnostic(SyntaxCodes.ReferenceCycle, Severity.Error, reference.Range,
                    $"'{keyword} {reference.Value}' leads back to '{start.Tag?.Value}': the chain of '{keyword}' goes round in a circle"));
                return;
            }

            if (!seen.Add(current)) return;
            current = next(current) is { } r ? model.Find(r.Value) : null;
        }
    }
}
