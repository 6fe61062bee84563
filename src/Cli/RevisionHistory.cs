using MotorLang.Analysis.Plant;
using MotorLang.Analysis.Reports;

namespace MotorLang.Cli;

/// <summary>
/// The revisions of one motor-list file from git, newest first, for the report's revision log: the
/// work tree first when it differs from the last commit, then the commits that changed the file
/// (following renames). A file outside a repository has no history (an empty list), which the report says.
/// </summary>
public static class RevisionHistory
{
    private const char Field = '\u001f';

    public static (IReadOnlyList<RevisionSource> Shown, RevisionSource? Before) Of(string path, string workTreeText, int count)
    {
        if (count <= 0 || !File.Exists(path)) return ([], null);
        var folder = Path.GetDirectoryName(Path.GetFullPath(path))!;
        var name = Path.GetFileName(path);
        // --name-only gives the file's path at each commit (from the repository's root), which
        // 'git show' needs where the file was renamed.
        var log = Git.TryRun(folder, "log", "--follow", "--no-color", $"--format=%x1e%H{Field}%as{Field}%an{Field}%s", "--name-only",
            "-n", (count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), "--", name);
        if (log is null) return ([], null);
        var root = Git.TryRun(folder, "rev-parse", "--show-toplevel")?.Trim();
        if (root is null) return ([], null);

        var commits = new List<RevisionSource>();
        foreach (var record in log.Split('\u001e', StringSplitOptions.RemoveEmptyEntries))
        {
            var lines = record.Split('\n', StringSplitOptions.RemoveEmptyEntries);
            var fields = lines[0].Split(Field);
            if (fields.Length < 4 || lines.Length < 2) continue;
            // 'git show' of a path relative to the repository root, run from the root.
            var text = Git.TryRun(root, "show", $"{fields[0]}:{lines[^1].Trim()}");
            if (text is null) continue;
            commits.Add(new RevisionSource(fields[0][..Math.Min(10, fields[0].Length)], fields[1], fields[2], fields[3], text));
        }

        if (commits.Count > 0 && Normal(commits[0].Text) != Normal(workTreeText))
            commits.Insert(0, new RevisionSource(null, DateOnly.FromDateTime(DateTime.UtcNow).ToString("yyyy-MM-dd"), "", "not committed", workTreeText));
        var shown = commits.Take(count).ToList();
        return (shown, commits.Count > count ? commits[count] : null);
    }

    /// <summary>
    /// The revisions of a plant, newest first: the work tree first when any of its files differs from
    /// the last commit, then the commits that changed a motor list under the plant's folder, each
    /// plant unpacked at its commit and delimited there by the same rules as in the work tree. A
    /// renamed plant folder is not followed: its history starts where it got its name.
    /// </summary>
    public static (IReadOnlyList<PlantRevisionSource> Shown, PlantAnalysis? Before) OfPlant(Files.PlantFolder plant, PlantAnalysis current, int count)
    {
        if (count <= 0) return ([], null);
        var root = Path.GetFullPath(plant.Root);
        // '*.motors' as a pathspec matches across folders, so every list under the plant's folder counts.
        var log = Git.TryRun(root, "log", "--no-color", $"--format=%x1e%H{Field}%as{Field}%an{Field}%s",
            "-n", (count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), "--", "*" + SourceFiles.Extension);
        var top = Git.TryRun(root, "rev-parse", "--show-toplevel")?.Trim();
        if (log is null || top is null) return ([], null);

        using var sides = new PlantDiffInputs(root);
        var commits = new List<PlantRevisionSource>();
        foreach (var record in log.Split('\u001e', StringSplitOptions.RemoveEmptyEntries))
        {
            var fields = record.Trim('\n').Split(Field);
            if (fields.Length < 4) continue;
            var folder = sides.OldRoot(fields[0], root, top);
            commits.Add(new PlantRevisionSource(fields[0][..Math.Min(10, fields[0].Length)], fields[1], fields[2], fields[3], PlantDiffInputs.Analyze(folder).Analysis));
        }

        if (commits.Count > 0 && !SameFiles(commits[0].Plant, current))
            commits.Insert(0, new PlantRevisionSource(null, DateOnly.FromDateTime(DateTime.UtcNow).ToString("yyyy-MM-dd"), "", "not committed", current));
        return (commits.Take(count).ToList(), commits.Count > count ? commits[count].Plant : null);
    }

    private static bool SameFiles(PlantAnalysis a, PlantAnalysis b) =>
        a.Files.Count == b.Files.Count
        && a.Files.OrderBy(f => f.Name, StringComparer.Ordinal).Zip(b.Files.OrderBy(f => f.Name, StringComparer.Ordinal))
            .All(p => p.First.Name == p.Second.Name && Normal(p.First.Text) == Normal(p.Second.Text));

    // git may hand back the text with other line endings (autocrlf); those are not a change.
    private static string Normal(string text) => text.Replace("\r\n", "\n").TrimStart('\uFEFF');
}
