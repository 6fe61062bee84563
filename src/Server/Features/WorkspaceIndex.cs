using MotorLang.Analysis.Editing;
using MotorLang.Files;
using MotorLang.Parser;
using MotorLang.Server.Documents;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>Workspace symbols: every feeder, motor and load in the open documents and in the workspace's *.motors files.</summary>
public sealed class WorkspaceIndex(DocumentStore store)
{
    private string? _root;

    public void SetRoot(string? rootUri) => _root = rootUri is not null && Uri.TryCreate(rootUri, UriKind.Absolute, out var u) && u.IsFile ? u.LocalPath : null;

    public IEnumerable<SymbolInformation> Search(string query, CancellationToken ct)
    {
        var open = store.All.ToDictionary(d => d.Uri, d => d.Parse);
        foreach (var (uri, parse) in open.Concat(WorkspaceFiles(open.Keys, ct)))
        {
            ct.ThrowIfCancellationRequested();
            foreach (var symbol in Flatten(uri, Outline.Of(parse), null))
            {
                if (query.Length == 0 || symbol.Name.Contains(query, StringComparison.OrdinalIgnoreCase)) yield return symbol;
            }
        }
    }

    /// <summary>
    /// The workspace's lists, read by the same rules as the command line (MotorLang.Files): regular
    /// files only, at most 64 MB each, each real file once; symlinks leading out of the root are
    /// skipped, and anything that cannot be read is passed over rather than failing the request.
    /// </summary>
    private IEnumerable<KeyValuePair<string, ParseResult>> WorkspaceFiles(IEnumerable<string> open, CancellationToken ct)
    {
        if (_root is null || !Directory.Exists(_root)) yield break;
        var skip = open.ToHashSet(StringComparer.Ordinal);
        foreach (var file in FileSearch.Find(_root, ".motors", stayInside: true, ct).Files)
        {
            ct.ThrowIfCancellationRequested();
            var uri = new Uri(file).AbsoluteUri;
            if (skip.Contains(uri)) continue;
            string text;
            try
            {
                text = SafeReader.ReadText(file);
            }
            catch (FileRefusedException)
            {
                continue;
            }

            yield return new(uri, DocumentParser.Parse(text));
        }
    }

    public static IEnumerable<SymbolInformation> Flatten(string uri, IReadOnlyList<OutlineNode> nodes, string? container)
    {
        foreach (var n in nodes)
        {
            yield return new SymbolInformation(n.Name, SymbolKinds.Of(n.Kind), new Location(uri, Convert.ToLsp(n.SelectionRange)), container);
            foreach (var child in Flatten(uri, n.Children, n.Name)) yield return child;
        }
    }
}

public static class SymbolKinds
{
    // LSP SymbolKind: Module = 2, Class = 5, Object = 19, Field = 8.
    public static int Of(OutlineKind kind) => kind switch
    {
        OutlineKind.Project => 2,
        OutlineKind.Feeder => 5,
        OutlineKind.Motor => 19,
        _ => 8,
    };
}
