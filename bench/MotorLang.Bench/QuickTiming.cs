using System.Diagnostics;
using MotorLang.Analysis;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Bench;

/// <summary>
/// `time N`: a quick look at each stage between full benchmark runs, with allocations and GC
/// pause time. Not a measurement to quote; bench/README.md quotes BenchmarkDotNet.
/// </summary>
public static class QuickTiming
{
    public static void Run(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        Console.WriteLine($"{motors} motors, {text.Length / 1024} KiB");
        for (var i = 0; i < 5; i++)
        {
            var pause = GC.GetTotalPauseDuration();
            var parsed = Stage("parse", () => DocumentParser.Parse(text));
            Stage("format", () => Formatter.Format(parsed));
            Stage("analyze", () => Analyzer.Analyze(parsed));
            Console.WriteLine($"  gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms");
        }
    }

    /// <summary>`memory N`: the server's managed heap and working set with one N-motor list open and analyzed.</summary>
    public static async Task ServerMemory(int motors)
    {
        var (serverSide, clientSide) = Nerdbank.Streams.FullDuplexStream.CreatePair();
        var server = MotorLang.Server.LanguageServer.RunAsync(serverSide, serverSide, TextWriter.Null, TimeSpan.Zero);
        var client = new MotorLang.Server.Tests.LspClient(clientSide, clientSide);
        await client.InitializeAsync();
        var before = GC.GetTotalMemory(forceFullCollection: true);
        var sw = Stopwatch.StartNew();
        await client.Open("file:///m.motors", MotorListGenerator.Generate(motors));
        await client.DiagnosticsAsync("file:///m.motors", 1, TimeSpan.FromMinutes(5));
        Console.WriteLine($"first diagnostics after {sw.Elapsed.TotalMilliseconds:0} ms (cold)");
        var heap = GC.GetTotalMemory(forceFullCollection: true);
        using var self = Process.GetCurrentProcess();
        Console.WriteLine($"managed heap for the open list: {(heap - before) >> 20} MB; process working set {self.WorkingSet64 >> 20} MB (includes the client and generator)");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await server;
    }

    private static T Stage<T>(string name, Func<T> work)
    {
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var sw = Stopwatch.StartNew();
        var result = work();
        Console.Write($"{name} {sw.Elapsed.TotalMilliseconds:0.0} ms ({(GC.GetAllocatedBytesForCurrentThread() - bytes) >> 20} MB); ");
        return result;
    }
}
