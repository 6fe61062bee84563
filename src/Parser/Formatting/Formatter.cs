using System.Text;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;

namespace MotorLang.Parser.Formatting;

/// <summary>What formatting produced: the new text, the edits that turn the old text into it, and whether it is safe.</summary>
public sealed record FormatResult(string Text, IReadOnlyList<TextEdit> Edits, bool Verified)
{
    public bool Changed => Edits.Count > 0;
}

/// <summary>
/// Writes each well-formed line in its canonical form: two spaces per block level, one space
/// between values, units and keywords spelled one way, an end-of-line comment kept in its column
/// (or two spaces after the code when the code has grown past it),
/// at most one blank line in a row. Lines with errors, and lines under them, are left exactly as
/// they are. Lines are never reordered and comments are never touched.
/// </summary>
public static class Formatter
{
    public const string IndentUnit = "  ";

    public static FormatResult Format(string text) => Format(DocumentParser.Parse(text));

    /// <summary>Formats the whole document, or only lines <paramref name="firstLine"/>..<paramref name="lastLine"/> (inclusive).</summary>
    public static FormatResult Format(ParseResult parsed, int firstLine = 0, int lastLine = int.MaxValue)
    {
        var result = FormatOnce(parsed, firstLine, lastLine);
        if (!result.Changed || firstLine > 0 || lastLine < int.MaxValue) return result;

        // Re-indenting one line can mend another line's indentation error, which the next pass then
        // formats. A few passes reach the fixed point, so formatting twice changes nothing.
        var text = result.Text;
        for (var pass = 0; pass < 3; pass++)
        {
            var next = FormatOnce(DocumentParser.Parse(text), 0, int.MaxValue);
            if (!next.Changed || !next.Verified) break;
            text = next.Text;
        }

        if (text == result.Text) return result;
        if (!Fingerprint.Same(Fingerprint.Of(DocumentParser.Parse(text)), Fingerprint.Of(parsed))) return result;
        return new FormatResult(text, [WholeDocument(parsed.Tree, text)], true);
    }

    private static TextEdit WholeDocument(SyntaxTree tree, string text)
    {
        var last = tree.Lines[^1];
        var end = new TextPosition(last.Index, last.Length);
        return new TextEdit(new SourceRange(new TextPosition(0, 0), end), tree.HasBom ? text[1..] : text);
    }

    private static FormatResult FormatOnce(ParseResult parsed, int firstLine, int lastLine)
    {
        var tree = parsed.Tree;
        var lines = tree.Lines;
        var output = new string?[lines.Length];
        var lastContent = LastNonBlank(lines);
        var previousBlank = true; // so blank lines at the start of the file go
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i];
            var original = line.Content + line.LineEnding;
            var inRange = i >= firstLine && i <= lastLine;
            var blank = line.Kind == LineKind.Blank && !line.InConflict;
            if (!inRange)
            {
                output[i] = original;
                previousBlank = blank;
                continue;
            }

            if (blank)
            {
                var drop = previousBlank || i > lastContent;
                output[i] = drop ? null : line.LineEnding;
                // The empty pseudo-line after a final newline stays, or the file would lose it.
                if (i == lines.Length - 1 && line.LineEnding.Length == 0) output[i] = "";
                previousBlank = true;
                continue;
            }

            previousBlank = false;
            output[i] = line.IsBroken || line.InConflict ? original : FormatLine(line, lines, i) + line.LineEnding;
        }

        var sb = new StringBuilder(tree.Text.Length);
        if (tree.HasBom) sb.Append('\uFEFF');
        foreach (var o in output) sb.Append(o);
        var formatted = sb.ToString();
        var edits = Edits(lines, output);
        if (edits.Count == 0) return new FormatResult(tree.Text, edits, true);

        // Re-read what we wrote: if it does not describe the same document, give nothing back.
        var verified = Fingerprint.Same(Fingerprint.Of(DocumentParser.Parse(formatted)), Fingerprint.Of(parsed));
        return verified ? new FormatResult(formatted, edits, true) : new FormatResult(tree.Text, [], false);
    }

    private static string FormatLine(SyntaxLine line, IReadOnlyList<SyntaxLine> lines, int index)
    {
        if (line.Statement is not { } statement)
        {
            // A comment-only line takes the indentation of the statement it introduces.
            var depth = NextDepth(lines, index);
            var indent = depth >= 0 ? Repeat(depth) : line.Content[..line.IndentWidth];
            return indent + line.Comment!.Value.Text;
        }

        var code = Repeat(line.Depth) + Canonical(statement);
        if (line.Comment is not { } comment) return code;
        // Comments aligned in a column stay in that column while the code fits before it.
        var column = code.Length + 2 <= comment.Column ? comment.Column : code.Length + 2;
        return code.PadRight(column) + comment.Text;
    }

    /// <summary>The statement as the formatter writes it, without indentation or comment.</summary>
    public static string Canonical(Statement statement)
    {
        var sb = new StringBuilder(statement.Keyword);
        foreach (var arg in statement.Args.OrderBy(a => a.Range.Start)) sb.Append(' ').Append(arg.Canonical);
        return sb.ToString();
    }

    private static int NextDepth(IReadOnlyList<SyntaxLine> lines, int index)
    {
        for (var j = index + 1; j < lines.Count; j++)
        {
            var l = lines[j];
            if (l.Kind == LineKind.Statement) return l.IsBroken ? -1 : l.Depth;
            if (l.InConflict) return -1;
        }

        return 0;
    }

    private static int LastNonBlank(IReadOnlyList<SyntaxLine> lines)
    {
        for (var i = lines.Count - 1; i >= 0; i--)
        {
            if (lines[i].Kind != LineKind.Blank || lines[i].InConflict) return i;
        }

        return -1;
    }

    private static string Repeat(int depth) => depth <= 0 ? "" : string.Concat(Enumerable.Repeat(IndentUnit, depth));

    /// <summary>One edit per changed or removed line, each replacing the whole line including its ending.</summary>
    private static List<TextEdit> Edits(IReadOnlyList<SyntaxLine> lines, string?[] output)
    {
        var edits = new List<TextEdit>();
        for (var i = 0; i < lines.Count; i++)
        {
            var original = lines[i].Content + lines[i].LineEnding;
            var now = output[i] ?? "";
            if (now == original) continue;
            var end = lines[i].LineEnding.Length > 0 ? new TextPosition(i + 1, 0) : new TextPosition(i, lines[i].Content.Length);
            edits.Add(new TextEdit(new SourceRange(new TextPosition(i, 0), end), now));
        }

        return edits;
    }
}
