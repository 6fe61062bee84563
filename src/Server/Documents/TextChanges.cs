using MotorLang.Parser.Text;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>Applies LSP content changes (UTF-16 positions) to a text.</summary>
public static class TextChanges
{
    public static string Apply(string text, IEnumerable<TextDocumentContentChangeEvent> changes)
    {
        foreach (var change in changes)
        {
            if (change.Range is not { } range)
            {
                text = change.Text;
                continue;
            }

            var start = Offset(text, range.Start);
            var end = Math.Max(start, Offset(text, range.End));
            // One allocation of the new text: a document can be megabytes, and this runs on every keystroke.
            text = string.Concat(text.AsSpan(0, start), change.Text, text.AsSpan(end));
        }

        return text;
    }

    /// <summary>
    /// The offset of a position. A line past the end is the end of the text; a character past the
    /// end of its line is the end of that line (the protocol says to clamp), never into the next.
    /// </summary>
    public static int Offset(string text, Position p)
    {
        var offset = LineStarts.Find(text, p.Line);
        if (offset < 0) return text.Length;
        var lineEnd = text.IndexOf('\n', offset);
        if (lineEnd < 0) lineEnd = text.Length;
        else if (lineEnd > offset && text[lineEnd - 1] == '\r') lineEnd--;
        return Math.Min(offset + Math.Max(p.Character, 0), lineEnd);
    }
}
