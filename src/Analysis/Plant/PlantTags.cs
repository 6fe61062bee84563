using MotorLang.Analysis.Editing;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Plant;

/// <summary>A range in one file of a plant.</summary>
public sealed record PlantRange(string File, SourceRange Range);

/// <summary>Every place a tag is written in a plant: its definition and the 'from'/'like' references, each in its own file.</summary>
public sealed record PlantTagOccurrences(string Tag, PlantRange? Definition, IReadOnlyList<PlantRange> References)
{
    public IEnumerable<PlantRange> All => (Definition is { } d ? [d] : Array.Empty<PlantRange>()).Concat(References);
}

/// <summary>
/// Go to definition, find references and rename for tags across the files of a plant: <see cref="Tags"/>
/// over the joined model, each range given back to its file.
/// </summary>
public static class PlantTags
{
    /// <summary>The tag under the cursor in <paramref name="file"/>, with all its occurrences in the plant; null elsewhere or in a file left out of the join.</summary>
    public static PlantTagOccurrences? At(PlantAnalysis plant, string file, TextPosition position)
    {
        if (Joined(plant, file, position) is not { } at) return null;
        return Tags.At(plant.Joined!.Parse, at) is { } found ? Map(plant, found) : null;
    }

    /// <summary>The range of the tag under the cursor in its own file, or null.</summary>
    public static SourceRange? RangeAt(PlantAnalysis plant, string file, TextPosition position)
    {
        if (Joined(plant, file, position) is not { } at || Tags.At(plant.Joined!.Parse, at) is not { } found) return null;
        return found.All.Where(r => r.Contains(at)).Select(r => (SourceRange?)plant.ToFile(r).Range).FirstOrDefault();
    }

    /// <summary>Edits in every file that renames a tag everywhere in the plant, or the reason it cannot be renamed to that name.</summary>
    public static (IReadOnlyList<PlantEdit>? Edits, string? Error) Rename(PlantAnalysis plant, string file, TextPosition position, string newName)
    {
        if (Joined(plant, file, position) is not { } at || Tags.At(plant.Joined!.Parse, at) is not { } found)
            return (null, "there is no tag here to rename");
        if (!Keywords.IsValidTag(newName)) return (null, $"'{newName}' is not a valid tag");
        if (plant.Joined.Parse.Model.Find(newName) is { } clash && !string.Equals(newName, found.Tag, StringComparison.OrdinalIgnoreCase))
        {
            var (clashFile, line) = plant.FileOfLine(clash.Header.Line.Index);
            return (null, $"tag '{newName}' is already used on line {line + 1} of {clashFile}");
        }

        return ([.. found.All.Select(r => plant.ToFile(r)).Select(p => new PlantEdit(p.File, new TextEdit(p.Range, newName)))], null);
    }

    private static TextPosition? Joined(PlantAnalysis plant, string file, TextPosition position)
    {
        if (plant.Joined is null || plant.Apart.Contains(file) || !plant.Files.Any(f => f.Name == file)) return null;
        return plant.ToJoined(file, new SourceRange(position, position)).Start;
    }

    private static PlantTagOccurrences Map(PlantAnalysis plant, TagOccurrences found)
    {
        PlantRange ToFile(SourceRange r)
        {
            var (f, range) = plant.ToFile(r);
            return new PlantRange(f, range);
        }

        return new PlantTagOccurrences(found.Tag, found.Definition is { } d ? ToFile(d) : null, [.. found.References.Select(ToFile)]);
    }
}
