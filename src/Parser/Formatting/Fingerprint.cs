using System.Text;
using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Formatting;

/// <summary>
/// What formatting must not change: every comment, every statement's canonical tokens, in order,
/// the block depth of each statement, and the text of every line that was not read as a
/// statement (an unreadable document is one such line). Whitespace around tokens, unit spelling
/// and keyword case are not part of it. The formatter's own read-back check is stricter
/// (<see cref="ReadBack"/>); this one compares two readings of the same text, e.g. after an
/// incremental re-parse.
/// </summary>
public static class Fingerprint
{
    /// <summary>One line's share: its depth (-1 when the line is broken and has none) and its text.</summary>
    public readonly record struct Entry(int Depth, string Text);

    /// <summary>The fingerprint as a list, for tests and for reading a difference.</summary>
    public static IReadOnlyList<Entry> Of(ParseResult parsed)
    {
        var entries = new List<Entry>();
        foreach (var line in parsed.Tree.Lines)
        {
            if (HasText(line)) entries.Add(new Entry(Depth(line), Text(line)));
            if (line.Comment is { } c) entries.Add(new Entry(-1, c.Text));
        }

        return entries;
    }

    /// <summary>
    /// True when both describe the same document. A line that was broken only by its indentation
    /// may become well-formed once its neighbours are re-indented; that is the one change allowed.
    /// Walks both trees side by side without building the lists.
    /// </summary>
    public static bool Same(ParseResult a, ParseResult b)
    {
        var x = Meaningful(a.Tree).GetEnumerator();
        var y = Meaningful(b.Tree).GetEnumerator();
        var sa = new StringBuilder();
        var sb = new StringBuilder();
        while (true)
        {
            var hasX = x.MoveNext();
            var hasY = y.MoveNext();
            if (hasX != hasY) return false;
            if (!hasX) return true;
            var (l1, l2) = (x.Current, y.Current);
            if (!Equals(l1.Comment?.Text, l2.Comment?.Text)) return false;
            var d1 = Depth(l1);
            var d2 = Depth(l2);
            if (d1 != d2 && d1 >= 0 && d2 >= 0) return false;
            if (HasText(l1) != HasText(l2)) return false;
            if (!HasText(l1)) continue;
            sa.Clear();
            sb.Clear();
            AppendText(sa, l1);
            AppendText(sb, l2);
            if (!sa.Equals(sb)) return false;
        }
    }

    public static bool Same(IReadOnlyList<Entry> a, IReadOnlyList<Entry> b) =>
        a.Count == b.Count && a.Zip(b).All(p => p.First.Text == p.Second.Text
                                                && (p.First.Depth == p.Second.Depth || p.First.Depth < 0 || p.Second.Depth < 0));

    private static IEnumerable<SyntaxLine> Meaningful(SyntaxTree tree) => tree.Lines.Where(l => HasText(l) || l.Comment is not null);

    /// <summary>Tokens, or (on a line that was not read) anything but spaces and tabs.</summary>
    private static bool HasText(SyntaxLine line) =>
        line.Tokens.Length > 0 || (line.Comment is null && line.ContentSpan.IndexOfAnyExcept(' ', '\t') >= 0);

    private static int Depth(SyntaxLine line) => line.IsBroken || line.InConflict ? -1 : line.Depth;

    private static string Text(SyntaxLine line) => AppendText(new StringBuilder(), line).ToString();

    private static StringBuilder AppendText(StringBuilder sb, SyntaxLine line) =>
        line.Statement is { } s && !line.InConflict ? Formatter.AppendCanonical(sb, s) : sb.Append(line.ContentSpan.Trim());
}
