namespace MotorLang.Server.Transport;

/// <summary>
/// The LSP 3.17 lifecycle, checked as each message is read (so in arrival order): before
/// 'initialize' requests answer ServerNotInitialized and notifications are dropped, except
/// 'exit'; a second 'initialize' is InvalidRequest; after 'shutdown' every request is
/// InvalidRequest and notifications other than 'exit' are dropped.
/// </summary>
internal sealed class ProtocolLifecycle
{
    private enum State
    {
        Created,
        Running,
        ShutDown,
    }

    private volatile State _state = State.Created;

    /// <summary>Whether 'shutdown' was requested: 'exit' then ends the process with 0, otherwise 1.</summary>
    public bool ShutdownRequested => _state == State.ShutDown;

    /// <summary>Null to pass the message on; otherwise the error code and message to answer (requests) or log (notifications).</summary>
    public (int Code, string Message)? Admit(MessageShape shape)
    {
        if (shape.Kind is not (MessageKind.Request or MessageKind.Notification) || shape.Method == "exit") return null;
        var request = shape.Kind == MessageKind.Request;
        switch (_state)
        {
            case State.Created when shape.Method == "initialize" && request:
                _state = State.Running;
                return null;
            case State.Created:
                return (JsonRpcErrors.ServerNotInitialized, $"'{shape.Method}' before 'initialize'");
            case State.Running when shape.Method == "initialize":
                return (JsonRpcErrors.InvalidRequest, "the server is already initialized");
            case State.Running when shape.Method == "shutdown" && request:
                _state = State.ShutDown;
                return null;
            case State.Running:
                return null;
            default:
                return (JsonRpcErrors.InvalidRequest, $"'{shape.Method}' after 'shutdown'");
        }
    }
}
