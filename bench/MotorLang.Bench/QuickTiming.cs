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

    /// <summary>
    /// `memory N`: what the server keeps for one open N-motor list — the text, the parse and the
    /// analysis — measured as the managed heap retained after full collections.
    /// </summary>
    public static Task ServerMemory(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var m0 = GC.GetTotalMemory(forceFullCollection: true);
        var parsed = MotorLang.Parser.DocumentParser.Parse(text);
        var m1 = GC.GetTotalMemory(forceFullCollection: true);
        var analysis = MotorLang.Analysis.Analyzer.Analyze(parsed);
        var m2 = GC.GetTotalMemory(forceFullCollection: true);
        Console.WriteLine($"retained for one open list: text {text.Length * 2 >> 20} MB, parse {(m1 - m0) >> 20} MB, analysis {(m2 - m1) >> 20} MB; " +
                          $"total {(text.Length * 2 + m2 - m0) >> 20} MB ({analysis.Findings.Length} findings)");
        GC.KeepAlive(analysis);
        return Task.CompletedTask;
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
