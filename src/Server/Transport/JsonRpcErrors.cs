namespace MotorLang.Server.Transport;

/// <summary>Error codes of JSON-RPC 2.0 and LSP 3.17 that the transport answers by itself.</summary>
internal static class JsonRpcErrors
{
    public const int ParseError = -32700;
    public const int InvalidRequest = -32600;
    public const int MethodNotFound = -32601;
    public const int ServerNotInitialized = -32002;
}
