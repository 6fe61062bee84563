using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Configs;
using MotorLang.Server;
using MotorLang.Server.Protocol;
using MotorLang.Server.Tests;
using Nerdbank.Streams;

namespace MotorLang.Bench;

/// <summary>
/// The language server in-process over a duplex stream, debounce zero, on a list of 10,000 motors
/// in 100 feeders: first diagnostics after didOpen, a one-character edit to published diagnostics,
/// hover and completion.
/// </summary>
[MemoryDiagnoser]
[GcConcurrent(false)] // as the shipped motorlang executable runs
[Config(typeof(WithPercentiles))]
public class ServerBenchmarks
{
    private const string Uri = "file:///bench/plant.motors";
    private LspClient _client = null!;
    private Task<int> _server = null!;
    private string _text = "";
    private int _version = 1;
    private int _opened;
    private Position _hover = new(0, 0);
    private Position _lengthDigit = new(0, 0);

    [Params(10_000)]
    public int Motors { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var (serverSide, clientSide) = FullDuplexStream.CreatePair();
        _server = LanguageServer.RunAsync(serverSide, serverSide, TextWriter.Null, TimeSpan.Zero);
        _client = new LspClient(clientSide, clientSide);
        _client.InitializeAsync().GetAwaiter().GetResult();
        _text = MotorListGenerator.Generate(Motors);
        _client.Open(Uri, _text).GetAwaiter().GetResult();
        _client.DiagnosticsAsync(Uri, 1, TimeSpan.FromMinutes(2)).GetAwaiter().GetResult();
        var lines = _text.Split('\n');
        var wireLine = Array.FindIndex(lines, l => l.StartsWith("    wire ", StringComparison.Ordinal));
        _hover = new Position(wireLine, 6);
        var lengthLine = Array.FindIndex(lines, l => l.StartsWith("    length ", StringComparison.Ordinal));
        _lengthDigit = new Position(lengthLine, "    length ".Length);
    }

    [Benchmark]
    public async Task<int> OpenToFirstDiagnostics()
    {
        var uri = $"file:///bench/open{_opened++}.motors";
        await _client.Open(uri, _text);
        var p = await _client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        await _client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(uri)));
        return p.Diagnostics.Length;
    }

    /// <summary>Types one character into a comment (the model cannot change) and waits for that version's diagnostics.</summary>
    [Benchmark]
    public async Task<int> CommentEditToDiagnostics()
    {
        var version = ++_version;
        var at = new Position(0, 2);
        await _client.Change(Uri, version, new TextDocumentContentChangeEvent(new MotorLang.Server.Protocol.Range(at, at), "x"));
        var p = await _client.DiagnosticsAsync(Uri, version, TimeSpan.FromMinutes(2));
        return p.Diagnostics.Length;
    }

    /// <summary>Changes one digit of a motor's length (a value: that line is re-read, that motor and its feeder re-sized) and waits for diagnostics.</summary>
    [Benchmark]
    public async Task<int> ValueEditToDiagnostics()
    {
        var version = ++_version;
        var end = _lengthDigit with { Character = _lengthDigit.Character + 1 };
        await _client.Change(Uri, version, new TextDocumentContentChangeEvent(new MotorLang.Server.Protocol.Range(_lengthDigit, end), (version % 9 + 1).ToString()));
        var p = await _client.DiagnosticsAsync(Uri, version, TimeSpan.FromMinutes(2));
        return p.Diagnostics.Length;
    }

    [Benchmark]
    public Task<Hover?> Hover() =>
        _client.Request<Hover?>("textDocument/hover", new TextDocumentPositionParams(new TextDocumentIdentifier(Uri), _hover));

    [Benchmark]
    public Task<CompletionList> Completion() =>
        _client.Request<CompletionList>("textDocument/completion", new CompletionParams(new TextDocumentIdentifier(Uri), new Position(_hover.Line, 9)));

    [GlobalCleanup]
    public void Cleanup()
    {
        _client.Request<object?>("shutdown", null).GetAwaiter().GetResult();
        _client.Notify("exit").GetAwaiter().GetResult();
        _server.GetAwaiter().GetResult();
    }
}

/// <summary>
/// The 95th percentile beside the mean (the edit target is a p95). BenchmarkDotNet computes it
/// over iterations, each the mean of its invocations; `edits N` gives it per single edit.
/// </summary>
public sealed class WithPercentiles : ManualConfig
{
    public WithPercentiles() => AddColumn(StatisticColumn.P95);
}
