using System.Collections.Concurrent;
using System.Reflection;
using MotorLang.Sizing;

namespace MotorLang.Analysis.Coverage;

/// <summary>A code rule a circuit's sizing applied, and the steps (by label) it was applied in.</summary>
public sealed record AppliedRule(string Rule, string Text);

/// <summary>
/// The rules a circuit applied, read from the steps of every computed value its result carries
/// (each step names its rule). Nothing is kept by hand: a new computed value on a result, with its
/// steps, is listed as soon as it has a value.
/// </summary>
public static class RulesApplied
{
    // The result-typed properties of each result class, in declaration order, found once per class.
    private static readonly ConcurrentDictionary<Type, PropertyInfo[]> Explained = new();

    public static IReadOnlyList<AppliedRule> Of(object circuitResult) => From(StepsOf(circuitResult));

    /// <summary>The steps of every computed value (one with a value) on a motor or feeder result.</summary>
    public static IEnumerable<Step> StepsOf(object circuitResult) =>
        Explained.GetOrAdd(circuitResult.GetType(), PropertiesOf)
            .SelectMany(p => p.GetValue(circuitResult) switch
            {
                IExplained one => [one],
                IEnumerable<IExplained> many => many,
                _ => [],
            })
            .Where(r => r.HasValue)
            .SelectMany(r => r.Steps);

    /// <summary>Properties holding a result, or a list of results (one per winding, say).</summary>
    private static PropertyInfo[] PropertiesOf(Type type) =>
        type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .Where(p => p.GetIndexParameters().Length == 0
                        && (typeof(IExplained).IsAssignableFrom(p.PropertyType) || typeof(IEnumerable<IExplained>).IsAssignableFrom(p.PropertyType)))
            .OrderBy(p => p.MetadataToken)
            .ToArray();

    /// <summary>Each rule once, in the order first applied, with the labels of the steps that applied it.</summary>
    public static IReadOnlyList<AppliedRule> From(IEnumerable<Step> steps)
    {
        var labels = new Dictionary<string, List<string>>();
        var order = new List<string>();
        foreach (var step in steps)
        foreach (var rule in References(step.Rule))
        {
            if (!labels.TryGetValue(rule, out var list))
            {
                labels[rule] = list = [];
                order.Add(rule);
            }

            if (!list.Contains(step.Label)) list.Add(step.Label);
        }

        return order.Select(r => new AppliedRule(r, string.Join("; ", labels[r]))).ToList();
    }

    /// <summary>
    /// The code references in a step's rule: "NEC 430.6(A)(1), Table 430.250" is two. A piece that does
    /// not start a reference ("note 2" in "Chapter 9 Table 9, note 2") stays with the one before it.
    /// A rule of thumb ("common practice, no source"), a reading of our own ("conservative reading"), a value from memory or a reference marked as not
    /// checked (the NEMA starter suggestion) is not a rule applied, and is left out (the steps still show it).
    /// </summary>
    public static IEnumerable<string> References(string rule)
    {
        if (rule.StartsWith("common practice", StringComparison.OrdinalIgnoreCase) || rule.StartsWith("from memory", StringComparison.OrdinalIgnoreCase)
            || rule.Contains("not checked", StringComparison.OrdinalIgnoreCase) || rule.StartsWith("conservative reading", StringComparison.OrdinalIgnoreCase))
            yield break;
        string? pending = null;
        foreach (var raw in SplitTopLevel(rule))
        {
            var piece = raw.StartsWith("NEC ", StringComparison.Ordinal) ? raw[4..] : raw;
            if (piece.Length == 0) continue;
            if (pending is not null && !StartsReference(piece))
            {
                pending += ", " + piece;
                continue;
            }

            if (pending is not null) yield return pending;
            pending = piece;
        }

        if (pending is not null) yield return pending;
    }

    private static bool StartsReference(string piece) =>
        char.IsDigit(piece[0]) || piece.StartsWith("Table", StringComparison.Ordinal) || piece.StartsWith("Chapter", StringComparison.Ordinal)
        || piece.StartsWith("Article", StringComparison.Ordinal) || piece.StartsWith("Equation", StringComparison.Ordinal) || piece.StartsWith("NEMA", StringComparison.Ordinal);

    /// <summary>Splits at commas outside parentheses, so "NEMA ICS 2 (as collected, not checked)" stays whole.</summary>
    private static IEnumerable<string> SplitTopLevel(string rule)
    {
        var depth = 0;
        var start = 0;
        for (var i = 0; i < rule.Length; i++)
        {
            switch (rule[i])
            {
                case '(': depth++; break;
                case ')': depth--; break;
                case ',' when depth == 0:
                    yield return rule[start..i].Trim();
                    start = i + 1;
                    break;
            }
        }

        yield return rule[start..].Trim();
    }
}
