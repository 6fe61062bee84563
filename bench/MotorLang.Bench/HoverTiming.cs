using System.Diagnostics;
using MotorLang.Analysis;
using MotorLang.Analysis.Editing;
using MotorLang.Parser;
using MotorLang.Parser.Text;

namespace MotorLang.Bench;

/// <summary>
/// Quick mode 'hovers N': the hover breakdown on 1,000 motors spread over an analysed list of N
/// motors, the median and 95th percentile per hover; between BenchmarkDotNet runs, and on a busy machine.
/// </summary>
public static class HoverTiming
{
    public static void Run(int motors)
    {
        var analysis = Analyzer.Analyze(DocumentParser.Parse(MotorListGenerator.Generate(motors)));
        var lines = analysis.Parse.Model.Feeders.SelectMany(f => f.Motors).Select(m => m.Header.Line.Index).ToArray();
        var picks = Enumerable.Range(0, 1000).Select(i => lines[(int)((long)i * lines.Length / 1000)]).ToArray();
        foreach (var line in picks.Take(50)) Breakdown.At(analysis, new TextPosition(line, 4)); // warm up (JIT)
        var times = new List<double>(picks.Length);
        foreach (var line in picks)
        {
            var clock = Stopwatch.StartNew();
            var view = Breakdown.At(analysis, new TextPosition(line, 4)) ?? throw new InvalidOperationException($"no hover on line {line}");
            // Rendering the sections is part of the hover's cost; count the steps so nothing is skipped.
            _ = view.Sections.Sum(s => s.Steps.Count);
            times.Add(clock.Elapsed.TotalMilliseconds);
        }

        times.Sort();
        Console.WriteLine($"{motors:N0} motors: hover median {times[times.Count / 2]:0.000} ms, p95 {times[(int)(times.Count * 0.95)]:0.000} ms, max {times[^1]:0.000} ms");
    }
}
