using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Formatting;

/// <summary>
/// What formatting must not change: every comment and every statement's canonical tokens, in
/// order, and the block depth of each statement. Whitespace, unit spelling and keyword case are
/// not part of it.
/// </summary>
public static class Fingerprint
{
    /// <summary>One line's share: its depth (-1 when the line is broken and has none) and its text.</summary>
    public readonly record struct Entry(int Depth, string Text);

    public static IReadOnlyList<Entry> Of(ParseResult parsed)
    {
        var entries = new List<Entry>();
        foreach (var line in parsed.Tree.Lines)
        {
            if (line.Tokens.Length > 0)
            {
                var text = line.Statement is { } s && !line.InConflict ? Formatter.Canonical(s) : line.Content.Trim();
                entries.Add(new Entry(line.IsBroken || line.InConflict ? -1 : line.Depth, text));
            }

            if (line.Comment is { } c) entries.Add(new Entry(-1, c.Text));
        }

        return entries;
    }

    /// <summary>
    /// True when both describe the same document. A line that was broken only by its indentation
    /// may become well-formed once its neighbours are re-indented; that is the one change allowed.
    /// </summary>
    public static bool Same(IReadOnlyList<Entry> a, IReadOnlyList<Entry> b) =>
        a.Count == b.Count && a.Zip(b).All(p => p.First.Text == p.Second.Text
                                                && (p.First.Depth == p.Second.Depth || p.First.Depth < 0 || p.Second.Depth < 0));
}
