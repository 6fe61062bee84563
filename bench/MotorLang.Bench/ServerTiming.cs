using System.Diagnostics;
using MotorLang.Server;
using MotorLang.Server.Protocol;
using MotorLang.Server.Tests;
using Nerdbank.Streams;

namespace MotorLang.Bench;

/// <summary>
/// `edits N`: the in-process server (debounce zero) with an N-motor list. Times five didOpen →
/// diagnostics, then 300 one-character value edits each from sending the change to receiving that
/// version's diagnostics, as percentiles over single edits (BenchmarkDotNet's are over iterations).
/// SHOW_SLOWEST=1 also lists the slowest edits with their GC pauses and the page faults taken.
/// </summary>
public static class ServerTiming
{
    public static async Task Edits(int motors)
    {
        var (serverSide, clientSide) = FullDuplexStream.CreatePair();
        var server = LanguageServer.RunAsync(serverSide, serverSide, TextWriter.Null, TimeSpan.Zero);
        var client = new LspClient(clientSide, clientSide);
        await client.InitializeAsync();
        var text = MotorListGenerator.Generate(motors);

        var opens = new Timings();
        for (var i = 0; i < 5; i++)
        {
            var uri = $"file:///bench/open{i}.motors";
            var sw = Stopwatch.StartNew();
            await client.Open(uri, text);
            await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
            opens.Add(sw.Elapsed);
            await client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(uri)));
        }

        Console.WriteLine($"didOpen → diagnostics: {opens}");
        const string edited = "file:///bench/edits.motors";
        await client.Open(edited, text);
        await client.DiagnosticsAsync(edited, 1, TimeSpan.FromMinutes(2));
        var lengthLines = QuickTiming.LengthLines(text.Split('\n'));
        var edits = new Timings();
        var slowest = new List<(int Edit, double Ms, double Gc)>();
        var faults = MemoryReports.MinorFaults();
        var pause = GC.GetTotalPauseDuration();
        for (var version = 2; version < 302; version++)
        {
            var at = new Position(lengthLines[version * 37 % lengthLines.Length], QuickTiming.LengthPrefix.Length);
            var change = new TextDocumentContentChangeEvent(new MotorLang.Server.Protocol.Range(at, at with { Character = at.Character + 1 }), (version % 9 + 1).ToString());
            var gcBefore = GC.GetTotalPauseDuration();
            var sw = Stopwatch.StartNew();
            await client.Change(edited, version, change);
            await client.DiagnosticsAsync(edited, version, TimeSpan.FromMinutes(2));
            edits.Add(sw.Elapsed);
            slowest.Add((version - 2, sw.Elapsed.TotalMilliseconds, (GC.GetTotalPauseDuration() - gcBefore).TotalMilliseconds));
        }

        Console.WriteLine($"value edit → diagnostics: {edits}; {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms of GC pause in all");
        if (Environment.GetEnvironmentVariable("SHOW_SLOWEST") is not null)
        {
            Console.WriteLine($"page faults during the edits: {MemoryReports.MinorFaults() - faults}");
            Console.WriteLine("slowest (#edit ms/of which GC): " + string.Join(", ", slowest.OrderByDescending(s => s.Ms).Take(20).Select(s => $"#{s.Edit} {s.Ms:0.0}/{s.Gc:0.0}")));
        }

        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await server;
    }
}
