using StreamJsonRpc;

namespace MotorLang.Server;

/// <summary>
/// The server's own log: always to stderr (never stdout, which carries the protocol), warnings and
/// errors also to the client as window/logMessage, and everything as $/logTrace while tracing is on.
/// </summary>
internal sealed class ServerLog(TextWriter stderr)
{
    private JsonRpc? _rpc;

    /// <summary>"off", "messages" or "verbose", as set by $/setTrace.</summary>
    public string Trace { get; set; } = "off";

    public void Attach(JsonRpc rpc) => _rpc = rpc;

    public void Info(string message) => Write(3, message);

    public void Warn(string message) => Write(2, message);

    public void Error(string message) => Write(1, message);

    /// <summary>
    /// To stderr only: protocol errors (the client already gets an error response, and before
    /// 'initialize' the server may not send it notifications) and failures of the connection itself.
    /// </summary>
    public void Local(string message)
    {
        lock (stderr) stderr.WriteLine($"[{DateTime.UtcNow:HH:mm:ss.fff}] {message}");
    }

    private void Write(int type, string message)
    {
        Local(message);
        if (_rpc is null) return;
        try
        {
            if (type <= 2) _ = _rpc.NotifyWithParameterObjectAsync("window/logMessage", new Protocol.LogMessageParams(type, message));
            if (Trace != "off") _ = _rpc.NotifyWithParameterObjectAsync("$/logTrace", new { message });
        }
        catch (Exception)
        {
            // The connection is going away; stderr has the message.
        }
    }
}
