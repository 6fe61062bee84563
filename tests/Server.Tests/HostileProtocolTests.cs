using System.Text;
using System.Text.Json;

namespace MotorLang.Server.Tests;

/// <summary>
/// Hostile and malformed protocol input sent to the real server process. After each scenario the
/// server must have answered exactly the errors JSON-RPC 2.0 / LSP 3.17 call for (ParseError
/// -32700 and InvalidRequest -32600 with id null when the id cannot be known) and must still answer
/// a normal hover request correctly.
/// </summary>
public class HostileProtocolTests
{
    private const string Uri = "file:///hostile.motors";

    // NFPA 70-2023 Table 430.250: a 5 hp, 460 V three-phase motor has a full-load current of 7.6 A.
    private const string Text = "feeder F 480V 3ph\n  motor M 5hp\n";

    private static readonly string HoverParams = $$$"""{"textDocument":{"uri":"{{{Uri}}}"},"position":{"line":1,"character":9}}""";

    private const int ParseError = -32700;
    private const int InvalidRequest = -32600;
    private const int MethodNotFound = -32601;
    private const int InvalidParams = -32602;

    /// <summary>What to send, and the error responses (id, code) it must produce; id null when it cannot be known.</summary>
    private sealed record Scenario(string Name, Func<RawServerProcess, (byte[] Bytes, (int? Id, int Code)[] Errors)> Build);

    private static byte[] Bytes(string s) => Encoding.UTF8.GetBytes(s);

    private static byte[] Join(params byte[][] parts) => [.. parts.SelectMany(p => p)];

    private static (int?, int)[] Nothing => [];

