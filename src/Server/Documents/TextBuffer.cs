using MotorLang.Parser.Syntax;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>
/// A text held as its lines, for applying a run of changes that the tree cannot take one line at a
/// time (a new line break, a line that changes the structure): each change touches only its own
/// lines, where applying it to the whole string would copy megabytes per keystroke. Positions are
/// read exactly as <see cref="TextChanges.Apply"/> reads them; a test compares the two.
/// </summary>
internal sealed class TextBuffer
{
    // Every line but the last ends with its '\n' (and a '\r' before it, when written); the last has none.
    private readonly List<string> _lines;

    private TextBuffer(List<string> lines) => _lines = lines;

    public static TextBuffer From(string text)
    {
        var lines = new List<string>();
        var start = 0;
        for (int nl; (nl = text.IndexOf('\n', start)) >= 0; start = nl + 1) lines.Add(text[start..(nl + 1)]);
        lines.Add(text[start..]);
        return new TextBuffer(lines);
    }

    /// <summary>The buffer of a tree's text, read from its lines without joining the whole text first.</summary>
    public static TextBuffer From(SyntaxTree tree)
    {
        var lines = new List<string>(tree.Lines.Count + 1);
        foreach (var line in tree.Lines)
        {
            var text = string.Concat(line.ContentSpan, line.LineEnding);
            lines.Add(lines.Count == 0 && tree.HasBom ? "\uFEFF" + text : text);
        }

        if (lines.Count == 0) lines.Add(tree.HasBom ? "\uFEFF" : "");
        else if (lines[^1].EndsWith('\n')) lines.Add("");
        return new TextBuffer(lines);
    }

    public void Apply(TextDocumentContentChangeEvent change)
    {
        if (change.Range is not { } range)
        {
            var whole = From(change.Text);
            _lines.Clear();
            _lines.AddRange(whole._lines);
            return;
        }

        var (startLine, startColumn) = Locate(range.Start);
        var (endLine, endColumn) = Locate(range.End);
        if (endLine < startLine || (endLine == startLine && endColumn < startColumn)) (endLine, endColumn) = (startLine, startColumn);
        var joined = string.Concat(_lines[startLine].AsSpan(0, startColumn), change.Text, _lines[endLine].AsSpan(endColumn));
        var pieces = new List<string>();
        var at = 0;
        for (int nl; (nl = joined.IndexOf('\n', at)) >= 0; at = nl + 1) pieces.Add(joined[at..(nl + 1)]);
        // What follows the last line break is a line of its own only at the end of the text; elsewhere it is empty (the old line's ending ended the piece).
        if (endLine == _lines.Count - 1 || at < joined.Length) pieces.Add(joined[at..]);
        _lines.RemoveRange(startLine, endLine - startLine + 1);
        _lines.InsertRange(startLine, pieces);
    }

    /// <summary>A position as a line and a column inside it: a line past the end is the end of the text; a column past the end of its line is its end.</summary>
    private (int Line, int Column) Locate(Position p)
    {
        var index = Math.Max(p.Line, 0);
        if (index >= _lines.Count) return (_lines.Count - 1, _lines[^1].Length);
        var line = _lines[index];
        var content = line.EndsWith("\r\n", StringComparison.Ordinal) ? line.Length - 2 : line.EndsWith('\n') ? line.Length - 1 : line.Length;
        return (index, Math.Min(Math.Max(p.Character, 0), content));
    }

    public override string ToString() => string.Concat(_lines);
}
