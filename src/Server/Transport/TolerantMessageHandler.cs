using System.Buffers;
using System.Collections.Concurrent;
using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using StreamJsonRpc;
using StreamJsonRpc.Protocol;

namespace MotorLang.Server.Transport;

/// <summary>
/// The server's framing layer in front of StreamJsonRpc, which stops a connection at the first
/// message it cannot read. This one reads each message itself (<see cref="FrameReader"/>),
/// checks it against JSON-RPC 2.0 (<see cref="MessageShape"/>) and the LSP lifecycle
/// (<see cref="ProtocolLifecycle"/>), answers what is wrong with the error JSON-RPC names (id null
/// when the id is unknown), logs it, and goes on with the next message. Only well-formed, admitted
/// messages reach StreamJsonRpc; only the end of the input ends the connection.
/// </summary>
internal sealed class TolerantMessageHandler(Stream input, Stream output, IJsonRpcMessageFormatter formatter, ProtocolLifecycle lifecycle, Action<string> log)
    : IJsonRpcMessageHandler, IDisposable
{
    private readonly FrameReader _reader = new(input);
    private readonly SemaphoreSlim _writing = new(1, 1);

    /// <summary>Ids of the requests the server sent and the client has not answered yet (as canonical JSON).</summary>
    private readonly ConcurrentDictionary<string, byte> _sentRequests = new(StringComparer.Ordinal);

    /// <summary>Set once the input ended: the client closed the connection (rather than it failing).</summary>
    public bool ReachedEndOfInput { get; private set; }

    public bool CanRead => true;

    public bool CanWrite => true;

    public IJsonRpcMessageFormatter Formatter => formatter;

    public async ValueTask<JsonRpcMessage?> ReadAsync(CancellationToken cancellationToken)
    {
        while (true)
        {
            var frame = await _reader.ReadAsync(cancellationToken);
            switch (frame)
            {
                case Frame.EndOfInput:
                    ReachedEndOfInput = true;
                    return null;
                case Frame.Broken broken:
                    log($"protocol error: {broken.Reason}; reading on from the next header");
                    await AnswerErrorAsync("null", JsonRpcErrors.ParseError, broken.Reason, cancellationToken);
                    continue;
                case Frame.Body body when await AcceptAsync(body.Bytes, cancellationToken) is { } message:
                    return message;
            }
        }
    }

    /// <summary>The message to hand to StreamJsonRpc, or null when it was answered or dropped here.</summary>
    private async ValueTask<JsonRpcMessage?> AcceptAsync(ReadOnlyMemory<byte> body, CancellationToken ct)
    {
        var shape = MessageShape.Of(body);
        if (shape.Kind == MessageKind.Invalid)
        {
            log($"protocol error: {shape.Reason}");
            await AnswerErrorAsync(shape.IdJson, shape.ErrorCode, shape.Reason!, ct);
            // A body that was not JSON may have run on into the next message, when its
            // Content-Length was too large: read again from the first header inside it.
            if (shape.ErrorCode == JsonRpcErrors.ParseError && FrameReader.IndexOfHeader(body.Span) is var at and >= 0)
                _reader.Unread(body.Span[at..]);
            return null;
        }

        // StreamJsonRpc drops the connection on a response to a request it never sent.
        if (shape.Kind == MessageKind.Response && !_sentRequests.TryRemove(shape.IdJson, out _))
        {
            log($"protocol error: a response to {shape.IdJson}, which the server never asked; ignored");
            return null;
        }

        if (lifecycle.Admit(shape) is { } refusal)
        {
            log($"refused: {refusal.Message}");
            if (shape.Kind == MessageKind.Request) await AnswerErrorAsync(shape.IdJson, refusal.Code, refusal.Message, ct);
            return null;
        }

        try
        {
            return formatter.Deserialize(new ReadOnlySequence<byte>(body));
        }
        catch (Exception e)
        {
            log($"protocol error: a message could not be read: {e.Message}");
            if (shape.Kind == MessageKind.Request) await AnswerErrorAsync(shape.IdJson, JsonRpcErrors.InvalidRequest, $"the message could not be read: {e.Message}", ct);
            return null;
        }
    }

    public async ValueTask WriteAsync(JsonRpcMessage content, CancellationToken cancellationToken)
    {
        if (content is JsonRpcRequest { RequestId: { IsEmpty: false } id }) _sentRequests[IdJson(id)] = 0;
        var body = new ArrayBufferWriter<byte>();
        formatter.Serialize(body, content);
        await WriteFrameAsync(body.WrittenMemory, cancellationToken);
    }

    private static string IdJson(RequestId id) =>
        id.String is { } text ? JsonSerializer.Serialize(text) : id.Number?.ToString(CultureInfo.InvariantCulture) ?? "null";

    private async ValueTask AnswerErrorAsync(string idJson, int code, string message, CancellationToken ct)
    {
        var body = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(body, new JsonWriterOptions { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteString("jsonrpc", "2.0");
            json.WritePropertyName("id");
            json.WriteRawValue(idJson);
            json.WriteStartObject("error");
            json.WriteNumber("code", code);
            json.WriteString("message", message);
            json.WriteEndObject();
            json.WriteEndObject();
        }

        try
        {
            await WriteFrameAsync(body.WrittenMemory, ct);
        }
        catch (IOException e)
        {
            // The client stopped reading; the read loop will see the end of input soon.
            log($"could not answer a protocol error: {e.Message}");
        }
    }

    private async ValueTask WriteFrameAsync(ReadOnlyMemory<byte> body, CancellationToken ct)
    {
        var header = Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n");
        await _writing.WaitAsync(ct);
        try
        {
            await output.WriteAsync(header, ct);
            await output.WriteAsync(body, ct);
            await output.FlushAsync(ct);
        }
        finally
        {
            _writing.Release();
        }
    }

    public void Dispose() => _writing.Dispose();
}
