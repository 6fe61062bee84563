using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Formatting;

/// <summary>
/// The formatter's self-check: re-reads the text it wrote and compares it line by line with the
/// input. Not the models alone (an unreadable document and an empty one have equal, empty
/// models) but each line's text, tokens, comment, depth and diagnostics.
/// </summary>
internal static class ReadBack
{
    /// <param name="original">The input as parsed.</param>
    /// <param name="formatted">The output as parsed.</param>
    /// <param name="kept">For each output line, the input line it came from (only blank lines are ever removed).</param>
    /// <param name="frozen">Input lines that had to be left exactly as written.</param>
    /// <param name="rewritten">Input lines whose content the formatter replaced.</param>
    public static bool Same(ParseResult original, ParseResult formatted, IReadOnlyList<int> kept, bool[] frozen, bool[] rewritten)
    {
        if (FrozenLines.IsUnreadable(formatted)) return false;
        var before = original.Tree.Lines;
        var after = formatted.Tree.Lines;
        if (after.Count != kept.Count) return false;
        if (formatted.Tree.HasBom != original.Tree.HasBom) return false;

        var frozenAfter = FrozenLines.Of(formatted);
        for (var j = 0; j < after.Count; j++)
        {
            var i = kept[j];
            var (a, b) = (before[i], after[j]);
            if (frozenAfter[j] != frozen[i]) return false;
            if (a.LineEnding != b.LineEnding || a.InConflict != b.InConflict || a.IsBroken != b.IsBroken || a.Depth != b.Depth) return false;
            if (a.Kind != b.Kind || a.Comment?.Text != b.Comment?.Text) return false;
            if (!rewritten[i])
            {
                if (!a.ContentSpan.SequenceEqual(b.ContentSpan)) return false;
                continue;
            }

            if (frozen[i] || !SameTokens(a, b)) return false;
        }

        return SameDiagnostics(original, formatted, kept);
    }

    /// <summary>Descriptions exactly as written; everything else equal in canonical form.</summary>
    private static bool SameTokens(SyntaxLine a, SyntaxLine b)
    {
        if (a.Statement is null != b.Statement is null) return false;
        if (a.Statement is { } sa && Formatter.Canonical(sa) != Formatter.Canonical(b.Statement!)) return false;
        var i = 0;
        var j = 0;
        while (true)
        {
            while (i < a.Tokens.Length && a.Tokens[i].Kind != TokenKind.String) i++;
            while (j < b.Tokens.Length && b.Tokens[j].Kind != TokenKind.String) j++;
            if (i == a.Tokens.Length || j == b.Tokens.Length) return i == a.Tokens.Length && j == b.Tokens.Length;
            if (a.Tokens[i++].Text != b.Tokens[j++].Text) return false;
        }
    }

    /// <summary>The same diagnostics (code and columns) on corresponding lines.</summary>
    private static bool SameDiagnostics(ParseResult original, ParseResult formatted, IReadOnlyList<int> kept)
    {
        if (original.Diagnostics.Length != formatted.Diagnostics.Length) return false;
        var newLine = new int[original.Tree.Lines.Count];
        Array.Fill(newLine, -1);
        for (var j = 0; j < kept.Count; j++) newLine[kept[j]] = j;

        var x = original.Diagnostics.Select(d => Key(d, Map(newLine, d.Range.Start.Line), Map(newLine, d.Range.End.Line))).Order().ToList();
        var y = formatted.Diagnostics.Select(d => Key(d, d.Range.Start.Line, d.Range.End.Line)).Order().ToList();
        return x.SequenceEqual(y);
    }

    private static int Map(int[] newLine, int line) => line >= 0 && line < newLine.Length ? newLine[line] : line;

    private static (int, int, int, int, string) Key(Diagnostic d, int startLine, int endLine) =>
        (startLine, d.Range.Start.Column, endLine, d.Range.End.Column, d.Code);
}
