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
/// (or two spaces after the code when the code has grown past it), at most one blank line in a
/// row. Lines with errors, and lines under them, are left exactly as they are. Lines are never
/// reordered and comments are never touched.
/// </summary>
public static class Formatter
{
    public const string IndentUnit = "  ";

    public static FormatResult Format(string text) => Format(DocumentParser.Parse(text));

    /// <summary>Formats the whole document, or only lines <paramref name="firstLine"/>..<paramref name="lastLine"/> (inclusive).</summary>
    public static FormatResult Format(ParseResult parsed, int firstLine = 0, int lastLine = int.MaxValue)
    {
        var result = FormatOnce(parsed, firstLine, lastLine);
        var wholeDocument = firstLine == 0 && lastLine == int.MaxValue;
        if (!result.Changed || !wholeDocument || !parsed.Diagnostics.Any(d => d.Code == Diagnostics.SyntaxCodes.BadIndentation))
            return result;

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
        if (!Fingerprint.Same(DocumentParser.Parse(text), parsed)) return result;
        return new FormatResult(text, [WholeDocument(parsed.Tree, text)], true);
    }

    /// <summary>The statement as the formatter writes it, without indentation or comment.</summary>
    public static string Canonical(Statement statement) => AppendCanonical(new StringBuilder(), statement).ToString();

    /// <summary>Appends keyword and arguments in source order, each in its canonical spelling.</summary>
    public static StringBuilder AppendCanonical(StringBuilder sb, Statement statement)
    {
        sb.Append(statement.Keyword);
        var args = statement.Args;
        var sorted = true;
        for (var i = 1; i < args.Length && sorted; i++) sorted = args[i - 1].Range.Start.CompareTo(args[i].Range.Start) < 0;
        if (!sorted)
        {
            foreach (var arg in args.OrderBy(a => a.Range.Start)) sb.Append(' ').Append(arg.Canonical);
            return sb;
        }

        // By index: this runs for every statement of the document, and enumerating through an interface allocates.
        for (var i = 0; i < args.Length; i++) sb.Append(' ').Append(args[i].Canonical);
        return sb;
    }

    private static FormatResult FormatOnce(ParseResult parsed, int firstLine, int lastLine)
    {
        var tree = parsed.Tree;
        var lines = tree.Lines;
        // Per line: null keeps the line as it is; "" with Delete removes it; anything else replaces its content.
        var replacement = new string?[lines.Length];
        var delete = new bool[lines.Length];
        var lastContent = LastNonBlank(lines);
        var previousBlank = true; // so blank lines at the start of the file go
        var sb = new StringBuilder(128);
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i];
            var blank = line.Kind == LineKind.Blank && !line.InConflict;
            if (i < firstLine || i > lastLine)
            {
                previousBlank = blank;
                continue;
            }

            if (blank)
            {
                // The empty pseudo-line after a final newline stays, or the file would lose it.
                var eof = i == lines.Length - 1 && line.LineEnding.Length == 0;
                if (!eof && (previousBlank || i > lastContent)) delete[i] = true;
                else if (line.Length > 0) replacement[i] = "";
                previousBlank = true;
                continue;
            }

            previousBlank = false;
            if (line.IsBroken || line.InConflict) continue;
            sb.Clear();
            AppendLine(sb, line, lines, i);
            if (!sb.Equals(line.ContentSpan)) replacement[i] = sb.ToString();
        }

        var edits = Edits(lines, replacement, delete);
        if (edits.Count == 0) return new FormatResult(tree.Text, edits, true);

        var output = new StringBuilder(tree.Text.Length);
        if (tree.HasBom) output.Append('\uFEFF');
        for (var i = 0; i < lines.Length; i++)
        {
            if (delete[i]) continue;
            if (replacement[i] is { } r) output.Append(r);
            else output.Append(lines[i].ContentSpan);
            output.Append(lines[i].LineEnding);
        }

        var formatted = output.ToString();
        // Re-read what we wrote: if it does not describe the same document, give nothing back.
        return Fingerprint.Same(DocumentParser.Parse(formatted), parsed)
            ? new FormatResult(formatted, edits, true)
            : new FormatResult(tree.Text, [], false);
    }

    private static void AppendLine(StringBuilder sb, SyntaxLine line, IReadOnlyList<SyntaxLine> lines, int index)
    {
        if (line.Statement is not { } statement)
        {
            // A comment-only line takes the indentation of the statement it introduces.
            var depth = NextDepth(lines, index);
            if (depth >= 0) AppendIndent(sb, depth);
            else sb.Append(line.ContentSpan[..line.IndentWidth]);
            sb.Append(line.Comment!.Value.Text);
            return;
        }

        AppendIndent(sb, line.Depth);
        AppendCanonical(sb, statement);
        if (line.Comment is not { } comment) return;
        // Comments aligned in a column stay in that column while the code fits before it.
        var column = sb.Length + 2 <= comment.Column ? comment.Column : sb.Length + 2;
        sb.Append(' ', column - sb.Length).Append(comment.Text);
    }

    private static void AppendIndent(StringBuilder sb, int depth)
    {
        for (var d = 0; d < depth; d++) sb.Append(IndentUnit);
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

    /// <summary>One edit per changed or removed line, each replacing the whole line including its ending.</summary>
    private static List<TextEdit> Edits(IReadOnlyList<SyntaxLine> lines, string?[] replacement, bool[] delete)
    {
        var edits = new List<TextEdit>();
        for (var i = 0; i < lines.Count; i++)
        {
            if (!delete[i] && replacement[i] is null) continue;
            var line = lines[i];
            var end = line.LineEnding.Length > 0 ? new TextPosition(i + 1, 0) : new TextPosition(i, line.Length);
            edits.Add(new TextEdit(new SourceRange(new TextPosition(i, 0), end), delete[i] ? "" : replacement[i] + line.LineEnding));
        }

        return edits;
    }

    private static TextEdit WholeDocument(SyntaxTree tree, string text)
    {
        var last = tree.Lines[^1];
        var end = new TextPosition(last.Index, last.Length);
        return new TextEdit(new SourceRange(new TextPosition(0, 0), end), tree.HasBom ? text[1..] : text);
    }
}
