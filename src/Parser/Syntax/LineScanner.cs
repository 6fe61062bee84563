using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;

namespace MotorLang.Parser.Syntax;

/// <summary>
/// Splits text into lines and each line into tokens. Hand-written rather than a Sprache grammar
/// because it runs over every character of files with hundreds of thousands of lines, and because
/// working a line at a time is what lets one bad line never disturb the next.
/// </summary>
internal static class LineScanner
{
    public static LineList Scan(string text, int start, List<Diagnostic> diagnostics, DocumentParts? parts = null)
    {
        var lines = new LineList.Builder();
        SyntaxLine? last = null;
        var pool = new StringPool();
        var tokens = new List<SyntaxToken>();
        var conflictOpen = false;
        var offset = start;
        var index = 0;
        while (offset < text.Length || (offset == text.Length && (last is null || last.LineEnding.Length > 0)))
        {
            var nl = text.IndexOf('\n', offset);
            int contentEnd, next;
            string ending;
            if (nl < 0)
            {
                contentEnd = text.Length;
                next = text.Length + 1;
                ending = "";
            }
            else if (nl > offset && text[nl - 1] == '\r')
            {
                contentEnd = nl - 1;
                next = nl + 1;
                ending = "\r\n";
            }
            else
            {
                contentEnd = nl;
                next = nl + 1;
                ending = "\n";
            }

            var content = text.AsSpan(offset, contentEnd - offset);
            // A conflict left open in one part of a joined document ends with that part.
            if (parts is not null && parts.IsStart(index)) conflictOpen = false;
            var inConflict = TrackConflict(content, index, ref conflictOpen, diagnostics);
            lines.Add(last = ScanLine(text, index, offset, content, ending, inConflict, diagnostics, pool, tokens));
            index++;
            if (next > text.Length) break;
            offset = next;
        }

        return lines.ToList();
    }

    /// <summary>Scans one line on its own (its text is the whole source), for re-reading a single edited line.</summary>
    public static SyntaxLine ScanSingle(int index, string content, string ending, List<Diagnostic> diagnostics) =>
        ScanLine(content, index, 0, content.AsSpan(), ending, inConflict: false, diagnostics, new StringPool(), []);

    private static bool TrackConflict(ReadOnlySpan<char> content, int line, ref bool open, List<Diagnostic> diagnostics)
    {
        if (content.StartsWith("<<<<<<<", StringComparison.Ordinal))
        {
            if (!open)
            {
                diagnostics.Add(new Diagnostic(SyntaxCodes.MergeConflict, Severity.Error,
                    SourceRange.OnLine(line, 0, content.Length),
                    "unresolved merge conflict: keep one side, delete the other and the marker lines"));
            }

            open = true;
            return true;
        }

        if (!open) return false;
        if (content.StartsWith(">>>>>>>", StringComparison.Ordinal)) open = false;
        return true;
    }

    private static SyntaxLine ScanLine(string text, int index, int offset, ReadOnlySpan<char> content, string ending,
        bool inConflict, List<Diagnostic> diagnostics, StringPool pool, List<SyntaxToken> tokens)
    {
        tokens.Clear();
        var i = 0;
        var hasTab = false;
        while (i < content.Length && (content[i] == ' ' || content[i] == '\t'))
        {
            hasTab |= content[i] == '\t';
            i++;
        }

        var indent = i;
        SyntaxToken? comment = null;
        while (i < content.Length)
        {
            var c = content[i];
            if (c == ' ' || c == '\t')
            {
                i++;
                continue;
            }

            if (c == '#')
            {
                var end = content.Length;
                while (end > i && (content[end - 1] == ' ' || content[end - 1] == '\t')) end--;
                comment = new SyntaxToken(TokenKind.Comment, index, i, content[i..end].ToString());
                break;
            }

            var startCol = i;
            if (c == '"')
            {
                i = ScanString(content, i + 1, out var closed);
                if (!closed && !inConflict)
                {
                    diagnostics.Add(new Diagnostic(SyntaxCodes.UnterminatedString, Severity.Error,
                        SourceRange.OnLine(index, startCol, i - startCol), "this string has no closing quote (\")"));
                }

                tokens.Add(new SyntaxToken(TokenKind.String, index, startCol, content[startCol..i].ToString()));
                continue;
            }

            while (i < content.Length && content[i] is not (' ' or '\t' or '"' or '#')) i++;
            tokens.Add(new SyntaxToken(TokenKind.Word, index, startCol, pool.Get(content[startCol..i])));
        }

        return new SyntaxLine(index, text, offset, content.Length, ending, indent, hasTab,
            tokens.Count == 0 ? [] : ImmutableArray.Create(System.Runtime.InteropServices.CollectionsMarshal.AsSpan(tokens)), comment, inConflict);
    }

    /// <summary>Returns the index after the closing quote, or the line's end when there is none.</summary>
    private static int ScanString(ReadOnlySpan<char> content, int i, out bool closed)
    {
        while (i < content.Length)
        {
            if (content[i] == '\\' && i + 1 < content.Length)
            {
                i += 2;
                continue;
            }

            if (content[i] == '"')
            {
                closed = true;
                return i + 1;
            }

            i++;
        }

        closed = false;
        return content.Length;
    }
}
