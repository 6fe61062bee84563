using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;

namespace MotorLang.Parser;

/// <summary>
/// Re-reads the one line an edit stayed inside, instead of the whole document, when the edit
/// cannot have changed anything but that line's own facts:
/// <list type="bullet">
/// <item>a comment or blank line that stays one: the model is kept as it is;</item>
/// <item>a statement of a feeder, motor or load that keeps its keyword, its indentation and (on a
/// header) its tag: the feeder it belongs to is copied with the re-read statement, and every
/// other node of the model is shared with the previous parse.</item>
/// </list>
/// Anything else (a new line break, a changed keyword or tag, 'like' and 'from' references, the
/// project block, merge conflicts) returns null and the caller parses the whole text. The result
/// equals a full parse of the new text; tests check that on random edits.
/// </summary>
internal static class LineReparser
{
    /// <summary>Longest line re-read on its own; anything longer is left to a full parse, which also checks the document's size.</summary>
    private const int MaxLineChars = 1 << 20;

    public static ParseResult? Reparse(ParseResult previous, string newText, int lineIndex)
    {
        if (lineIndex < 0 || lineIndex >= previous.Tree.Lines.Length) return null;
        if (ReadLine(previous.Tree, newText, lineIndex) is not var (content, _)) return null;
        return Reparse(previous, lineIndex, content, newText);
    }

    /// <summary>
    /// Re-reads line <paramref name="lineIndex"/> with <paramref name="content"/> in place of its
    /// content (its ending stays). The new text is not needed: the tree joins it when asked.
    /// </summary>
    public static ParseResult? Reparse(ParseResult previous, int lineIndex, string content)
    {
        var tree = previous.Tree;
        if (lineIndex < 0 || lineIndex >= tree.Lines.Length || content.Length > MaxLineChars) return null;
        var ending = tree.Lines[lineIndex].LineEnding;
        // A line break or NUL inside, a '\r' that would join the ending, or a BOM that would become the document's changes more than this line.
        if (content.AsSpan().IndexOfAny('\n', '\0') >= 0 || (content.EndsWith('\r') && ending == "\n")) return null;
        if (lineIndex == 0 && !tree.HasBom && content.StartsWith('\uFEFF')) return null;
        if (SyntaxLine.IsConflictMarker(content)) return null;
        return Reparse(previous, lineIndex, content, null);
    }

    private static ParseResult? Reparse(ParseResult previous, int lineIndex, string content, string? newText)
    {
        var tree = previous.Tree;
        var old = tree.Lines[lineIndex];
        if (old.InConflict || old.Kind == LineKind.ConflictMarker) return null;
        var ending = old.LineEnding;

        var diagnostics = new List<Diagnostic>();
        var line = LineScanner.ScanSingle(lineIndex, content, ending, diagnostics);
        if (old.Kind is LineKind.Comment or LineKind.Blank)
        {
            if (line.Tokens.Length > 0 || diagnostics.Count > 0) return null;
            return previous with { Tree = tree.WithSameEndings(newText, tree.Lines.SetItem(lineIndex, line), tree.Diagnostics), Edit = null };
        }

        return ReparseStatement(previous, newText, old, line, diagnostics);
    }

    /// <summary>
    /// The edited line's content and ending in the new text, provided everything before and after
    /// that line is unchanged (checked, not assumed: a caller's wrong line number gives null).
    /// </summary>
    private static (string Content, string Ending)? ReadLine(SyntaxTree tree, string newText, int lineIndex)
    {
        var hasBom = newText.Length > 0 && newText[0] == '\uFEFF';
        if (hasBom != tree.HasBom || newText.Length > DocumentParser.MaxChars) return null;
        var oldText = tree.Text;
        // Found in the text rather than by adding up the lengths of the lines before it: reading
        // tens of thousands of line objects costs more than scanning the characters.
        var start = LineStarts.Find(oldText, lineIndex, hasBom ? 1 : 0);
        if (start < 0) return null;
        var old = tree.Lines[lineIndex];
        var oldEnd = start + old.Length;
        var newEnd = newText.Length - (oldText.Length - oldEnd);
        if (oldEnd > oldText.Length || newEnd < start) return null;
        if (!newText.AsSpan(0, start).SequenceEqual(oldText.AsSpan(0, start)) ||
            !newText.AsSpan(newEnd).SequenceEqual(oldText.AsSpan(oldEnd))) return null;

        var content = newText.AsSpan(start, newEnd - start);
        // A line break or NUL inside, or a '\r' that would join the ending, changes more than this line.
        if (content.IndexOfAny('\n', '\0') >= 0 || (content.EndsWith("\r") && old.LineEnding == "\n")) return null;
        if (SyntaxLine.IsConflictMarker(content)) return null;
        return (content.ToString(), old.LineEnding);
    }

