using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;
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
        using var rpc = new JsonRpc(new HeaderDelimitedMessageHandler(output, input, formatter));
        var serverLog = new ServerLog(log);
        var target = new LanguageServerTarget(rpc, serverLog, debounce ?? DefaultDebounce);
        rpc.AddLocalRpcTarget(target, new JsonRpcTargetOptions { DisposeOnDisconnect = false });
        serverLog.Attach(rpc);
        rpc.StartListening();
        var finished = await Task.WhenAny(rpc.Completion, target.Exited);
        if (finished == rpc.Completion)
        {
            serverLog.Info("the client closed the connection");
            return target.Exited.IsCompleted ? await target.Exited : 1;
        }

        return await target.Exited;
    }
}
