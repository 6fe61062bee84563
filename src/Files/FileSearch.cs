namespace MotorLang.Files;

/// <summary>An entry a search passed over, and why.</summary>
public sealed record Skipped(string Path, string Reason);

/// <summary>What a search found (each real file once, in ordinal order of path) and what it skipped.</summary>
public sealed record SearchResult(IReadOnlyList<string> Files, IReadOnlyList<Skipped> Skipped);

/// <summary>
/// Finds motor lists below a folder. Deterministic (entries in ordinal order), each real file and
/// folder visited once (by device and inode, so a symlink loop ends), only regular files returned
/// (FIFOs, devices and sockets are skipped with a reason), unreadable folders skipped, never throws.
/// With <c>stayInside</c>, files and folders whose real path leaves the root are skipped.
/// </summary>
public static class FileSearch
{
    public static SearchResult Find(string root, string extension, bool stayInside, CancellationToken ct = default) =>
        Find(root, extension, stayInside, "a symlink leading out of the workspace", ct);

    /// <summary>The same, naming what a symlink leaving the root leaves (the workspace, a plant's folder).</summary>
    public static SearchResult Find(string root, string extension, bool stayInside, string outsideReason, CancellationToken ct = default)
    {
        var files = new List<(string Path, (ulong, ulong) Id)>();
        var skipped = new List<Skipped>();
        var realRoot = RealPath(root);
        var seenDirs = new HashSet<(ulong, ulong)>();
        var pending = new Stack<string>();
        if (Status(root) is { Kind: FileKind.Directory } rs)
        {
            seenDirs.Add(rs.Identity);
            pending.Push(root);
        }

        while (pending.Count > 0)
        {
            ct.ThrowIfCancellationRequested();
            var dir = pending.Pop();
            string[] entries;
            try
            {
                entries = Directory.GetFileSystemEntries(dir);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException or System.Security.SecurityException)
            {
                skipped.Add(new Skipped(dir, $"folder not readable: {e.Message}"));
                continue;
            }

            Array.Sort(entries, StringComparer.Ordinal);
            var subdirs = new List<string>();
            foreach (var entry in entries)
            {
                ct.ThrowIfCancellationRequested();
                var isList = entry.EndsWith(extension, StringComparison.Ordinal);
                var status = Status(entry);
                if (status is null)
                {
                    if (isList) skipped.Add(new Skipped(entry, "cannot be read (a dangling symlink, a loop, or no permission)"));
                    continue;
                }

                var s = status.Value;
                if (s.Kind != FileKind.Directory && !isList) continue;
                if (stayInside && realRoot is not null && !Inside(RealPath(entry), realRoot))
                {
                    skipped.Add(new Skipped(entry, outsideReason));
                    continue;
                }

                if (s.Kind == FileKind.Directory)
                {
                    if (seenDirs.Add(s.Identity)) subdirs.Add(entry);
                }
                else if (s.Kind == FileKind.Regular) files.Add((entry, s.Identity));
                else skipped.Add(new Skipped(entry, $"{FileKinds.Describe(s.Kind)}, not a regular file"));
            }

            // Pushed in reverse so folders are walked in ordinal order, depth first: the same walk every time.
            for (var i = subdirs.Count - 1; i >= 0; i--) pending.Push(subdirs[i]);
        }

        var seenFiles = new HashSet<(ulong, ulong)>();
        var result = files.OrderBy(f => f.Path, StringComparer.Ordinal).Where(f => seenFiles.Add(f.Id)).Select(f => f.Path).ToList();
        return new SearchResult(result, skipped);
    }

    /// <summary>Type and identity of a path after following symlinks, or null if it cannot be read.</summary>
    public static FileStatus? Status(string path)
    {
        if (!OperatingSystem.IsWindows()) return Unix.Stat(path, followLinks: true, out _);
        try
        {
            var info = new FileInfo(path);
            if (!info.Exists && !Directory.Exists(path)) return null;
            var isDir = (File.GetAttributes(path) & FileAttributes.Directory) != 0;
            // Windows has no inode through this API; the full path stands in for the identity.
            var id = (ulong)StringComparer.OrdinalIgnoreCase.GetHashCode(Path.GetFullPath(path));
            return new FileStatus(isDir ? FileKind.Directory : FileKind.Regular, 0x1B6, 1, 0, 0, isDir ? 0 : info.Length, (0, id));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    /// <summary>The path with every symlink resolved, or null.</summary>
    public static string? RealPath(string path)
    {
        if (!OperatingSystem.IsWindows()) return Unix.RealPath(path);
        try
        {
            var full = Path.GetFullPath(path);
            return new FileInfo(full).ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? full;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    private static bool Inside(string? path, string root) =>
        path is not null && (path == root || path.StartsWith(root.EndsWith(Path.DirectorySeparatorChar) ? root : root + Path.DirectorySeparatorChar, StringComparison.Ordinal));
}