    private static ParseResult? ReparseStatement(ParseResult previous, string? newText, SyntaxLine old, SyntaxLine line, List<Diagnostic> lineDiagnostics)
    {
        if (old.Statement is not { } oldStatement || line.Tokens.Length == 0) return null;
        if (line.IndentWidth != old.IndentWidth || line.IndentHasTab || old.IndentHasTab) return null;
        var spec = oldStatement.Spec;
        if (line.Tokens[0].Kind != TokenKind.Word || Keywords.Find(line.Tokens[0].Text) != spec) return null;
        // An interlock ties motors together across the list (430.24 Exception No. 3), so it is re-read in full.
        if (spec.Keyword is "like" or "from" or "interlock") return null;

        var model = previous.Model;
        if (model.BlockAt(old.Index) is not CircuitNode owner) return null;
        var isHeader = ReferenceEquals(owner.Header, oldStatement);
        if (!isHeader && !ReferenceEquals(owner.Statement(spec.Keyword), oldStatement)) return null;

        var scanned = lineDiagnostics.Count;
        var statement = new StatementParser(new ValueReader(), lineDiagnostics).Parse(line, spec, out var ok);
        if (isHeader && !SameTag(oldStatement, statement)) return null;
        line.Statement = statement;
        line.Depth = old.Depth;
        line.IsBroken = !ok;

        var diagnostics = MergeLineDiagnostics(previous.Diagnostics, old.Index, lineDiagnostics, scanned, isHeader);
        var (newModel, edit) = Copy(model, owner, oldStatement, statement);
        var lines = previous.Tree.Lines.SetItem(old.Index, line);
        return new ParseResult(previous.Tree.WithSameEndings(newText, lines, diagnostics), newModel, diagnostics) { Edit = edit };
    }

    /// <summary>A header keeps its tag, in the same place, so that references and duplicate checks still hold.</summary>
    private static bool SameTag(Statement before, Statement after) =>
        (before.Arg("tag"), after.Arg("tag")) switch
        {
            (null, null) => true,
            ({ } a, { } b) => a.Canonical == b.Canonical && a.Range == b.Range,
            _ => false,
        };

    /// <summary>
    /// The document's diagnostics with the edited line's replaced, in the order a full parse gives:
    /// the line's scan problems, its indentation, its values, then a duplicate tag. Indentation and
    /// duplicate-tag diagnostics depend on other lines, which did not change, so they are kept.
    /// </summary>
    private static ImmutableArray<Diagnostic> MergeLineDiagnostics(ImmutableArray<Diagnostic> all, int lineIndex, List<Diagnostic> fresh, int scanned, bool isHeader)
    {
        var first = 0;
        while (first < all.Length && all[first].Range.Start.Line < lineIndex) first++;
        var end = first;
        while (end < all.Length && all[end].Range.Start.Line == lineIndex) end++;

        var kept = all.AsSpan()[first..end];
        var onLine = new List<Diagnostic>(fresh.Count + kept.Length);
        onLine.AddRange(fresh.Take(scanned));
        foreach (var d in kept) if (d.Code == SyntaxCodes.BadIndentation) onLine.Add(d);
        onLine.AddRange(fresh.Skip(scanned));
        if (isHeader) foreach (var d in kept) if (d.Code == SyntaxCodes.DuplicateTag) onLine.Add(d);

        var result = ImmutableArray.CreateBuilder<Diagnostic>(all.Length - kept.Length + onLine.Count);
        result.AddRange(all.AsSpan()[..first]);
        result.AddRange(onLine.OrderBy(d => d.Range.Start));
        result.AddRange(all.AsSpan()[end..]);
        return result.MoveToImmutable();
    }

    /// <summary>The model with the owner's feeder copied (its motors and loads too), the re-read statement in place of the old.</summary>
    private static (MotorList Model, ModelEdit Edit) Copy(MotorList model, CircuitNode owner, Statement old, Statement replacement)
    {
        var feeder = owner switch
        {
            MotorNode m => m.Feeder,
            LoadNode l => l.Feeder,
            _ => (FeederNode)owner,
        };

        Statement Swap(Statement s) => ReferenceEquals(s, old) ? replacement : s;
        var copies = new Dictionary<CircuitNode, CircuitNode>(feeder.Motors.Count + feeder.Loads.Count + 1);
        var newFeeder = new FeederNode(Swap(feeder.Header), feeder.Parent as ProjectNode);
        feeder.CopyTo(newFeeder, old, replacement);
        copies[feeder] = newFeeder;
        foreach (var motor in feeder.Motors)
        {
            var copy = new MotorNode(Swap(motor.Header), newFeeder);
            motor.CopyTo(copy, old, replacement);
            newFeeder.Add(copy);
            copies[motor] = copy;
        }

        foreach (var load in feeder.Loads)
        {
            var copy = new LoadNode(Swap(load.Header), newFeeder);
            load.CopyTo(copy, old, replacement);
            newFeeder.Add(copy);
            copies[load] = copy;
        }

        var newModel = model.WithFeeder(feeder, newFeeder, copies);
        return (newModel, new ModelEdit(model, old.Line.Index, feeder, newFeeder, copies[owner], copies));
    }
}
