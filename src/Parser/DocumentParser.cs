using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;

namespace MotorLang.Parser;

/// <summary>The result of parsing one document: the lossless tree, the model and every diagnostic.</summary>
public sealed record ParseResult(SyntaxTree Tree, MotorList Model, ImmutableArray<Diagnostic> Diagnostics)
{
    /// <summary>Set when this result was made by re-reading one line of an earlier one: what changed in the model.</summary>
    public ModelEdit? Edit { get; init; }

    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);
}

/// <summary>
/// Text → lines → statements → blocks → model. Never throws on any input: each problem becomes a
/// diagnostic on its own line and parsing goes on with the next line.
/// </summary>
public static class DocumentParser
{
    /// <summary>Documents above this size get one diagnostic instead of a parse (about 128 MB of UTF-16).</summary>
    public const int MaxChars = 64 * 1024 * 1024;

    public static ParseResult Parse(string text) => Parse(text, parts: null);

    /// <summary>
    /// Several documents read as one (the files of a plant): <paramref name="text"/> is their texts
    /// joined, each starting on a line listed in <paramref name="partStarts"/> (ascending, the first
    /// 0). Read exactly as <see cref="Parse(string)"/> reads one document, except that a block never
    /// runs from one part into the next, a merge conflict left open ends with its part, tags must be
    /// unique across all parts, and a message that points at another line names it with
    /// <paramref name="lineLabel"/> (which can say which part it is in).
    /// </summary>
    public static ParseResult ParseJoined(string text, IReadOnlyList<int> partStarts, Func<int, string> lineLabel) =>
        Parse(text, new DocumentParts(partStarts, lineLabel));

    private static ParseResult Parse(string text, DocumentParts? parts)
    {
        var diagnostics = new List<Diagnostic>();
        var hasBom = text.Length > 0 && text[0] == '\uFEFF';
        var start = hasBom ? 1 : 0;

        if (text.Length > MaxChars)
        {
            diagnostics.Add(new Diagnostic(SyntaxCodes.FileTooLarge, Severity.Error, SourceRange.OnLine(0, 0, 0),
                $"the document is {text.Length / (1024 * 1024)} M characters; the limit is {MaxChars / (1024 * 1024)} M, so it was not read"));
            return Unreadable(text, hasBom, diagnostics);
        }

        if (text.AsSpan().IndexOf('\0') is var nul and >= 0)
        {
            diagnostics.Add(new Diagnostic(SyntaxCodes.BinaryContent, Severity.Error, SourceRange.OnLine(0, 0, 0),
                $"this looks like a binary file (a NUL character at offset {nul}); a motor list is UTF-8 text"));
            return Unreadable(text, hasBom, diagnostics);
        }

        var lines = LineScanner.Scan(text, start, diagnostics, parts);
        var model = new StructureBuilder(new StatementParser(new ValueReader(), diagnostics), diagnostics, parts).Build(lines);
        var sorted = diagnostics.OrderBy(d => d.Range.Start).ToImmutableArray();
        return new ParseResult(new SyntaxTree(text, hasBom, lines, sorted), model, sorted);
    }

    /// <summary>
    /// After an edit that stayed inside line <paramref name="lineIndex"/>, re-reads just that line
    /// when the edit cannot have changed the document's structure (see <see cref="LineReparser"/>).
    /// Returns null when that does not hold, and the caller parses the whole text.
    /// </summary>
    public static ParseResult? ReparseLine(ParseResult previous, string newText, int lineIndex) =>
        LineReparser.Reparse(previous, newText, lineIndex);

    /// <summary>
    /// The same, given just the edited line's new content (without its ending): for an editor that
    /// knows which line it changed, so a large document's text need not be rebuilt on every key.
    /// </summary>
    public static ParseResult? ReparseLine(ParseResult previous, int lineIndex, string newContent) =>
        LineReparser.Reparse(previous, lineIndex, newContent);

    /// <summary>
    /// The same, for an edit made on top of earlier ones that have not been analysed: the result's
    /// <see cref="ParseResult.Edit"/> describes every change since <paramref name="since"/> (the
    /// model of the last analysed version), so one update sizes again all that the edits together
    /// reach. When <paramref name="previous"/> is neither that model nor chained from it, the
    /// result has no edit and the caller analyses it in full.
    /// </summary>
    public static ParseResult? ReparseLine(ParseResult previous, int lineIndex, string newContent, MotorList since)
    {
        if (LineReparser.Reparse(previous, lineIndex, newContent) is not { } reread) return null;
        if (ReferenceEquals(previous.Model, since)) return reread;
        return reread with { Edit = previous.Edit is { } earlier && ReferenceEquals(earlier.Before, since) ? earlier.Then(reread.Edit) : null };
    }

    private static ParseResult Unreadable(string text, bool hasBom, List<Diagnostic> diagnostics)
    {
        // Keep the text as one opaque line so printing the tree still gives the input back.
        var start = hasBom ? 1 : 0;
        var line = new SyntaxLine(0, text, start, text.Length - start, "", 0, false, [], null, inConflict: false) { IsBroken = true };
        var diags = diagnostics.ToImmutableArray();
        return new ParseResult(new SyntaxTree(text, hasBom, LineList.From([line]), diags), new MotorList(null, [], new(StringComparer.OrdinalIgnoreCase)), diags);
    }
}
