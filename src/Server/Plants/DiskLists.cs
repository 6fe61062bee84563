using MotorLang.Files;

namespace MotorLang.Server.Plants;

/// <summary>
/// Closed motor lists as the server reads them from disk: by <see cref="SafeReader"/>'s rules
/// (regular files only, bounded, strict UTF-8), remembered while the file's size and write time stay
/// the same, so that re-analysing a plant after each edit does not read every closed file again.
/// The plant-file test is remembered with the text, since it parses it.
/// </summary>
internal sealed class DiskLists(Func<string, bool> isPlantFile)
{
    private readonly object _gate = new();
    private readonly Dictionary<string, Entry> _entries = new(StringComparer.Ordinal);

    private sealed record Entry(long Length, DateTime Written, string? Text, string? Refused, Lazy<bool> IsPlant);

    public string Read(string path)
    {
        var e = Get(path);
        return e.Text ?? throw new FileRefusedException(e.Refused!);
    }

    public bool IsPlantFile(string path)
    {
        try
        {
            return Get(path).IsPlant.Value;
        }
        catch (FileRefusedException)
        {
            return false;
        }
    }

    /// <summary>Forgets everything (a watched-file notification: something changed on disk).</summary>
    public void Forget()
    {
        lock (_gate) _entries.Clear();
    }

    private Entry Get(string path)
    {
        var info = new FileInfo(path);
        long length;
        DateTime written;
        try
        {
            info.Refresh();
            length = info.Exists ? info.Length : -1;
            written = info.Exists ? info.LastWriteTimeUtc : default;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            length = -1;
            written = default;
        }

        lock (_gate)
        {
            if (_entries.TryGetValue(path, out var known) && known.Length == length && known.Written == written && length >= 0) return known;
        }

        Entry entry;
        try
        {
            var text = SafeReader.ReadText(path);
            entry = new Entry(length, written, text, null, new Lazy<bool>(() => isPlantFile(text)));
        }
        catch (FileRefusedException e)
        {
            entry = new Entry(length, written, null, e.Message, new Lazy<bool>(false));
        }

        lock (_gate) _entries[path] = entry;
        return entry;
    }
}
