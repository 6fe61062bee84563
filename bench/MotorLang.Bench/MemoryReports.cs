using System.Diagnostics;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Parser;
using MotorLang.Server.Protocol;
using MotorLang.Server.Tests;

namespace MotorLang.Bench;

/// <summary>What the server keeps in memory, measured in-process (`memory N`) and in the real process (`process N`).</summary>
public static class MemoryReports
{
    /// <summary>
    /// `memory N`: what one open N-motor list keeps — the text, the parse and the analysis — as
    /// the managed heap retained after full collections.
    /// </summary>
    public static void Retained(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var m0 = GC.GetTotalMemory(forceFullCollection: true);
        var parsed = DocumentParser.Parse(text);
        var m1 = GC.GetTotalMemory(forceFullCollection: true);
        var analysis = Analyzer.Analyze(parsed);
        var m2 = GC.GetTotalMemory(forceFullCollection: true);
        Console.WriteLine($"retained for one open list: text {text.Length * 2 >> 20} MB, parse {(m1 - m0) >> 20} MB, analysis {(m2 - m1) >> 20} MB; " +
                          $"total {(text.Length * 2 + m2 - m0) >> 20} MB ({analysis.Findings.Length} findings)");
        GC.KeepAlive(analysis);
    }

    /// <summary>
    /// `process N path/to/motorlang.dll`: the real server process, started as an editor starts it,
    /// with an N-motor list open: its resident set after the first diagnostics and four idle
    /// seconds later (when it gives unused memory back), after 200 value edits and again after four
    /// idle seconds, with the collector's own figures. Linux (reads /proc).
    /// </summary>
    public static async Task Process(int motors, string motorlang)
    {
        var (started, client) = await ServerProcess.StartAsync(motorlang);
        using var process = started;
        Console.WriteLine($"started: {Resident(process)}");
        var text = MotorListGenerator.Generate(motors);
        const string uri = "file:///bench/process.motors";
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        Console.WriteLine($"after open ({motors} motors): {Resident(process)}; {await Collector(client)}");
        await Task.Delay(TimeSpan.FromSeconds(4));
        Console.WriteLine($"after open and 4 s idle: {Resident(process)}; {await Collector(client)}");
        var lengthLines = QuickTiming.LengthLines(text.Split('\n'));
        for (var version = 2; version < 202; version++)
        {
            var at = new Position(lengthLines[version * 37 % lengthLines.Length], QuickTiming.LengthPrefix.Length);
            await client.Change(uri, version, new TextDocumentContentChangeEvent(new MotorLang.Server.Protocol.Range(at, at with { Character = at.Character + 1 }), (version % 9 + 1).ToString()));
            await client.DiagnosticsAsync(uri, version, TimeSpan.FromMinutes(2));
        }

        Console.WriteLine($"after 200 value edits: {Resident(process)}; {await Collector(client)}");
        await Task.Delay(TimeSpan.FromSeconds(4));
        Console.WriteLine($"after 4 s idle: {Resident(process)}; {await Collector(client)}");
        Console.WriteLine($"live managed heap (after a full collection): {await client.Request<long>("motorlang/heapBytes", new { }) >> 20} MB");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await process.WaitForExitAsync();
    }

    /// <summary>Minor page faults of this process so far (Linux; 0 elsewhere).</summary>
    public static long MinorFaults()
    {
        try
        {
            var stat = File.ReadAllText("/proc/self/stat");
            return long.Parse(stat[(stat.LastIndexOf(')') + 2)..].Split(' ')[7]);
        }
        catch (IOException)
        {
            return 0;
        }
    }

    private static string Resident(System.Diagnostics.Process process)
    {
        var status = File.ReadAllLines($"/proc/{process.Id}/status");
        string Field(string name) => status.First(l => l.StartsWith(name + ":", StringComparison.Ordinal)).Split(':')[1].Trim();
        return $"resident {Field("VmRSS")} ({Field("RssAnon")} private, {Field("RssFile")} mapped files; peak {Field("VmHWM")})";
    }

    private static async Task<string> Collector(LspClient client)
    {
        var gc = await client.Request<JsonElement>("motorlang/gcMemory", new { });
        return $"collector holds {gc.GetProperty("committed").GetInt64() >> 20} MB for a {gc.GetProperty("heap").GetInt64() >> 20} MB heap";
    }
}
