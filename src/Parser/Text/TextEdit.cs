namespace MotorLang.Parser.Text;

/// <summary>Replace the text in <paramref name="Range"/> with <paramref name="NewText"/>.</summary>
public sealed record TextEdit(SourceRange Range, string NewText);

public static class TextEdits
{
    /// <summary>Applies non-overlapping edits to a text; positions refer to the text before any edit.</summary>
    public static string Apply(string text, IEnumerable<TextEdit> edits)
    {
        var lineStarts = LineStarts(text);
        var ordered = edits.OrderByDescending(e => e.Range.Start).ThenByDescending(e => e.Range.End).ToList();
        var sb = new System.Text.StringBuilder(text);
        foreach (var e in ordered)
        {
            var start = Offset(lineStarts, text, e.Range.Start);
            var end = Offset(lineStarts, text, e.Range.End);
            sb.Remove(start, end - start).Insert(start, e.NewText);
        }

        return sb.ToString();
    }

    /// <summary>
    /// Offsets where each line starts, counting only "\n" as a line break ("\r\n" ends with one).
    /// A byte-order mark is not part of line 0, as positions in the syntax tree do not count it.
    /// </summary>
    public static List<int> LineStarts(string text)
    {
        var starts = new List<int> { text.Length > 0 && text[0] == '\uFEFF' ? 1 : 0 };
        for (var i = 0; i < text.Length; i++)
        {
            if (text[i] == '\n') starts.Add(i + 1);
        }

        return starts;
    }

    public static int Offset(List<int> lineStarts, string text, TextPosition p)
    {
        if (p.Line >= lineStarts.Count) return text.Length;
        return Math.Min(lineStarts[p.Line] + p.Column, text.Length);
    }
}
