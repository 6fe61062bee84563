using System.Diagnostics;
using MotorLang.Server.Protocol;
using StreamJsonRpc;

namespace MotorLang.Server.Tests;

/// <summary>The real server process over stdio: lifecycle, non-ASCII incremental edits, cancellation, exit rules.</summary>
public class EndToEndTests
{
    private const string Uri = "file:///plant/line%203.motors";

    // CRLF endings, a degree sign, CJK and an emoji (two UTF-16 code units) before values the server must locate.
    private const string Text =
        "project \"Usine 3 — 泵站 😀\"\r\n  ambient 40°C\r\n\r\nfeeder MCC-3 \"主配电 😀\" 480V 3ph\r\n  motor P-1 \"泵 😀\" 15hp\r\n    design B\r\n    wire 14 AWG\r\n";

    [Fact]
    public async Task LifecycleAndIncrementalEditsWithNonAsciiText()
    {
        await using var server = ServerProcess.Start();
        var client = server.Client;
        var init = await client.InitializeAsync();
        Assert.Equal("utf-16", init.Capabilities.PositionEncoding);
        Assert.Equal(2, init.Capabilities.TextDocumentSync.Change);

        await client.Open(Uri, Text);
        var first = await client.DiagnosticsAsync(Uri, 1);
        var wire = Assert.Single(first.Diagnostics, d => d.Code == "M101");
        Assert.Equal(new Protocol.Range(new Position(6, 9), new Position(6, 15)), wire.Range);

        // Insert after the emoji on line 4 (UTF-16 column 17: the emoji counts two), then fix the wire.
        await client.Change(Uri, 2, new TextDocumentContentChangeEvent(new Protocol.Range(new Position(4, 17), new Position(4, 17)), " ★"));
        await client.Change(Uri, 3, new TextDocumentContentChangeEvent(new Protocol.Range(new Position(6, 9), new Position(6, 11)), "10"));
        var third = await client.DiagnosticsAsync(Uri, 3);
        Assert.DoesNotContain(third.Diagnostics, d => d.Code == "M101");

        var copy = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(Uri));
        Assert.Equal(3, copy.Version);
        Assert.Equal(Text.Replace("泵 😀\"", "泵 😀 ★\"").Replace("wire 14 AWG", "wire 10 AWG"), copy.Text);

        await client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(Uri)));
        Assert.Empty((await WaitFor(() => client.DiagnosticsAsync(Uri), p => p.Diagnostics.Length == 0)).Diagnostics);

        Assert.Null(await client.Request<object?>("shutdown", null));
        await client.Notify("exit");
        Assert.Equal(0, await server.WaitForExitAsync(TimeSpan.FromSeconds(20)));
    }

    [Fact]
    public async Task ExitWithoutShutdownExitsWithOne()
    {
        await using var server = ServerProcess.Start();
        await server.Client.InitializeAsync();
        await server.Client.Notify("exit");
        Assert.Equal(1, await server.WaitForExitAsync(TimeSpan.FromSeconds(20)));
    }

    [Fact]
    public async Task ExitsWhenTheClientProcessDies()
    {
        using var parent = Process.Start(new ProcessStartInfo("sleep", "60") { UseShellExecute = false })!;
        await using var server = ServerProcess.Start();
        await server.Client.InitializeAsync(processId: parent.Id);
        parent.Kill();
        await parent.WaitForExitAsync();
        Assert.Equal(1, await server.WaitForExitAsync(TimeSpan.FromSeconds(20)));
    }

    [Fact]
    public async Task UnknownMethodsAnswerMethodNotFoundAndTheServerCarriesOn()
    {
        await using var server = ServerProcess.Start();
        await server.Client.InitializeAsync();
        await Assert.ThrowsAsync<RemoteMethodNotFoundException>(() => server.Client.Request<object>("motorlang/noSuchThing", new { }));
        await server.Client.Open(Uri, Text);
        Assert.NotEmpty((await server.Client.DiagnosticsAsync(Uri, 1)).Diagnostics);
    }

    [Fact]
    public async Task CancelledRequestsAreCancelledAndTheServerStaysUp()
    {
        // A workspace of many large lists makes workspace/symbol slow enough to cancel part-way.
        var root = Directory.CreateTempSubdirectory("motorlang-ws-");
        try
        {
            var big = string.Concat(Enumerable.Range(0, 3_000).Select(i => $"feeder F{i} 480V 3ph\n  motor M{i} 15hp\n    wire 10 AWG\n"));
            for (var i = 0; i < 200; i++) await File.WriteAllTextAsync(Path.Combine(root.FullName, $"list{i}.motors"), big);
            await using var server = ServerProcess.Start();
            var client = server.Client;
            await client.InitializeAsync(rootUri: new System.Uri(root.FullName).AbsoluteUri);
            using var cts = new CancellationTokenSource(TimeSpan.FromMilliseconds(300));
            await Assert.ThrowsAnyAsync<OperationCanceledException>(() => client.Request<SymbolInformation[]>("workspace/symbol", new WorkspaceSymbolParams("M1"), cts.Token));

            await client.Open(Uri, Text);
            var hover = await client.Request<Hover?>("textDocument/hover", new TextDocumentPositionParams(new TextDocumentIdentifier(Uri), new Position(6, 6)));
            Assert.Contains("Branch conductors", hover!.Contents.Value);
        }
        finally
        {
            root.Delete(recursive: true);
        }
    }

    /// <summary>Polls a condition on published state (not a sleep: each wait is on a published notification).</summary>
    private static async Task<T> WaitFor<T>(Func<Task<T>> get, Func<T, bool> done)
    {
        var deadline = DateTime.UtcNow.AddSeconds(20);
        while (true)
        {
            var value = await get();
            if (done(value) || DateTime.UtcNow > deadline) return value;
            await Task.Yield();
        }
    }
}
