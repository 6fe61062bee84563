using MotorLang.Analysis.Plant;
using MotorLang.Parser.Text;
using MotorLang.Server.Plants;
using MotorLang.Server.Protocol;
using LspRange = MotorLang.Server.Protocol.Range;

namespace MotorLang.Server.Features;

/// <summary>
/// Code actions of a document that belongs to a plant: the quick fixes of the plant's findings in
/// that file (an edit may land in another file, through 'like'), and "size everything" over the
/// whole plant, as `motorlang size` writes it. Each is a WorkspaceEdit naming every file it edits.
/// </summary>
internal static class PlantActions
{
    public static IEnumerable<CodeAction> QuickFixes(PlantView plant, string uri, SourceRange range)
    {
        if (plant.FileOfUri(uri) is not { } file) yield break;
        var uris = plant.Files.ToDictionary(f => f.Name, f => f.Uri, StringComparer.Ordinal);
        foreach (var f in plant.Analysis.Findings.Where(f => f.File == file.Name && f.Finding.Fix is not null && Overlaps(f.Finding.Range, range)))
        {
            var changes = new Dictionary<string, Protocol.TextEdit[]>(StringComparer.Ordinal);
            foreach (var group in f.Finding.Fix!.Edits.Select((e, i) => (Uri: uris.GetValueOrDefault(f.FixFiles[i], uri), Edit: Convert.ToLsp(e))).GroupBy(p => p.Uri))
                changes[group.Key] = group.Select(p => p.Edit).ToArray();
            yield return new CodeAction(f.Finding.Fix.Title, "quickfix",
                [Convert.ToLsp(f.Finding, uri, f.RelatedFiles.Select(n => uris.GetValueOrDefault(n, uri)).ToList())], true, new WorkspaceEdit(changes));
        }
    }

    public static bool HasFixes(PlantView plant) => plant.Analysis.Findings.Any(f => f.Finding.Fix is not null);

    /// <summary>Every file the plant's "size everything" changes, each replaced whole; null when nothing changes.</summary>
    public static WorkspaceEdit? SizeEverything(PlantView plant)
    {
        var before = plant.Analysis.Files;
        var after = PlantSizeAll.Apply(before);
        var changes = new Dictionary<string, Protocol.TextEdit[]>(StringComparer.Ordinal);
        for (var i = 0; i < before.Count; i++)
        {
            if (after[i].Text == before[i].Text || plant.FileNamed(before[i].Name) is not { } doc) continue;
            changes[doc.Uri] = [new Protocol.TextEdit(WholeText(before[i].Text), after[i].Text.TrimStart('\uFEFF'))];
        }

        return changes.Count == 0 ? null : new WorkspaceEdit(changes);
    }

    /// <summary>The range of a whole text (a byte order mark is not counted: editors do not show it).</summary>
    private static LspRange WholeText(string text)
    {
        var lines = text.Split('\n');
        var last = lines[^1];
        var column = lines.Length == 1 && last.StartsWith('\uFEFF') ? last.Length - 1 : last.Length;
        return new LspRange(new Position(0, 0), new Position(lines.Length - 1, column));
    }

    private static bool Overlaps(SourceRange a, SourceRange b) => a.Start.CompareTo(b.End) <= 0 && b.Start.CompareTo(a.End) <= 0;
}
