using MotorLang.Analysis.Plant;
using MotorLang.Files;
using MotorLang.Server.Documents;

namespace MotorLang.Server.Plants;

/// <summary>One file of a plant in the editor: its name in the plant, its URI, and the open version read (null when read from disk).</summary>
internal sealed record PlantDocument(string Name, string Path, string Uri, DocumentSnapshot? Open);

/// <summary>A plant as the editor sees it: its folder, its files and their analysis together.</summary>
internal sealed record PlantView(string Root, PlantAnalysis Analysis, IReadOnlyList<PlantDocument> Files)
{
    public PlantDocument? FileOfUri(string uri) => Files.FirstOrDefault(f => f.Uri == uri);

    public PlantDocument? FileNamed(string name) => Files.FirstOrDefault(f => f.Name == name);
}

/// <summary>
/// Finds and analyses the plant an open document belongs to, by the command line's rules
/// (src/Files PlantFolders: the same upward search, the same walk, the same reader) with the open
/// buffers in place of their files, and the plant layer of Analysis (PlantAnalyzer) over the texts
/// it supplies. A plant whose texts are all the very same strings as last time is not analysed
/// again, so several requests and publications after one edit share one analysis.
/// </summary>
internal sealed class PlantService(DocumentStore store)
{
    public const string Extension = ".motors";
    private readonly DiskLists _disk = new(PlantMarker.IsPlantFile);
    private readonly object _gate = new();
    private readonly Dictionary<string, (object[] Key, PlantView View)> _cache = new(StringComparer.Ordinal);

    /// <summary>The plant <paramref name="snapshot"/>'s file belongs to, analysed; null when it belongs to none (or is not a file).</summary>
    public PlantView? Of(DocumentSnapshot snapshot, CancellationToken ct = default)
    {
        if (PathOf(snapshot.Uri) is not { } path) return null;
        var open = new Dictionary<string, DocumentSnapshot>(StringComparer.Ordinal);
        foreach (var d in store.All)
        {
            if (PathOf(d.Uri) is { } p) open[p] = d;
        }

        // The snapshot asked about stands for its file even if the store has moved on: a request answers for the version it read.
        open[path] = snapshot;
        var source = new OpenListSource(open, _disk);
        if (PlantFolders.RootFor(path, Extension, source) is not { } root) return null;
        var folder = PlantFolders.Load(root, Extension, source, ct);
        if (!folder.Members.Any(m => Path.GetFullPath(m.Path) == path)) return null;
        ct.ThrowIfCancellationRequested();

        var files = folder.Members.Select(m =>
        {
            var full = Path.GetFullPath(m.Path);
            var snap = source.Used.GetValueOrDefault(full);
            return new PlantDocument(m.Name, full, snap?.Uri ?? new Uri(full).AbsoluteUri, snap);
        }).ToList();
        var key = folder.Members.SelectMany(m => new object[] { m.Name, m.Text })
            .Concat(folder.LeftOut.SelectMany(s => new object[] { s.Path, s.Reason })).ToArray();
        (object[] Key, PlantView View) known;
        lock (_gate)
        {
            if (_cache.TryGetValue(root, out known) && SameKey(known.Key, key))
                return known.View with { Files = files };
        }

        // One file's text changed (the usual case: a keystroke in an open file): update the previous
        // analysis from that file's edited line when the edit allows it, as for a single document.
        var analysis = (known.Key is not null && OneTextChanged(known.Key, key, folder.Members.Count) is { } changed
                ? PlantAnalyzer.Update(known.View.Analysis, changed.Name, changed.Text)
                : null)
            ?? PlantAnalyzer.Analyze(folder.Members.Select(m => new PlantFile(m.Name, m.Text)).ToList(),
                folder.LeftOut.Select(s => new PlantLeftOut(folder.NameOf(s.Path), s.Reason)).ToList());
        var view = new PlantView(root, analysis, files);
        lock (_gate) _cache[root] = (key, view);
        return view;
    }

    /// <summary>Something changed on disk: read closed files again.</summary>
    public void DiskChanged() => _disk.Forget();

    /// <summary>The local path of a file: URI, or null for any other scheme.</summary>
    public static string? PathOf(string uri) =>
        Uri.TryCreate(uri, UriKind.Absolute, out var u) && u.IsFile ? Path.GetFullPath(u.LocalPath) : null;

    /// <summary>The file whose text alone differs between two keys of the same files and left-out entries, or null.</summary>
    private static (string Name, string Text)? OneTextChanged(object[] before, object[] now, int members)
    {
        if (before.Length != now.Length) return null;
        (string, string)? changed = null;
        for (var i = 0; i < now.Length; i++)
        {
            if (ReferenceEquals(before[i], now[i]) || Equals(before[i], now[i])) continue;
            // Only a member's text (odd places among the members' name, text pairs) may differ, and only one.
            if (changed is not null || i >= 2 * members || i % 2 == 0) return null;
            changed = ((string)now[i - 1], (string)now[i]);
        }

        return changed;
    }

    /// <summary>The same names and texts (the same string object, usually; equal text read again costs one comparison).</summary>
    private static bool SameKey(object[] a, object[] b)
    {
        if (a.Length != b.Length) return false;
        for (var i = 0; i < a.Length; i++)
        {
            if (!ReferenceEquals(a[i], b[i]) && !Equals(a[i], b[i])) return false;
        }

        return true;
    }
}

/// <summary>An open document as a file of its plant: the plant, and the document's name in it.</summary>
internal sealed record PlantContext(PlantView View, string Name)
{
    public string UriOf(string file) => View.FileNamed(file)?.Uri ?? throw new ArgumentException($"'{file}' is not a file of this plant", nameof(file));

    public Protocol.Location Location(MotorLang.Analysis.Plant.PlantRange r) => new(UriOf(r.File), Features.Convert.ToLsp(r.Range));
}
