using MotorLang.Parser;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Editing;

/// <summary>Every place a tag is written: its definition (a header) and the references to it ('from', 'like').</summary>
public sealed record TagOccurrences(string Tag, SourceRange? Definition, IReadOnlyList<SourceRange> References)
{
    public IEnumerable<SourceRange> All => (Definition is { } d ? [d] : Array.Empty<SourceRange>()).Concat(References);
}

/// <summary>Go to definition, find references and rename for tags.</summary>
public static class Tags
{
    /// <summary>The tag under the cursor (in a header or in a 'from'/'like'), with all its occurrences; null elsewhere.</summary>
    public static TagOccurrences? At(ParseResult parse, TextPosition position)
    {
        var tag = TagAt(parse, position);
        return tag is null ? null : Occurrences(parse, tag);
    }

    public static TagOccurrences Occurrences(ParseResult parse, string tag)
    {
        var definition = parse.Model.Find(tag)?.Tag?.Range;
        var references = new List<SourceRange>();
        foreach (var line in parse.Tree.Lines)
        {
            if (line.Statement is { Keyword: "from" or "like" } s && s.Args.FirstOrDefault() is { } a
                && string.Equals((string)a.Value, tag, StringComparison.OrdinalIgnoreCase))
                references.Add(a.Range);
        }

        return new TagOccurrences(parse.Model.Find(tag)?.Tag?.Value ?? tag, definition, references);
    }

    /// <summary>Edits that rename a tag everywhere, or the reason it cannot be renamed to that name.</summary>
    public static (IReadOnlyList<TextEdit>? Edits, string? Error) Rename(ParseResult parse, TextPosition position, string newName)
    {
        var occurrences = At(parse, position);
        if (occurrences is null) return (null, "there is no tag here to rename");
        if (!Keywords.IsValidTag(newName)) return (null, $"'{newName}' is not a valid tag");
        if (parse.Model.Find(newName) is { } clash && !string.Equals(newName, occurrences.Tag, StringComparison.OrdinalIgnoreCase))
            return (null, $"tag '{newName}' is already used on line {clash.Header.Line.Index + 1}");
        return (occurrences.All.Select(r => new TextEdit(r, newName)).ToList(), null);
    }

    private static string? TagAt(ParseResult parse, TextPosition position)
    {
        if (position.Line >= parse.Tree.Lines.Length) return null;
        if (parse.Tree.Lines[position.Line].Statement is not { } s) return null;
        foreach (var arg in s.Args)
        {
            if (arg.Spec.Kind == ArgKind.Tag && arg.Range.Contains(position)) return (string)arg.Value;
        }

        return null;
    }
}
