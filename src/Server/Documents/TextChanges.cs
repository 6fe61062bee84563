using System.Text;
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
            text = new StringBuilder(text.Length - (end - start) + change.Text.Length)
                .Append(text, 0, start).Append(change.Text).Append(text, end, text.Length - end).ToString();
        }

        return text;
    }

    /// <summary>
    /// The offset of a position. A line past the end is the end of the text; a character past the
    /// end of its line is the end of that line (the protocol says to clamp), never into the next.
    /// </summary>
    public static int Offset(string text, Position p)
    {
        var offset = 0;
        for (var line = 0; line < p.Line; line++)
        {
            var nl = text.IndexOf('\n', offset);
            if (nl < 0) return text.Length;
            offset = nl + 1;
        }

        var lineEnd = text.IndexOf('\n', offset);
        if (lineEnd < 0) lineEnd = text.Length;
        else if (lineEnd > offset && text[lineEnd - 1] == '\r') lineEnd--;
        return Math.Min(offset + Math.Max(p.Character, 0), lineEnd);
    }
}
