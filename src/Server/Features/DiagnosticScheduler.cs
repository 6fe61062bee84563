using System.Collections.Concurrent;
using MotorLang.Server.Documents;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>
/// Publishes diagnostics after each change, once typing pauses for the debounce interval. A newer
/// change cancels the pending run for the same document, so a stale analysis is never published.
/// </summary>
public sealed class DiagnosticScheduler(Func<PublishDiagnosticsParams, Task> publish, TimeSpan debounce, Action<string> log)
{
    private readonly ConcurrentDictionary<string, CancellationTokenSource> _pending = new(StringComparer.Ordinal);

    public void Schedule(DocumentSnapshot snapshot)
    {
        var cts = new CancellationTokenSource();
        var previous = _pending.AddOrUpdate(snapshot.Uri, cts, (_, _) => cts);
        if (previous != cts) previous.Cancel();
        _ = RunAsync(snapshot, cts);
    }

    /// <summary>Cancels pending work and clears the document's diagnostics (on close).</summary>
    public async Task ClearAsync(string uri)
    {
        if (_pending.TryRemove(uri, out var cts)) await cts.CancelAsync();
        await publish(new PublishDiagnosticsParams(uri, null, []));
    }

    private async Task RunAsync(DocumentSnapshot snapshot, CancellationTokenSource cts)
    {
        var ct = cts.Token;
        try
        {
            if (debounce > TimeSpan.Zero) await Task.Delay(debounce, ct);
            var analysis = await Task.Run(() => snapshot.Analysis, ct);
            if (ct.IsCancellationRequested) return;
            var diagnostics = analysis.Findings.Select(f => Convert.ToLsp(f, snapshot.Uri)).ToArray();
            await publish(new PublishDiagnosticsParams(snapshot.Uri, snapshot.Version, diagnostics));
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
            _pending.TryRemove(new KeyValuePair<string, CancellationTokenSource>(snapshot.Uri, cts));
            cts.Dispose();
        }
    }
}
