using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>
/// The open documents. Mutations (open, change, close) are applied in the order they arrive:
/// the protocol handlers call these methods synchronously, before their first await, and
/// StreamJsonRpc starts handlers in arrival order; the lock keeps each one whole. Readers take
/// the current immutable snapshot and never see a half-applied change.
/// </summary>
public sealed class DocumentStore
{
    private readonly object _gate = new();
    private readonly Dictionary<string, DocumentSnapshot> _documents = new(StringComparer.Ordinal);

    public DocumentSnapshot Open(string uri, int version, string text)
    {
        lock (_gate) return _documents[uri] = new DocumentSnapshot(uri, version, text);
    }

    /// <summary>Applies a change; returns null when the document is not open.</summary>
    public DocumentSnapshot? Change(string uri, int version, IEnumerable<TextDocumentContentChangeEvent> changes)
    {
        lock (_gate)
        {
            if (!_documents.TryGetValue(uri, out var current)) return null;
            return _documents[uri] = current.WithChanges(version, changes.ToArray());
        }
    }

    public bool Close(string uri)
    {
        lock (_gate) return _documents.Remove(uri);
    }

    public DocumentSnapshot? Get(string uri)
    {
        lock (_gate) return _documents.GetValueOrDefault(uri);
    }

    public IReadOnlyList<DocumentSnapshot> All
    {
        get
        {
            lock (_gate) return [.. _documents.Values];
        }
    }
}
