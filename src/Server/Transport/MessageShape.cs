using System.Globalization;
using System.Text.Json;
using System.Text.Unicode;

namespace MotorLang.Server.Transport;

internal enum MessageKind
{
    Request,
    Notification,
    Response,
    Invalid,
}

/// <summary>
/// What a message body is, checked against JSON-RPC 2.0 before StreamJsonRpc sees it.
/// <paramref name="IdJson"/> is the request id as canonical JSON text ("null" when it could not be
/// read), ready to echo in an error response.
/// </summary>
internal readonly record struct MessageShape(MessageKind Kind, string IdJson, string? Method, int ErrorCode, string? Reason)
{
    /// <summary>JSON nesting deeper than this is a parse error; no LSP message comes close.</summary>
    public const int MaxDepth = 64;

    public static MessageShape Of(ReadOnlyMemory<byte> body)
    {
        if (!Utf8.IsValid(body.Span)) return Invalid("null", JsonRpcErrors.ParseError, "the message is not valid UTF-8");
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(body, new JsonDocumentOptions { MaxDepth = MaxDepth });
        }
        catch (JsonException e)
        {
            return Invalid("null", JsonRpcErrors.ParseError, $"the message is not JSON: {e.Message}");
        }

        using (document)
        {
            var root = document.RootElement;
            if (root.ValueKind == JsonValueKind.Array)
                return Invalid("null", JsonRpcErrors.InvalidRequest, root.GetArrayLength() == 0 ? "an empty batch is not a request" : "batches are not part of the Language Server Protocol");
            if (root.ValueKind != JsonValueKind.Object) return Invalid("null", JsonRpcErrors.InvalidRequest, "a message must be a JSON object");

            var id = "null";
            var hasId = root.TryGetProperty("id", out var idElement);
            if (hasId)
            {
                if (idElement.ValueKind is not (JsonValueKind.String or JsonValueKind.Number or JsonValueKind.Null) ||
                    (idElement.ValueKind == JsonValueKind.Number && !idElement.TryGetInt64(out _)))
                    return Invalid("null", JsonRpcErrors.InvalidRequest, "the id must be a string or an integer");
                // In one canonical spelling, so that it can be matched against the ids the server sent.
                id = idElement.ValueKind switch
                {
                    JsonValueKind.Number => idElement.GetInt64().ToString(CultureInfo.InvariantCulture),
                    JsonValueKind.String => JsonSerializer.Serialize(idElement.GetString()),
                    _ => "null",
                };
            }

            if (!root.TryGetProperty("jsonrpc", out var version) || version.ValueKind != JsonValueKind.String || version.GetString() != "2.0")
                return Invalid(id, JsonRpcErrors.InvalidRequest, "\"jsonrpc\" must be \"2.0\"");

            if (root.TryGetProperty("method", out var method))
            {
                if (method.ValueKind != JsonValueKind.String) return Invalid(id, JsonRpcErrors.InvalidRequest, "the method must be a string");
                // JSON-RPC allows only structured params; "params": null is tolerated as absent, as clients send it.
                if (root.TryGetProperty("params", out var p) && p.ValueKind is not (JsonValueKind.Object or JsonValueKind.Array or JsonValueKind.Null))
                    return Invalid(id, JsonRpcErrors.InvalidRequest, "params must be an object or an array");
                if (hasId && idElement.ValueKind == JsonValueKind.Null)
                    return Invalid(id, JsonRpcErrors.InvalidRequest, "a request's id must not be null");
                return new MessageShape(hasId ? MessageKind.Request : MessageKind.Notification, id, method.GetString(), 0, null);
            }

            var hasResult = root.TryGetProperty("result", out _);
            var hasError = root.TryGetProperty("error", out var error);
            if (!hasId || hasResult == hasError || (hasError && error.ValueKind != JsonValueKind.Object))
                return Invalid("null", JsonRpcErrors.InvalidRequest, "a message must be a request, a notification or a response");
            return new MessageShape(MessageKind.Response, id, null, 0, null);
        }
    }

    private static MessageShape Invalid(string id, int code, string reason) => new(MessageKind.Invalid, id, null, code, reason);
}
