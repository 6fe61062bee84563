using System.Text.Json;
using StreamJsonRpc;
using StreamJsonRpc.Protocol;

namespace MotorLang.Server.Transport;

/// <summary>
/// StreamJsonRpc with the error answers the protocol calls for: params that cannot be read as the
/// method's parameter type are InvalidParams (-32602), and any other failure of a handler is
/// RequestFailed (-32803) with a one-line message, logged, instead of a generic error carrying a
/// stack trace. Errors a handler raises on purpose (LocalRpcException) keep their code.
/// </summary>
internal sealed class ServerJsonRpc(IJsonRpcMessageHandler handler, Action<string> log) : JsonRpc(handler)
{
    protected override JsonRpcError.ErrorDetail CreateErrorDetails(JsonRpcRequest request, Exception exception)
    {
        if (exception is LocalRpcException or OperationCanceledException) return base.CreateErrorDetails(request, exception);
        if (exception is JsonException || exception.InnerException is JsonException)
        {
            var reason = (exception as JsonException ?? exception.InnerException)!.Message;
            log($"'{request.Method}' had params that could not be read: {reason}");
            return new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)Protocol.ErrorCodes.InvalidParams, Message = $"the params of '{request.Method}' could not be read: {reason}" };
        }

        log($"'{request.Method}' failed: {exception}");
        return new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)Protocol.ErrorCodes.RequestFailed, Message = $"internal error: {exception.Message}" };
    }
}
