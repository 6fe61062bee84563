using System.Diagnostics;
using MotorLang.Analysis;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Bench;

/// <summary>
/// Quick looks between full benchmark runs, with allocations and GC pauses, for profiling and for
/// the single-run percentiles BenchmarkDotNet does not give. bench/README.md says which figures come
/// from where.
/// </summary>
public static class QuickTiming
{
    /// <summary>`time N`: each stage five times: parse, format, analysis, re-reading one line and updating the analysis.</summary>
    public static void Run(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        Console.WriteLine($"{motors} motors, {text.Length / 1024} KiB");
        for (var i = 0; i < 5; i++)
        {
            var pause = GC.GetTotalPauseDuration();
            var parsed = Stage("parse", () => DocumentParser.Parse(text));
            Stage("format", () => Formatter.Format(parsed));
            var analysis = Stage("analyze", () => Analyzer.Analyze(parsed));
            var (edited, line) = EditLength(text.Split('\n'), 0, 8);
            var reread = Stage("re-read one line", () => DocumentParser.ReparseLine(parsed, edited, line)!);
            Stage("update", () => Analyzer.Update(analysis, reread)!);
            Console.WriteLine($"  gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms");
        }
    }

    /// <summary>`parses N` and `analyses N`: one stage 30 times (for a profiler), with allocation and GC pause per run.</summary>
    public static void Repeat(string stage, int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var parsed = DocumentParser.Parse(text);
        Action work = stage == "parses" ? () => DocumentParser.Parse(text) : () => Analyzer.Analyze(parsed);
        var timings = new Timings();
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var pause = GC.GetTotalPauseDuration();
        for (var i = 0; i < 30; i++) timings.Time(() => { work(); return 0; });
        Console.WriteLine($"{stage}: {timings}; {(GC.GetAllocatedBytesForCurrentThread() - bytes) / 30 >> 20} MB and " +
                          $"{(GC.GetTotalPauseDuration() - pause).TotalMilliseconds / 30:0.0} ms of GC pause each");
    }

    /// <summary>`updates N`: 200 one-line value edits through the parser and analysis alone (no server), each timed.</summary>
    public static void Updates(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var analysis = Analyzer.Analyze(text);
        var lines = text.Split('\n');
        var timings = new Timings();
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var pause = GC.GetTotalPauseDuration();
        for (var i = 0; i < 200; i++)
        {
            var (edited, line) = EditLength(lines, i, i % 9 + 1);
            analysis = timings.Time(() =>
            {
                var reread = DocumentParser.ReparseLine(analysis.Parse, edited, line) ?? throw new InvalidOperationException("not re-read on its own");
                return Analyzer.Update(analysis, reread) ?? throw new InvalidOperationException("not updated");
            });
        }

        Console.WriteLine($"re-read + update: {timings}; {(GC.GetAllocatedBytesForCurrentThread() - bytes) / 200 / 1024} KiB per edit " +
                          $"(the edited text included), {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms of GC pause in all");
    }

    /// <summary>
    /// The <paramref name="n"/>-th edit of a walk through the motors' length lines: its first digit
    /// becomes <paramref name="digit"/>. Changes <paramref name="lines"/> and returns the new text.
    /// </summary>
    public static (string Text, int Line) EditLength(string[] lines, int n, int digit)
    {
        var lengthLines = LengthLines(lines);
        var line = lengthLines[n * 37 % lengthLines.Length];
        lines[line] = LengthPrefix + digit + lines[line][(LengthPrefix.Length + 1)..];
        return (string.Join('\n', lines), line);
    }

    public const string LengthPrefix = "    length ";

    public static int[] LengthLines(string[] lines) =>
        Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith(LengthPrefix, StringComparison.Ordinal)).ToArray();

    private static T Stage<T>(string name, Func<T> work)
    {
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var sw = Stopwatch.StartNew();
        var result = work();
        Console.Write($"{name} {sw.Elapsed.TotalMilliseconds:0.0} ms ({(GC.GetAllocatedBytesForCurrentThread() - bytes) >> 20} MB); ");
        return result;
    }
}
