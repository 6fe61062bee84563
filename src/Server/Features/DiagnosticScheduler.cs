using System.Collections.Concurrent;
using MotorLang.Server.Documents;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>
/// Publishes diagnostics after each change, once typing pauses for the debounce interval. A newer
/// change cancels the pending run for the same document, so a stale analysis is never published.
/// "Newer" is the order in which changes arrived, not the client's version number: a client may
/// send version 3 after version 5, the store then holds version 3's text, and its diagnostics are
/// the ones that must be shown.
/// <para>
/// A run analyses the document on its own or the plant it belongs to (<paramref name="analyse"/>);
/// a plant's run publishes every file of the plant, open or not, each unless a later run has
/// already published that file. The scheduler remembers which files it published for which plant:
/// a file that leaves a plant is cleared (or, when open, analysed again), and when a document
/// leaves a plant the plant's other open files are analysed again, or its files cleared when none
/// is open.
/// </para>
/// </summary>
public sealed class DiagnosticScheduler(Func<PublishDiagnosticsParams, Task> publish, TimeSpan debounce, Action<string> log,
    Func<DocumentSnapshot, CancellationToken, DiagnosticBatch> analyse, Func<string, bool> reanalyseIfOpen)
{
    private readonly ConcurrentDictionary<string, CancellationTokenSource> _pending = new(StringComparer.Ordinal);
    private readonly Dictionary<string, long> _published = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _plantOf = new(StringComparer.Ordinal);
    private readonly Dictionary<string, HashSet<string>> _plantFiles = new(StringComparer.Ordinal);
    private readonly Dictionary<string, (int? Version, Diagnostic[] Diagnostics)> _sent = new(StringComparer.Ordinal);
    private long _sequence;
    private readonly SemaphoreSlim _publishing = new(1, 1);

    public void Schedule(DocumentSnapshot snapshot)
    {
        var cts = new CancellationTokenSource();
        CancellationTokenSource? previous = null;
        _pending.AddOrUpdate(snapshot.Uri, cts, (_, old) =>
        {
            previous = old;
            return cts;
        });
        previous?.Cancel();
        // Called synchronously by the document notifications, so this number follows arrival order.
        _ = RunAsync(snapshot, Interlocked.Increment(ref _sequence), cts);
    }

    /// <summary>
    /// A document was closed: cancels its pending work; a document of a plant has the plant analysed
    /// again through another open file (its own diagnostics then come from disk), or, with none
    /// open, every file of the plant cleared; any other document's diagnostics are cleared.
    /// </summary>
    public async Task ClosedAsync(string uri)
    {
        if (_pending.TryRemove(uri, out var cts)) await cts.CancelAsync();
        var sequence = Interlocked.Increment(ref _sequence);
        await _publishing.WaitAsync();
        try
        {
            if (_plantOf.TryGetValue(uri, out var root) && _plantFiles.TryGetValue(root, out var files))
            {
                if (!files.Where(f => f != uri).ToList().Any(reanalyseIfOpen)) await ClearPlantAsync(root, sequence);
                return;
            }

            _published[uri] = sequence;
            await SendAsync(uri, null, []);
        }
        finally
        {
            _publishing.Release();
        }
    }

    /// <summary>Cancels pending work and clears the document's diagnostics.</summary>
    public async Task ClearAsync(string uri)
    {
        if (_pending.TryRemove(uri, out var cts)) await cts.CancelAsync();
        var sequence = Interlocked.Increment(ref _sequence);
        await _publishing.WaitAsync();
        try
        {
            _published[uri] = sequence;
            await SendAsync(uri, null, []);
        }
        finally
        {
            _publishing.Release();
        }
    }

    private async Task RunAsync(DocumentSnapshot snapshot, long sequence, CancellationTokenSource cts)
    {
        var ct = cts.Token;
        try
        {
            if (debounce > TimeSpan.Zero) await Task.Delay(debounce, ct);
            var batch = await Task.Run(() => analyse(snapshot, ct), ct);
            if (ct.IsCancellationRequested) return;
            // One publication at a time, and never an earlier change after a later one: an analysis
            // that lost the race to its cancellation must not overwrite fresher diagnostics.
            await _publishing.WaitAsync(CancellationToken.None);
            try
            {
                if (ct.IsCancellationRequested) return;
                await PublishAsync(snapshot.Uri, batch, sequence);
            }
            finally
            {
                _publishing.Release();
            }
        }
        catch (OperationCanceledException)
        {
            // A newer version is on its way.
        }
        catch (Exception e)
        {
            log($"diagnostics for {snapshot.Uri} failed: {e}");
        }
        finally
        {
            // Not disposed: a newer Schedule may still call Cancel on it, and a source without a
            // timer holds nothing that needs disposing.
            _pending.TryRemove(new KeyValuePair<string, CancellationTokenSource>(snapshot.Uri, cts));
        }
    }

    /// <summary>Publishes a run's files (under the publishing lock) and keeps the plants' file sets up to date.</summary>
    private async Task PublishAsync(string uri, DiagnosticBatch batch, long sequence)
    {
        if (batch.Plant is { } root)
        {
            var now = batch.Files.Select(f => f.Uri).ToHashSet(StringComparer.Ordinal);
            foreach (var f in batch.Files)
            {
                if (_published.TryGetValue(f.Uri, out var last) && last > sequence) continue;
                _published[f.Uri] = sequence;
                _plantOf[f.Uri] = root;
                await SendAsync(f.Uri, f.Version, f.Diagnostics);
            }

            if (_plantFiles.TryGetValue(root, out var before))
            {
                foreach (var gone in before.Where(u => !now.Contains(u)).ToList())
                {
                    _plantOf.Remove(gone);
                    if (!reanalyseIfOpen(gone)) await PublishEmptyAsync(gone, sequence);
                }
            }

            _plantFiles[root] = now;
            return;
        }

        foreach (var f in batch.Files)
        {
            if (_published.TryGetValue(f.Uri, out var last) && last > sequence) continue;
            _published[f.Uri] = sequence;
            await SendAsync(f.Uri, f.Version, f.Diagnostics);
        }

        // The document was part of a plant and is not any more: the plant's other files described it.
        if (_plantOf.Remove(uri, out var left) && _plantFiles.TryGetValue(left, out var files))
        {
            files.Remove(uri);
            if (!files.ToList().Any(reanalyseIfOpen)) await ClearPlantAsync(left, sequence);
        }
    }

    private async Task ClearPlantAsync(string root, long sequence)
    {
        if (!_plantFiles.Remove(root, out var files)) return;
        foreach (var f in files)
        {
            _plantOf.Remove(f);
            await PublishEmptyAsync(f, sequence);
        }
    }

    private async Task PublishEmptyAsync(string uri, long sequence)
    {
        if (_published.TryGetValue(uri, out var last) && last > sequence) return;
        _published[uri] = sequence;
        await SendAsync(uri, null, []);
    }

    /// <summary>
    /// Sends a file's diagnostics unless the client already has exactly these for the same version:
    /// an edit in one file of a plant re-publishes the plant, and most of its files (closed, version
    /// null) come out the same; sending them again would cost the server and the client a file's
    /// worth of diagnostics each per keystroke for nothing. Called under the publishing lock.
    /// </summary>
    private async Task SendAsync(string uri, int? version, Diagnostic[] diagnostics)
    {
        if (_sent.TryGetValue(uri, out var was) && was.Version == version && SameDiagnostics(was.Diagnostics, diagnostics)) return;
        _sent[uri] = (version, diagnostics);
        await publish(new PublishDiagnosticsParams(uri, version, diagnostics));
    }

    private static bool SameDiagnostics(Diagnostic[] a, Diagnostic[] b)
    {
        if (a.Length != b.Length) return false;
        for (var i = 0; i < a.Length; i++)
        {
            // Records compare their fields; the related locations are an array, compared item by item.
            if (a[i] with { RelatedInformation = null } != b[i] with { RelatedInformation = null }) return false;
            if (!(a[i].RelatedInformation ?? []).SequenceEqual(b[i].RelatedInformation ?? [])) return false;
        }

        return true;
    }
}
