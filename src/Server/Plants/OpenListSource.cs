using MotorLang.Files;
using MotorLang.Server.Documents;

namespace MotorLang.Server.Plants;

/// <summary>
/// The texts a plant is read from in the editor: an open document's buffer in place of its file,
/// every other list from disk (<see cref="DiskLists"/>). The open documents are taken once, when
/// the source is made, so one plant analysis reads one consistent state. It records which
/// snapshot of each open document it handed out, for the versions the diagnostics carry.
/// </summary>
internal sealed class OpenListSource(IReadOnlyDictionary<string, DocumentSnapshot> openByPath, DiskLists disk) : IListSource
{
    private readonly Dictionary<string, DocumentSnapshot> _used = new(StringComparer.Ordinal);

    /// <summary>The open documents read, by full path.</summary>
    public IReadOnlyDictionary<string, DocumentSnapshot> Used => _used;

    public string Read(string path)
    {
        if (openByPath.TryGetValue(Path.GetFullPath(path), out var open))
        {
            lock (_used) _used[Path.GetFullPath(path)] = open;
            return open.Text;
        }

        return disk.Read(path);
    }

    /// <summary>An open document's own parse says whether it is a plant file (no text is joined for it).</summary>
    public bool IsPlantFile(string path) =>
        openByPath.TryGetValue(Path.GetFullPath(path), out var open) ? open.Parse.Model.Project?.Plant is not null : disk.IsPlantFile(path);
}
