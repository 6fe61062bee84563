namespace MotorLang.Files;

/// <summary>A motor list of a plant: where it is, its name in the plant (relative to the plant's folder, with '/'), its text.</summary>
public sealed record PlantMember(string Path, string Name, string Text);

/// <summary>
/// The files of a plant, read: the plant file first, then every other in ordinal order of name;
/// and what was passed over under the plant's folder, with the reason.
/// </summary>
public sealed record PlantFolder(string Root, IReadOnlyList<PlantMember> Members, IReadOnlyList<Skipped> LeftOut)
{
    /// <summary>A path under the plant's folder as the plant names it: relative to the folder, with '/'.</summary>
    public string NameOf(string path) => Path.GetRelativePath(Root, path).Replace(Path.DirectorySeparatorChar, '/');
}

/// <summary>
/// How a plant is delimited on disk (docs/format.md, Plants): a plant is the folder holding a plant
/// file, with every motor list in it and in the folders below, except those below a folder that
/// holds a plant file of its own. Which file is a plant file is the caller's test on the text
/// (this project knows nothing of motor lists beyond their extension). Deterministic (ordinal
/// order everywhere), and nothing outside the plant's folder is ever part of it: the folder search
/// stays inside (a symlink whose real path leaves it is left out, with the reason), and files are
/// read by <see cref="SafeReader"/>'s bounded rules.
/// </summary>
public static class PlantFolders
{
    public const string LeavesFolder = "a symlink leading out of the plant's folder";

    /// <summary>
    /// The plant <paramref name="file"/> belongs to, or null when it belongs to none. The file's
    /// own folder is looked at first, then each folder above it, up to and including the first
    /// that holds a `.git` entry (a repository's top) or the file system's root. Only the motor
    /// lists directly in each of those folders are read, to find a plant file. The answer depends
    /// on the tree alone (not on the current folder), so the editor and the command line agree.
    /// </summary>
    public static PlantFolder? ForFile(string file, string extension, Func<string, bool> isPlantFile) =>
        ForFile(file, extension, new DiskSource(isPlantFile));

    /// <summary>The same, with texts and the plant-file test taken from <paramref name="source"/> (the server's open buffers over the disk).</summary>
    public static PlantFolder? ForFile(string file, string extension, IListSource source, CancellationToken ct = default) =>
        RootFor(file, extension, source) is { } root ? Load(root, extension, source, ct) : null;

    /// <summary>
    /// The folder of the plant <paramref name="file"/> would belong to by the upward search of
    /// <see cref="ForFile(string, string, Func{string, bool})"/>, without reading the plant; null when none.
    /// </summary>
    public static string? RootFor(string file, string extension, IListSource source)
    {
        for (var dir = Path.GetDirectoryName(Path.GetFullPath(file)); dir is not null; dir = Path.GetDirectoryName(dir))
        {
            if (PlantFileIn(dir, extension, source) is not null) return dir;
            if (Path.Exists(Path.Combine(dir, ".git"))) break;
        }

        return null;
    }

    /// <summary>The first plant file (in ordinal order) directly in <paramref name="folder"/>, or null.</summary>
    public static string? PlantFileIn(string folder, string extension, Func<string, bool> isPlantFile) =>
        PlantFileIn(folder, extension, new DiskSource(isPlantFile));

    /// <summary>The first plant file (in ordinal order) directly in <paramref name="folder"/> by <paramref name="source"/>'s test, or null.</summary>
    public static string? PlantFileIn(string folder, string extension, IListSource source)
    {
        string[] entries;
        try
        {
            entries = Directory.GetFiles(folder, "*" + extension);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or System.Security.SecurityException)
        {
            return null;
        }

        Array.Sort(entries, StringComparer.Ordinal);
        foreach (var entry in entries)
        {
            if (!entry.EndsWith(extension, StringComparison.Ordinal) || FileSearch.Status(entry) is not { Kind: FileKind.Regular }) continue;
            if (source.IsPlantFile(entry)) return entry;
        }

        return null;
    }

    /// <summary>Reads the plant whose folder is <paramref name="root"/> (a folder holding a plant file).</summary>
    public static PlantFolder Load(string root, string extension, Func<string, bool> isPlantFile, CancellationToken ct = default) =>
        Load(root, extension, new DiskSource(isPlantFile), ct);

    /// <summary>The same, with texts and the plant-file test taken from <paramref name="source"/>.</summary>
    public static PlantFolder Load(string root, string extension, IListSource source, CancellationToken ct = default)
    {
        var marker = PlantFileIn(root, extension, source);
        var found = FileSearch.Find(root, extension, stayInside: true, LeavesFolder, ct);
        var leftOut = new List<Skipped>(found.Skipped);
        var nested = new Dictionary<string, bool>(StringComparer.Ordinal);
        var members = new List<PlantMember>();
        var rootFull = Path.TrimEndingDirectorySeparator(Path.GetFullPath(root));
        foreach (var path in found.Files)
        {
            if (BelowNestedPlant(path, rootFull, extension, source, nested)) continue;
            var name = Path.GetRelativePath(rootFull, Path.GetFullPath(path)).Replace(Path.DirectorySeparatorChar, '/');
            try
            {
                members.Add(new PlantMember(path, name, source.Read(path)));
            }
            catch (FileRefusedException e)
            {
                leftOut.Add(new Skipped(path, e.Message));
            }
        }

        // The plant file first: its project block must come before every feeder that uses it.
        var first = marker is null ? -1 : members.FindIndex(m => string.Equals(Path.GetFullPath(m.Path), Path.GetFullPath(marker), StringComparison.Ordinal));
        if (first > 0)
        {
            var m = members[first];
            members.RemoveAt(first);
            members.Insert(0, m);
        }

        return new PlantFolder(root, members, leftOut);
    }

    private static bool BelowNestedPlant(string path, string root, string extension, IListSource source, Dictionary<string, bool> cache)
    {
        for (var dir = Path.GetDirectoryName(Path.GetFullPath(path)); dir is not null && !string.Equals(dir, root, StringComparison.Ordinal) && Inside(dir, root);
             dir = Path.GetDirectoryName(dir))
        {
            if (!cache.TryGetValue(dir, out var isPlant)) cache[dir] = isPlant = PlantFileIn(dir, extension, source) is not null;
            if (isPlant) return true;
        }

        return false;
    }

    private static bool Inside(string path, string root) =>
        path == root || path.StartsWith(root.EndsWith(Path.DirectorySeparatorChar) ? root : root + Path.DirectorySeparatorChar, StringComparison.Ordinal);
}
