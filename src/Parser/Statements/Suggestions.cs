namespace MotorLang.Parser.Statements;

/// <summary>"Did you mean" by edit distance.</summary>
public static class Suggestions
{
    public static string? Closest(string input, IEnumerable<string> candidates)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            var d = Distance(input.ToLowerInvariant(), c.ToLowerInvariant());
            if (d < bestDistance)
            {
                bestDistance = d;
                best = c;
            }
        }

        // Allow roughly one typo per three letters; beyond that a suggestion is noise. A word must
        // keep more letters than it changes: any one letter is one edit from any other, so 'Z'
        // is not close to 'A'.
        return best is not null && bestDistance <= Math.Max(1, input.Length / 3) && bestDistance < input.Length ? best : null;
    }

    public static string DidYouMean(string input, IEnumerable<string> candidates) =>
        Closest(input, candidates) is { } s ? $"; did you mean '{s}'?" : "";

    private static int Distance(string a, string b)
    {
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++) prev[j] = j;
        for (var i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                cur[j] = Math.Min(Math.Min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }

            (prev, cur) = (cur, prev);
        }

        return prev[b.Length];
    }
}
