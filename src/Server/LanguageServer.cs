using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;
using MotorLang.Server.Transport;
using StreamJsonRpc;

namespace MotorLang.Server;

/// <summary>Runs the language server over a pair of streams (stdin/stdout for `motorlang lsp`).</summary>
public static class LanguageServer
{
    public static readonly TimeSpan DefaultDebounce = TimeSpan.FromMilliseconds(150);

    public static JsonSerializerOptions JsonOptions() => new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
        // Text goes out as UTF-8, as editors send it, not as \u escapes: messages and documents are
        // full of °, ×, ≥ and descriptions in any script, and escaping them costs time and bytes.
        // The "unsafe" in the name is about embedding JSON in HTML, which the protocol never does.
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>Serves until 'exit' or until the client goes away; returns the process exit code.</summary>
    public static async Task<int> RunAsync(Stream input, Stream output, TextWriter log, TimeSpan? debounce = null)
    {
        var formatter = new SystemTextJsonFormatter { JsonSerializerOptions = JsonOptions() };
        var serverLog = new ServerLog(log);
        var lifecycle = new ProtocolLifecycle();
        using var handler = new TolerantMessageHandler(input, output, formatter, lifecycle, serverLog.Local);
        using var rpc = new ServerJsonRpc(handler, serverLog.Local);
        var target = new LanguageServerTarget(rpc, serverLog, lifecycle, debounce ?? DefaultDebounce);
        rpc.AddLocalRpcTarget(target, new JsonRpcTargetOptions { DisposeOnDisconnect = false });
        serverLog.Attach(rpc);
        rpc.StartListening();
        var finished = await Task.WhenAny(rpc.Completion, target.Exited);
        if (finished == rpc.Completion)
        {
            // Only the end of the input means the client went away; anything else is our failure to write.
            if (handler.ReachedEndOfInput) serverLog.Info("the client closed the connection");
            else serverLog.Local($"the connection failed: {rpc.Completion.Exception?.InnerException?.Message ?? "writing to the client failed"}");
            return target.Exited.IsCompleted ? await target.Exited : 1;
        }

        return await target.Exited;
    }
}
