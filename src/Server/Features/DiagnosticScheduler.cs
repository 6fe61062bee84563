using System.Collections.Concurrent;
using MotorLang.Analysis.Findings;
using MotorLang.Server.Documents;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>
/// Publishes diagnostics after each change, once typing pauses for the debounce interval. A newer
/// change cancels the pending run for the same document, so a stale analysis is never published.
/// "Newer" is the order in which changes arrived, not the client's version number: a client may
/// send version 3 after version 5, the store then holds version 3's text, and its diagnostics are
/// the ones that must be shown.
/// </summary>
public sealed class DiagnosticScheduler(Func<PublishDiagnosticsParams, Task> publish, TimeSpan debounce, Action<string> log)
{
    private readonly ConcurrentDictionary<string, CancellationTokenSource> _pending = new(StringComparer.Ordinal);
    private readonly Dictionary<string, long> _published = new(StringComparer.Ordinal);
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

    /// <summary>Cancels pending work and clears the document's diagnostics (on close).</summary>
    public async Task ClearAsync(string uri)
    {
        if (_pending.TryRemove(uri, out var cts)) await cts.CancelAsync();
        await _publishing.WaitAsync();
        try
        {
            _published.Remove(uri);
            await publish(new PublishDiagnosticsParams(uri, null, []));
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
            var analysis = await Task.Run(() => snapshot.Analysis, ct);
            if (ct.IsCancellationRequested) return;
            var diagnostics = FindingCap.Shown(analysis.Findings).Select(f => Convert.ToLsp(f, snapshot.Uri)).ToArray();
            // One publication at a time, and never an earlier change after a later one: an analysis
            // that lost the race to its cancellation must not overwrite fresher diagnostics.
            await _publishing.WaitAsync(CancellationToken.None);
            try
            {
                if (ct.IsCancellationRequested || (_published.TryGetValue(snapshot.Uri, out var last) && last > sequence)) return;
                _published[snapshot.Uri] = sequence;
                await publish(new PublishDiagnosticsParams(snapshot.Uri, snapshot.Version, diagnostics));
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
}
