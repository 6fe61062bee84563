using MotorLang.Parser.Syntax;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>
/// A change as new contents for the lines it touches, when it keeps every line where it was: no
/// line break added or removed, each touched line keeping its ending. That covers typing inside a
/// line and replacing a block of lines by as many lines; the tree can then re-read just those lines.
/// </summary>
internal static class LineEdits
{
    /// <summary>The changed lines with their new contents (without endings), or null when lines would move.</summary>
    public static List<(int Line, string Content)>? Of(SyntaxTree tree, TextDocumentContentChangeEvent change)
    {
        if (change.Range is not { } range) return null;
        var (first, last) = (range.Start.Line, range.End.Line);
        var lines = tree.Lines;
        if (first < 0 || last < first || last >= lines.Count) return null;
        // Positions on line 0 count a byte-order mark as a character (TextChanges does); the tree's lines do not hold it.
        if (first == 0 && tree.HasBom) return null;
        if (change.Text.AsSpan().Count('\n') != last - first) return null;

        var startLine = lines[first].ContentSpan;
        var endLine = lines[last].ContentSpan;
        var start = Math.Clamp(range.Start.Character, 0, startLine.Length);
        var end = Math.Clamp(range.End.Character, 0, endLine.Length);
        if (first == last && end < start) end = start;
        var joined = string.Concat(startLine[..start], change.Text, endLine[end..]);

        var edits = new List<(int, string)>(last - first + 1);
        var at = 0;
        for (var i = first; i <= last; i++)
        {
            var nl = i < last ? joined.IndexOf('\n', at) : joined.Length;
            var content = joined[at..nl];
            if (i < last)
            {
                // The line keeps its ending: "\r\n" stays "\r\n", "\n" stays "\n".
                var crlf = lines[i].LineEnding == "\r\n";
                if (content.EndsWith('\r') != crlf) return null;
                if (crlf) content = content[..^1];
            }

            if (!content.AsSpan().SequenceEqual(lines[i].ContentSpan)) edits.Add((i, content));
            at = nl + 1;
        }

        return edits;
    }
}
