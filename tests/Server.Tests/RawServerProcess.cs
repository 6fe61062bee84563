using System.Collections.Concurrent;
using System.Diagnostics;
using System.Text;
using System.Text.Json;

namespace MotorLang.Server.Tests;

/// <summary>
/// The real `motorlang lsp` process with no client library in between: tests write any bytes they
/// like to its stdin and read its framed answers from stdout, to see how it copes with broken input.
/// Every wait has a timeout.
/// </summary>
public sealed class RawServerProcess : IAsyncDisposable
{
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(15);

    private readonly Process _process;
    private readonly Stream _stdin;
    private readonly Stream _stdout;
    private readonly ConcurrentQueue<string> _stderr = new();
    private byte[] _buffer = new byte[1 << 16];
    private int _start;
    private int _end;
    private int _nextId = 1000;

    private RawServerProcess(Process process)
    {
        _process = process;
        _stdin = process.StandardInput.BaseStream;
        _stdout = process.StandardOutput.BaseStream;
    }

    /// <summary>What the server wrote to stderr so far, one line each.</summary>
    public IReadOnlyCollection<string> Stderr => _stderr;

    public Process Process => _process;

    public static RawServerProcess Start()
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
        var info = new ProcessStartInfo("dotnet", ["exec", dll, "lsp", "--debounce-ms", "0"])
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        var process = Process.Start(info)!;
        var raw = new RawServerProcess(process);
        process.ErrorDataReceived += (_, e) =>
        {
            if (e.Data is not null) raw._stderr.Enqueue(e.Data);
        };
        process.BeginErrorReadLine();
        return raw;
    }

    public int NewId() => Interlocked.Increment(ref _nextId);

    public async Task SendBytesAsync(byte[] bytes)
    {
        await _stdin.WriteAsync(bytes);
        await _stdin.FlushAsync();
    }

    public Task SendAsync(string text) => SendBytesAsync(Encoding.UTF8.GetBytes(text));

    /// <summary>A well-formed frame around <paramref name="json"/>.</summary>
    public static byte[] Frame(string json) => Frame(Encoding.UTF8.GetBytes(json));

    public static byte[] Frame(byte[] body) => [.. Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n"), .. body];

    public static string Request(int id, string method, string paramsJson) => $$"""{"jsonrpc":"2.0","id":{{id}},"method":"{{method}}","params":{{paramsJson}}}""";

    public static string Notification(string method, string paramsJson) => $$"""{"jsonrpc":"2.0","method":"{{method}}","params":{{paramsJson}}}""";

    public async Task InitializeAsync()
    {
        var id = NewId();
        await SendBytesAsync(Frame(Request(id, "initialize", """{"processId":null,"rootUri":null,"capabilities":{}}""")));
        var (response, _) = await ResponseAsync(id);
        Assert.True(response.TryGetProperty("result", out _), response.GetRawText());
        await SendBytesAsync(Frame(Notification("initialized", "{}")));
    }

    /// <summary>Reads messages until the response with <paramref name="id"/>; returns it and every other response read on the way.</summary>
    public async Task<(JsonElement Response, List<JsonElement> Others)> ResponseAsync(int id)
    {
        var others = new List<JsonElement>();
        using var cts = new CancellationTokenSource(Timeout);
        while (true)
        {
            JsonElement message;
            try
            {
                message = await ReadMessageAsync(cts.Token);
            }
            catch (OperationCanceledException)
            {
                throw new TimeoutException($"no response {id} in {Timeout}; other responses: {string.Join(" | ", others.Select(o => o.GetRawText()))}; stderr: {string.Join(" | ", _stderr)}");
            }

            if (message.TryGetProperty("method", out _)) continue; // the server's own notifications (logs, diagnostics)
            if (message.TryGetProperty("id", out var got) && got.ValueKind == JsonValueKind.Number && got.GetInt32() == id) return (message, others);
            others.Add(message);
        }
    }

    public async Task<int> WaitForExitAsync()
    {
        using var cts = new CancellationTokenSource(Timeout);
        await _process.WaitForExitAsync(cts.Token);
        return _process.ExitCode;
    }

    public void CloseInput() => _stdin.Close();

    private async Task<JsonElement> ReadMessageAsync(CancellationToken ct)
    {
        // The server's output is always well-formed: "Content-Length: N\r\n\r\n" then N bytes.
        var header = await ReadUntilAsync("\r\n\r\n"u8.ToArray(), ct);
        var line = Encoding.ASCII.GetString(header).Split("\r\n").Single(l => l.StartsWith("Content-Length:", StringComparison.Ordinal));
        var length = int.Parse(line["Content-Length:".Length..].Trim());
        var body = new byte[length];
        var have = 0;
        while (have < length)
        {
            if (_start == _end) await FillAsync(ct);
            var take = Math.Min(length - have, _end - _start);
            _buffer.AsSpan(_start, take).CopyTo(body.AsSpan(have));
            have += take;
            _start += take;
        }

        return JsonDocument.Parse(body).RootElement.Clone();
    }

    private async Task<byte[]> ReadUntilAsync(byte[] end, CancellationToken ct)
    {
        while (true)
        {
            var at = _buffer.AsSpan(_start, _end - _start).IndexOf(end);
            if (at >= 0)
            {
                var result = _buffer.AsSpan(_start, at).ToArray();
                _start += at + end.Length;
                return result;
            }

            await FillAsync(ct);
        }
    }

    private async Task FillAsync(CancellationToken ct)
    {
        if (_start > 0)
        {
            _buffer.AsSpan(_start, _end - _start).CopyTo(_buffer);
            _end -= _start;
            _start = 0;
        }

        if (_end == _buffer.Length) Array.Resize(ref _buffer, _buffer.Length * 2);
        var read = await _stdout.ReadAsync(_buffer.AsMemory(_end), ct);
        if (read == 0) throw new EndOfStreamException($"the server closed its output; stderr: {string.Join(" | ", _stderr)}");
        _end += read;
    }

    public async ValueTask DisposeAsync()
    {
        try
        {
            _stdin.Close();
            using var cts = new CancellationTokenSource(TimeSpan.FromSeconds(5));
            await _process.WaitForExitAsync(cts.Token);
        }
        catch (Exception)
        {
            // A test that left the server hanging has already failed.
        }

        if (!_process.HasExited) _process.Kill(entireProcessTree: true);
        _process.Dispose();
    }
}
