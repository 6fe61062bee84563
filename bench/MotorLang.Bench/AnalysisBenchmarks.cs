using BenchmarkDotNet.Attributes;
using MotorLang.Analysis;
using MotorLang.Parser;

namespace MotorLang.Bench;

/// <summary>Analysis (sizing every motor and feeder) of an already parsed list, for 1k / 10k / 100k motors.</summary>
[MemoryDiagnoser]
[GcConcurrent(false)] // as the shipped motorlang executable runs
public class AnalysisBenchmarks
{
    private ParseResult _parsed = null!;

    [Params(1_000, 10_000, 100_000)]
    public int Motors { get; set; }

    [GlobalSetup]
    public void Setup() => _parsed = DocumentParser.Parse(MotorListGenerator.Generate(Motors));

    [Benchmark]
    public AnalysisResult Analyze() => Analyzer.Analyze(_parsed);
}
