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
/// row. Lines are never reordered, comments and descriptions never touched, and only lines of
/// nothing but spaces and tabs are ever removed. A line that carries a diagnostic, or that the
/// parser could not read, is left byte for byte as written (<see cref="FrozenLines"/>); so is a
/// whole document that was not read (P018, P019).
/// </summary>
public static class Formatter
{
    public const string IndentUnit = "  ";

    public static FormatResult Format(string text) => Format(DocumentParser.Parse(text));

    /// <summary>Formats the whole document, or only lines <paramref name="firstLine"/>..<paramref name="lastLine"/> (inclusive).</summary>
    public static FormatResult Format(ParseResult parsed, int firstLine = 0, int lastLine = int.MaxValue)
    {
        var tree = parsed.Tree;
        // Nothing of an unreadable document was read, so there is nothing the formatter may write.
        if (FrozenLines.IsUnreadable(parsed)) return new FormatResult(tree.Text, [], true);

        var frozen = FrozenLines.Of(parsed);
        // A document of nothing but blank lines has nothing to format; emptying it would look like a lost file.
        if (LastNonBlank(tree.Lines, frozen) < 0) return new FormatResult(tree.Text, [], true);
        // Re-indenting a line can change how a neighbouring line that has an error is read (a
        // misplaced motor becomes a valid one). The read-back check catches that; the lines are
        // then formatted within themselves, each keeping its indentation, which cannot move a
        // line into another block.
        return FormatOnce(parsed, frozen, firstLine, lastLine, reindent: true)
               ?? FormatOnce(parsed, frozen, firstLine, lastLine, reindent: false)
               ?? new FormatResult(tree.Text, [], false);
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

    /// <summary>One formatting of the document; null when the result does not read back as the same document.</summary>
    private static FormatResult? FormatOnce(ParseResult parsed, bool[] frozen, int firstLine, int lastLine, bool reindent)
    {
        var tree = parsed.Tree;
        var lines = tree.Lines;
        // Per line: null keeps the line as it is; Delete removes it; anything else replaces its content.
        var replacement = new string?[lines.Count];
        var delete = new bool[lines.Count];
        var lastContent = LastNonBlank(lines, frozen);
        var previousBlank = true; // so blank lines at the start of the file go
        var sb = new StringBuilder(128);
        for (var i = 0; i < lines.Count; i++)
        {
            var line = lines[i];
            var blank = !frozen[i] && IsBlank(line);
            if (i < firstLine || i > lastLine)
            {
                previousBlank = blank;
                continue;
            }

            if (blank)
            {
                // The last line (empty after a final newline, or blanks without one) is emptied, never
                // removed: removing it would leave the line before it last, changing the line count.
                var eof = i == lines.Count - 1 && line.LineEnding.Length == 0;
                if (!eof && (previousBlank || i > lastContent)) delete[i] = true;
                else if (line.Length > 0) replacement[i] = "";
                previousBlank = true;
                continue;
            }

            previousBlank = false;
            if (frozen[i] || (line.Statement is null && line.Comment is null)) continue;
            sb.Clear();
            AppendLine(sb, line, lines, i, frozen, reindent);
            if (!sb.Equals(line.ContentSpan)) replacement[i] = sb.ToString();
        }

        var edits = Edits(lines, replacement, delete);
        if (edits.Count == 0) return new FormatResult(tree.Text, edits, true);

        var output = new StringBuilder(tree.Text.Length);
        if (tree.HasBom) output.Append('\uFEFF');
        var kept = new List<int>(lines.Count);
        var rewritten = new bool[lines.Count];
        for (var i = 0; i < lines.Count; i++)
        {
            if (delete[i]) continue;
            kept.Add(i);
            if (replacement[i] is { } r)
            {
                output.Append(r);
                rewritten[i] = true;
            }
            else output.Append(lines[i].ContentSpan);

            output.Append(lines[i].LineEnding);
        }

        var formatted = output.ToString();
        // Re-read what we wrote: if it does not describe the same document, line by line, give nothing back.
        return ReadBack.Same(parsed, DocumentParser.Parse(formatted), kept, frozen, rewritten)
            ? new FormatResult(formatted, edits, true)
            : null;
    }

    /// <summary>Only spaces and tabs: the one kind of line the formatter may remove or empty.</summary>
    private static bool IsBlank(SyntaxLine line) =>
        line.Kind == LineKind.Blank && !line.InConflict && line.ContentSpan.IndexOfAnyExcept(' ', '\t') < 0;

    private static void AppendLine(StringBuilder sb, SyntaxLine line, IReadOnlyList<SyntaxLine> lines, int index, bool[] frozen, bool reindent)
    {
        if (line.Statement is not { } statement)
        {
            // A comment-only line takes the indentation of the statement it introduces.
            var depth = reindent ? NextDepth(lines, index, frozen) : -1;
            if (depth >= 0) AppendIndent(sb, depth);
            else sb.Append(line.ContentSpan[..line.IndentWidth]);
            sb.Append(line.Comment!.Value.Text);
            return;
        }

        if (reindent) AppendIndent(sb, line.Depth);
        else sb.Append(line.ContentSpan[..line.IndentWidth]);
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

    /// <summary>The depth of the next statement, or -1 (keep the comment where it is) when that statement is left as written.</summary>
    private static int NextDepth(IReadOnlyList<SyntaxLine> lines, int index, bool[] frozen)
    {
        for (var j = index + 1; j < lines.Count; j++)
        {
            var l = lines[j];
            if (l.Kind == LineKind.Statement) return frozen[j] || l.Depth < 0 ? -1 : l.Depth;
            if (l.InConflict || (frozen[j] && l.Kind != LineKind.Comment)) return -1;
        }

        return 0;
    }

    private static int LastNonBlank(IReadOnlyList<SyntaxLine> lines, bool[] frozen)
    {
        for (var i = lines.Count - 1; i >= 0; i--)
        {
            if (frozen[i] || !IsBlank(lines[i])) return i;
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
}
