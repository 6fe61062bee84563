using System.Collections.Concurrent;
using System.Text.Json;
using MotorLang.Server.Protocol;
using StreamJsonRpc;

namespace MotorLang.Server.Tests;

/// <summary>
/// A minimal LSP client over StreamJsonRpc for tests: sends requests and notifications, and
/// collects published diagnostics so tests can wait for a version instead of sleeping.
/// </summary>
public sealed class LspClient : IAsyncDisposable
{
    private readonly JsonRpc _rpc;
    private readonly ConcurrentDictionary<string, PublishDiagnosticsParams> _latest = new();
    private readonly ConcurrentDictionary<string, int> _publications = new();
    private readonly List<(Func<PublishDiagnosticsParams, bool> Match, TaskCompletionSource<PublishDiagnosticsParams> Done)> _waiters = [];
    private readonly object _gate = new();

    public LspClient(Stream sending, Stream receiving)
    {
        var formatter = new SystemTextJsonFormatter { JsonSerializerOptions = LanguageServer.JsonOptions() };
        _rpc = new JsonRpc(new HeaderDelimitedMessageHandler(sending, receiving, formatter));
        _rpc.AddLocalRpcTarget(new ClientTarget(this));
        _rpc.StartListening();
    }

    public ConcurrentBag<string> LogMessages { get; } = [];

    public Task Completion => _rpc.Completion;

    public Task<T> Request<T>(string method, object? parameters, CancellationToken ct = default) =>
        _rpc.InvokeWithParameterObjectAsync<T>(method, parameters, ct);

    public Task Notify(string method, object? parameters = null) => _rpc.NotifyWithParameterObjectAsync(method, parameters);

    public async Task<InitializeResult> InitializeAsync(int? processId = null, object? options = null, string? rootUri = null, object? capabilities = null)
    {
        var result = await Request<InitializeResult>("initialize", new { processId, rootUri, capabilities = capabilities ?? new { }, initializationOptions = options });
        await Notify("initialized", new { });
        return result;
    }

    public Task Open(string uri, string text, int version = 1) =>
        Notify("textDocument/didOpen", new DidOpenTextDocumentParams(new TextDocumentItem(uri, "motorlang", version, text)));

    public Task Change(string uri, int version, params TextDocumentContentChangeEvent[] changes) =>
        Notify("textDocument/didChange", new DidChangeTextDocumentParams(new VersionedTextDocumentIdentifier(uri, version), changes));

    /// <summary>How many times diagnostics of <paramref name="uri"/> have been published so far.</summary>
    public int Publications(string uri) => _publications.GetValueOrDefault(uri);

    /// <summary>Waits for diagnostics of <paramref name="uri"/> at <paramref name="version"/> (or any version when null).</summary>
    public Task<PublishDiagnosticsParams> DiagnosticsAsync(string uri, int? version = null, TimeSpan? timeout = null) =>
        DiagnosticsWhere(uri, p => version is null || p.Version == version, timeout, version);

    /// <summary>Waits for diagnostics of <paramref name="uri"/> that satisfy <paramref name="match"/> (the latest published first).</summary>
    public Task<PublishDiagnosticsParams> DiagnosticsWhere(string uri, Func<PublishDiagnosticsParams, bool> match, TimeSpan? timeout = null, int? version = null)
    {
        bool Match(PublishDiagnosticsParams p) => p.Uri == uri && match(p);
        lock (_gate)
        {
            if (_latest.TryGetValue(uri, out var seen) && Match(seen)) return Task.FromResult(seen);
            var tcs = new TaskCompletionSource<PublishDiagnosticsParams>(TaskCreationOptions.RunContinuationsAsynchronously);
            _waiters.Add((Match, tcs));
            return Describe(tcs.Task.WaitAsync(timeout ?? TimeSpan.FromSeconds(60)), uri, version);
        }
    }

    /// <summary>On a timeout, says what was last published, so a failure can be read without a rerun.</summary>
    private async Task<PublishDiagnosticsParams> Describe(Task<PublishDiagnosticsParams> wait, string uri, int? version)
    {
        try
        {
            return await wait;
        }
        catch (TimeoutException)
        {
            var last = _latest.TryGetValue(uri, out var p) ? $"version {p.Version?.ToString() ?? "none"} with {p.Diagnostics.Length} diagnostics" : "nothing";
            throw new TimeoutException($"no diagnostics for {uri} version {version?.ToString() ?? "any"}; last published: {last}; server log: {string.Join(" | ", LogMessages)}");
        }
    }

    private void OnDiagnostics(JsonElement json)
    {
        var p = json.Deserialize<PublishDiagnosticsParams>(LanguageServer.JsonOptions())!;
        lock (_gate)
        {
            _latest[p.Uri] = p;
            _publications.AddOrUpdate(p.Uri, 1, (_, n) => n + 1);
            foreach (var w in _waiters.Where(w => w.Match(p)).ToList())
            {
                _waiters.Remove(w);
                w.Done.TrySetResult(p);
            }
        }
    }

    /// <summary>The notifications a client receives; each takes the params object whole.</summary>
    private sealed class ClientTarget(LspClient client)
    {
        [JsonRpcMethod("textDocument/publishDiagnostics", UseSingleObjectParameterDeserialization = true)]
        public void PublishDiagnostics(JsonElement p) => client.OnDiagnostics(p);

        [JsonRpcMethod("window/logMessage", UseSingleObjectParameterDeserialization = true)]
        public void LogMessage(JsonElement p) => client.LogMessages.Add(p.GetProperty("message").GetString()!);

        [JsonRpcMethod("$/logTrace", UseSingleObjectParameterDeserialization = true)]
        public void LogTrace(JsonElement p) => client.LogMessages.Add(p.GetProperty("message").GetString()!);
    }

    public async ValueTask DisposeAsync()
    {
        _rpc.Dispose();
        await Task.CompletedTask;
    }
}
