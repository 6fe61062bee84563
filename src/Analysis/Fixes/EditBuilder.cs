using System.Collections.Immutable;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Fixes;

/// <summary>
/// Builds text edits on the syntax tree: replace one value, or add a statement to a block at the
/// block's own indentation, after its last statement, with the document's line ending.
/// </summary>
public sealed class EditBuilder(SyntaxTree tree)
{
    public static TextEdit Replace(Argument argument, string text) => new(argument.Range, text);

    /// <summary>Appends a value to a statement (e.g. a rating after 'protection dual-element-fuse').</summary>
    public static TextEdit Append(Statement statement, string text) =>
        new(new SourceRange(statement.Range.End, statement.Range.End), " " + text);

    /// <summary>Adds a statement as the block's last own statement.</summary>
    public TextEdit Insert(BlockNode block, string statement)
    {
        var after = tree.Lines[block.LastOwnLine];
        var indent = new string(' ', block.ChildIndent ?? block.Header.Line.IndentWidth + 2);
        if (after.LineEnding.Length == 0)
        {
            var end = new TextPosition(after.Index, after.Length);
            return new TextEdit(new SourceRange(end, end), tree.PreferredLineEnding + indent + statement);
        }

        var at = new TextPosition(after.Index + 1, 0);
        return new TextEdit(new SourceRange(at, at), indent + statement + after.LineEnding);
    }

    /// <summary>
    /// Joins edits from several fixes: insertions at one point are concatenated in order, and an
    /// edit that overlaps one already taken is dropped (its finding stays for a second pass).
    /// </summary>
    public static ImmutableArray<TextEdit> Combine(IEnumerable<TextEdit> edits)
    {
        var taken = new List<TextEdit>();
        foreach (var e in edits)
        {
            var sameInsert = taken.FindIndex(t => t.Range.Start == t.Range.End && e.Range.Start == e.Range.End && t.Range.Start == e.Range.Start);
            if (sameInsert >= 0)
            {
                taken[sameInsert] = taken[sameInsert] with { NewText = taken[sameInsert].NewText + e.NewText };
                continue;
            }

            if (taken.Any(t => Overlaps(t.Range, e.Range))) continue;
            taken.Add(e);
        }

        return [.. taken];
    }

    private static bool Overlaps(SourceRange a, SourceRange b) =>
        a.Start.CompareTo(b.End) < 0 && b.Start.CompareTo(a.End) < 0
        || (a.Start == a.End && a.Start.CompareTo(b.Start) > 0 && a.Start.CompareTo(b.End) < 0)
        || (b.Start == b.End && b.Start.CompareTo(a.Start) > 0 && b.Start.CompareTo(a.End) < 0);
}
