using BenchmarkDotNet.Running;
using MotorLang.Bench;

// `generate N [file]` writes a synthetic list; anything else runs the benchmarks.
if (args is ["generate", var count, ..])
{
    var text = MotorListGenerator.Generate(int.Parse(count));
    if (args.Length > 2) File.WriteAllText(args[2], text);
    else Console.Out.Write(text);
    return;
}

if (args is ["time", var n2])
{
    // A quick look between full benchmark runs; not a measurement to quote.
    var text = MotorListGenerator.Generate(int.Parse(n2));
    for (var i = 0; i < 5; i++)
    {
        var sw = System.Diagnostics.Stopwatch.StartNew();
        var split = text.Split('\n');
        Console.Write($"split {sw.Elapsed.TotalMilliseconds:0.0} ms ({split.Length}); ");
        sw.Restart();
        var a0 = GC.GetAllocatedBytesForCurrentThread();
        var lines = MotorLang.Parser.Syntax.LineScanner.Scan(text, 0, new());
        var a1 = GC.GetAllocatedBytesForCurrentThread();
        Console.Write($"scan {sw.Elapsed.TotalMilliseconds:0.0} ms {(a1 - a0) >> 20} MB; ");
        sw.Restart();
        var parsed = MotorLang.Parser.DocumentParser.Parse(text);
        var parseMs = sw.Elapsed.TotalMilliseconds;
        var a2 = GC.GetAllocatedBytesForCurrentThread();
        Console.Write($"parse alloc {(a2 - a1) >> 20} MB; ");
        sw.Restart();
        MotorLang.Parser.Formatting.Formatter.Format(parsed);
        Console.Write($"[gc {GC.CollectionCount(0)}/{GC.CollectionCount(1)}/{GC.CollectionCount(2)} pause {GC.GetTotalPauseDuration().TotalMilliseconds:0}ms] ");
        Console.WriteLine($"parse {parseMs:0.0} ms, format {sw.Elapsed.TotalMilliseconds:0.0} ms, {text.Length / 1024} KiB");
    }

    return;
}

BenchmarkSwitcher.FromAssembly(typeof(ParseAndFormatBenchmarks).Assembly).Run(args);
