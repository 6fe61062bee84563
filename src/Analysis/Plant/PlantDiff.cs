using MotorLang.Analysis.Reports;

namespace MotorLang.Analysis.Plant;

/// <summary>One record's change in a plant: the file it is in now (the old file when removed), and the file it was in when it moved.</summary>
public sealed record PlantRecordChange(string File, string? MovedFrom, RecordChange Change);

/// <summary>What changed between two versions of a plant: files added and removed, then every record that changed, by tag.</summary>
public sealed record PlantChanges(IReadOnlyList<string> FilesAdded, IReadOnlyList<string> FilesRemoved, IReadOnlyList<PlantRecordChange> Records)
{
    public int Count => FilesAdded.Count + FilesRemoved.Count + Records.Count;
}

/// <summary>
/// Compares two versions of a plant as <see cref="ListDiff"/> compares two lists, over the plants'
/// joined analyses: a record is matched by tag wherever it is written, so a feeder whose file did not
/// change still shows the sizes that moved because of a motor added in another file, and a record
/// moved from one file to another is said to have moved.
/// </summary>
public static class PlantDiff
{
    public static PlantChanges Compare(PlantAnalysis before, PlantAnalysis after)
    {
        var oldFiles = before.Files.Select(f => f.Name).ToHashSet(StringComparer.Ordinal);
        var newFiles = after.Files.Select(f => f.Name).ToHashSet(StringComparer.Ordinal);
        var added = after.Files.Select(f => f.Name).Where(n => !oldFiles.Contains(n)).ToList();
        var removed = before.Files.Select(f => f.Name).Where(n => !newFiles.Contains(n)).ToList();
        var records = new List<PlantRecordChange>();
        // A side with no file (a plant new at this revision) is an empty list.
        var b = before.Joined ?? Analyzer.Analyze("");
        var a = after.Joined ?? Analyzer.Analyze("");
        {
            var changes = ListDiff.Compare(b, a);
            var changed = changes.Select(c => c.Tag).ToHashSet(StringComparer.OrdinalIgnoreCase);
            foreach (var c in changes)
            {
                var now = FileOf(after, c.Tag);
                var was = FileOf(before, c.Tag);
                records.Add(c.Change == ChangeKind.Removed
                    ? new PlantRecordChange(was ?? "", null, c)
                    : new PlantRecordChange(now ?? "", was is not null && was != now ? was : null, c));
            }

            // A record moved to another file and otherwise unchanged is still worth a line.
            foreach (var node in a.Parse.Model.Feeders.Cast<MotorLang.Parser.Model.CircuitNode>().Concat(a.Parse.Model.Motors).Concat(a.Parse.Model.Loads))
            {
                if (node.Tag is not { } tag || changed.Contains(tag.Value)) continue;
                var now = FileOf(after, tag.Value);
                var was = FileOf(before, tag.Value);
                if (was is not null && now is not null && was != now)
                {
                    changed.Add(tag.Value);
                    records.Add(new PlantRecordChange(now, was, new RecordChange(node.Keyword, tag.Value, ChangeKind.Changed, [], [], [], [])));
                }
            }
        }

        return new PlantChanges(added, removed, records);
    }

    /// <summary>One line per change, each led by its file.</summary>
    public static IEnumerable<string> Describe(PlantChanges changes)
    {
        foreach (var f in changes.FilesAdded) yield return $"+ file {f} added";
        foreach (var f in changes.FilesRemoved) yield return $"- file {f} removed";
        foreach (var r in changes.Records)
            yield return $"{r.File}: {ListDiff.Describe(r.Change)}" + (r.MovedFrom is { } from ? $" (moved from {from})" : "");
    }

    private static string? FileOf(PlantAnalysis plant, string tag) =>
        plant.Joined?.Parse.Model.Find(tag) is { } node ? plant.FileOfLine(node.Header.Line.Index).File : null;
}
