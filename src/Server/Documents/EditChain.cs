using MotorLang.Parser;
using MotorLang.Parser.Model;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>
/// Applies a run of changes, made one after another without reading the versions between, to the
/// tree of the version they started from.
/// </summary>
internal static class EditChain
{
    /// <summary>
    /// The tree after <paramref name="changes"/>, and the analysed version its model edit is
    /// relative to (<paramref name="editBase"/>, or null when the result must be analysed in full).
    /// As long as changes keep lines where they are, each touched line is re-read on its own and
    /// the model edits are chained from <paramref name="editBase"/>'s model; from the first change
    /// that moves lines or changes the structure on, the rest are applied to the text, which is
    /// then parsed once.
    /// </summary>
    public static (ParseResult Parse, DocumentSnapshot? EditBase) Apply(ParseResult start, DocumentSnapshot? editBase,
        IEnumerable<TextDocumentContentChangeEvent> changes)
    {
        var since = editBase?.Parse.Model;
        var current = start;
        TextBuffer? text = null;
        foreach (var change in changes)
        {
            if (text is not null)
            {
                text.Apply(change);
                continue;
            }

            if (Reread(current, change, since) is { } next)
            {
                current = next;
                continue;
            }

            text = TextBuffer.From(current.Tree);
            text.Apply(change);
        }

        if (text is not null) return (DocumentParser.Parse(text.ToString()), null);
        var related = since is not null && (ReferenceEquals(current.Model, since) || ReferenceEquals(current.Edit?.Before, since));
        return (current, related ? editBase : null);
    }

    /// <summary>A text with the changes applied, parsed once.</summary>
    public static ParseResult ApplyToText(string text, IEnumerable<TextDocumentContentChangeEvent> changes)
    {
        var buffer = TextBuffer.From(text);
        foreach (var change in changes) buffer.Apply(change);
        return DocumentParser.Parse(buffer.ToString());
    }

    /// <summary>The tree with the change's lines re-read, or null when the change moves lines or a line cannot be re-read on its own.</summary>
    private static ParseResult? Reread(ParseResult current, TextDocumentContentChangeEvent change, MotorList? since)
    {
        if (LineEdits.Of(current.Tree, change) is not { } edits) return null;
        foreach (var (line, content) in edits)
        {
            var next = since is null
                ? DocumentParser.ReparseLine(current, line, content)
                : DocumentParser.ReparseLine(current, line, content, since);
            if (next is null) return null;
            current = next;
        }

        return current;
    }
}