    private static readonly Scenario[] Scenarios =
    [
        new("garbage line before a header", s => (Bytes("hello there\r\n"), [(null, ParseError)])),
        new("garbage run into a header", s => (Bytes("xyz"), [(null, ParseError)])),
        new("a header block without Content-Length", s => (Bytes("Content-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n{\"jsonrpc\":\"2.0\",\"method\":\"x\"}"), [(null, ParseError)])),
        new("a Content-Length that is not a number", s => (Bytes("Content-Length: abc\r\n\r\n{}"), [(null, ParseError)])),
        new("a negative Content-Length", s => (Bytes("Content-Length: -5\r\n\r\n{}"), [(null, ParseError)])),
        new("two different Content-Lengths", s => (Bytes("Content-Length: 2\r\nContent-Length: 3\r\n\r\n{}"), [(null, ParseError)])),
        new("a header line of 10,000 bytes", s => (Bytes(new string('x', 10_000)), [(null, ParseError)])),
        new("a body that is not JSON", s => (RawServerProcess.Frame("{not json"), [(null, ParseError)])),
        new("an empty body", s => (Bytes("Content-Length: 0\r\n\r\n"), [(null, ParseError)])),
        new("an empty batch []", s => (RawServerProcess.Frame("[]"), [(null, InvalidRequest)])),
        new("a batch of one request", s => (RawServerProcess.Frame($"[{RawServerProcess.Request(s.NewId(), "textDocument/hover", HoverParams)}]"), [(null, InvalidRequest)])),
        new("a body that is a number", s => (RawServerProcess.Frame("42"), [(null, InvalidRequest)])),
        new("a request without \"jsonrpc\"", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame($$"""{"id":{{id}},"method":"textDocument/hover","params":{{HoverParams}}}"""), [(id, InvalidRequest)]);
        }),
        new("a method that is not a string", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame($$"""{"jsonrpc":"2.0","id":{{id}},"method":5}"""), [(id, InvalidRequest)]);
        }),
        new("params that are a string", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame($$"""{"jsonrpc":"2.0","id":{{id}},"method":"textDocument/hover","params":"x"}"""), [(id, InvalidRequest)]);
        }),
        new("an id that is an object", s => (RawServerProcess.Frame("""{"jsonrpc":"2.0","id":{},"method":"textDocument/hover"}"""), [(null, InvalidRequest)])),
        new("a charset other than utf-8", s =>
        {
            var body = Bytes(RawServerProcess.Request(s.NewId(), "textDocument/hover", HoverParams));
            return (Join(Bytes($"Content-Length: {body.Length}\r\nContent-Type: application/vscode-jsonrpc; charset=latin1\r\n\r\n"), body), [(null, ParseError)]);
        }),
        new("a Content-Type without charset is read as UTF-8", s =>
        {
            var id = s.NewId();
            var body = Bytes(RawServerProcess.Request(id, "shutdownx", "{}"));
            return (Join(Bytes($"Content-Length: {body.Length}\r\nContent-Type: application/json\r\n\r\n"), body), [(id, MethodNotFound)]);
        }),
        new("a header without the blank line", s =>
        {
            var body = Bytes(RawServerProcess.Request(s.NewId(), "textDocument/hover", HoverParams));
            return (Join(Bytes($"Content-Length: {body.Length}\r\n"), body), [(null, ParseError)]);
        }),
        new("header lines ending in LF only are accepted", s =>
        {
            var id = s.NewId();
            var body = Bytes(RawServerProcess.Request(id, "no/such/method", "{}"));
            return (Join(Bytes($"Content-Length: {body.Length}\n\n"), body), [(id, MethodNotFound)]);
        }),
        new("a declared 1 GB body, then a real message", s => (Bytes("Content-Length: 1073741824\r\n\r\n{\"jsonrpc\":"), [(null, ParseError)])),
        new("a Content-Length longer than its body swallows part of the next message", s =>
        {
            const string body = "{\"jsonrpc\":\"2.0\"}";
            // 40 bytes more than the body: the reader takes the start of the next frame as body text,
            // finds no JSON, and must find the next header inside what it read.
            return (Bytes($"Content-Length: {body.Length + 40}\r\n\r\n{body}"), [(null, ParseError)]);
        }),
        new("JSON nested 10,000 deep", s =>
        {
            var id = s.NewId();
            var deep = new string('[', 10_000) + new string(']', 10_000);
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "textDocument/hover", $"{{\"x\":{deep}}}")), [(null, ParseError)]);
        }),
        new("invalid UTF-8 in the body", s =>
        {
            var body = Join(Bytes("{\"jsonrpc\":\"2.0\",\"method\":\"x\",\"params\":{\"a\":\""), [0xC3, 0x28, 0xFF], Bytes("\"}}"));
            return (RawServerProcess.Frame(body), [(null, ParseError)]);
        }),
        new("a response to a request the server never sent", s => (RawServerProcess.Frame("""{"jsonrpc":"2.0","id":987654,"result":{"x":1}}"""), Nothing)),
        new("an error response to a request the server never sent", s => (RawServerProcess.Frame("""{"jsonrpc":"2.0","id":"abc","error":{"code":-1,"message":"?"}}"""), Nothing)),
        new("a response with neither result nor error", s => (RawServerProcess.Frame("""{"jsonrpc":"2.0","id":5}"""), [(null, InvalidRequest)])),
        new("cancelRequest for an unknown id", s => (RawServerProcess.Frame(RawServerProcess.Notification("$/cancelRequest", """{"id":424242}""")), Nothing)),
        new("an unknown notification", s => (RawServerProcess.Frame(RawServerProcess.Notification("no/such/notification", "{}")), Nothing)),
        new("an unknown request", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "no/such/method", "{}")), [(id, MethodNotFound)]);
        }),
        new("didChange with params of the wrong type", s => (RawServerProcess.Frame(RawServerProcess.Notification("textDocument/didChange", """{"textDocument":5,"contentChanges":"x"}""")), Nothing)),
        new("didChange of a document that is not open", s => (RawServerProcess.Frame(RawServerProcess.Notification("textDocument/didChange",
            """{"textDocument":{"uri":"file:///closed.motors","version":2},"contentChanges":[{"text":"x"}]}""")), Nothing)),
        new("hover with params of the wrong type", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "textDocument/hover", """{"textDocument":5,"position":"top"}""")), [(id, InvalidParams)]);
        }),
        new("hover whose handler throws (no position)", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "textDocument/hover", $$$"""{"textDocument":{"uri":"{{{Uri}}}"}}""")), [(id, -32803)]);
        }),
        new("hover whose handler throws (no text document)", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "textDocument/hover", """{"position":{"line":0,"character":0}}""")), [(id, -32803)]);
        }),
        new("a second initialize", s =>
        {
            var id = s.NewId();
            return (RawServerProcess.Frame(RawServerProcess.Request(id, "initialize", """{"processId":null,"capabilities":{}}""")), [(id, InvalidRequest)]);
        }),
    ];

    [Fact]
    public async Task EveryHostileMessageIsAnsweredAndTheServerKeepsServing()
    {
        await using var server = RawServerProcess.Start();
        await server.InitializeAsync();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Notification("textDocument/didOpen",
            $$$"""{"textDocument":{"uri":"{{{Uri}}}","languageId":"motorlang","version":1,"text":{{{JsonSerializer.Serialize(Text)}}}}}""")));
        await AssertServesAsync(server, "after opening the document");

        foreach (var scenario in Scenarios)
        {
            var (bytes, expected) = scenario.Build(server);
            var checkId = server.NewId();
            var check = RawServerProcess.Frame(RawServerProcess.Request(checkId, "textDocument/hover", HoverParams));
            await server.SendBytesAsync(Join(bytes, check));
            var (response, others) = await server.ResponseAsync(checkId);
            AssertHover(response, scenario.Name);
            // Requests are answered as they finish, so a scenario's own answer may come after the check's.
            foreach (var (id, _) in expected)
            {
                if (id is { } wanted && !others.Any(o => o.GetProperty("id") is { ValueKind: JsonValueKind.Number } got && got.GetInt32() == wanted))
                {
                    var (late, more) = await server.ResponseAsync(wanted);
                    others.AddRange(more);
                    others.Add(late);
                }
            }

            var errors = others.Select(o => (Id: o.GetProperty("id").ValueKind == JsonValueKind.Null ? (int?)null : o.GetProperty("id").GetInt32(),
                Code: o.GetProperty("error").GetProperty("code").GetInt32())).ToArray();
            Assert.True(expected.SequenceEqual(errors), $"{scenario.Name}: expected [{string.Join(", ", expected)}], got [{string.Join(", ", errors)}]");
            Assert.False(server.Process.HasExited, scenario.Name);
        }

        // The document is unchanged by all of that, and the server never thought the client had gone.
        await AssertServesAsync(server, "at the end");
        Assert.DoesNotContain(server.Stderr, l => l.Contains("the client closed the connection"));
        Assert.True(server.Process.WorkingSet64 < 1L << 30, "the 1 GB declared body must not have been allocated");

        server.CloseInput();
        Assert.Equal(1, await server.WaitForExitAsync()); // LSP 3.17: the input ended without shutdown and exit
        Assert.Contains(server.Stderr, l => l.Contains("the client closed the connection"));
    }

    [Fact]
    public async Task AMessageWrittenOneByteAtATimeIsAnswered()
    {
        await using var server = RawServerProcess.Start();
        var id = server.NewId();
        foreach (var b in RawServerProcess.Frame(RawServerProcess.Request(id, "initialize", """{"processId":null,"capabilities":{}}""")))
            await server.SendBytesAsync([b]);
        var (response, others) = await server.ResponseAsync(id);
        Assert.Empty(others);
        Assert.Equal("motorlang", response.GetProperty("result").GetProperty("serverInfo").GetProperty("name").GetString());
    }

    [Fact]
    public async Task BeforeInitializeRequestsAreRefusedAndNotificationsDropped()
    {
        await using var server = RawServerProcess.Start();
        var early = server.NewId();
        await server.SendBytesAsync(Join(
            RawServerProcess.Frame(RawServerProcess.Notification("textDocument/didOpen",
                $$$"""{"textDocument":{"uri":"{{{Uri}}}","languageId":"motorlang","version":1,"text":{{{JsonSerializer.Serialize(Text)}}}}}""")),
            RawServerProcess.Frame(RawServerProcess.Request(early, "textDocument/hover", HoverParams))));
        var (refused, _) = await server.ResponseAsync(early);
        Assert.Equal(-32002, refused.GetProperty("error").GetProperty("code").GetInt32()); // LSP 3.17 ServerNotInitialized

        await server.InitializeAsync();
        // The didOpen sent before initialize was dropped: the document is not open.
        var text = server.NewId();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Request(text, "motorlang/documentText", $$"""{"uri":"{{Uri}}"}""")));
        var (held, _) = await server.ResponseAsync(text);
        Assert.Equal(JsonValueKind.Null, held.GetProperty("result").ValueKind);
    }

    [Fact]
    public async Task AfterShutdownRequestsAreInvalidAndExitEndsWithZero()
    {
        await using var server = RawServerProcess.Start();
        await server.InitializeAsync();
        var shutdown = server.NewId();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Request(shutdown, "shutdown", "null")));
        var (done, _) = await server.ResponseAsync(shutdown);
        Assert.Equal(JsonValueKind.Null, done.GetProperty("result").ValueKind);

        var late = server.NewId();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Request(late, "textDocument/hover", HoverParams)));
        var (refused, _) = await server.ResponseAsync(late);
        Assert.Equal(InvalidRequest, refused.GetProperty("error").GetProperty("code").GetInt32()); // LSP 3.17: requests after shutdown

        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Notification("exit", "null")));
        Assert.Equal(0, await server.WaitForExitAsync()); // LSP 3.17: exit after shutdown ends with 0
        Assert.DoesNotContain(server.Stderr, l => l.Contains("the client closed the connection"));
    }

    [Fact]
    public async Task ExitWithoutShutdownEndsWithOne()
    {
        await using var server = RawServerProcess.Start();
        await server.InitializeAsync();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Notification("exit", "null")));
        Assert.Equal(1, await server.WaitForExitAsync()); // LSP 3.17: exit without shutdown ends with 1
    }

    private static async Task AssertServesAsync(RawServerProcess server, string when)
    {
        var id = server.NewId();
        await server.SendBytesAsync(RawServerProcess.Frame(RawServerProcess.Request(id, "textDocument/hover", HoverParams)));
        var (response, others) = await server.ResponseAsync(id);
        Assert.Empty(others);
        AssertHover(response, when);
    }

    private static void AssertHover(JsonElement response, string scenario)
    {
        Assert.True(response.TryGetProperty("result", out var result) && result.ValueKind == JsonValueKind.Object, $"{scenario}: {response.GetRawText()}");
        // NFPA 70-2023 Table 430.250: 5 hp at 460 V three-phase, 7.6 A.
        Assert.Contains("7.6", result.GetProperty("contents").GetProperty("value").GetString());
    }
}
