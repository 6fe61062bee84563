using BenchmarkDotNet.Attributes;
using MotorLang.Analysis;
using MotorLang.Analysis.Editing;
using MotorLang.Parser;
using MotorLang.Parser.Text;

namespace MotorLang.Bench;

/// <summary>
/// Hover breakdown and a screen of inlay hints on an analysed list, near its end (the worst place for
/// anything that scans): the cost must stay flat from 2,000 to 100,000 motors.
/// </summary>
[MemoryDiagnoser]
[GcConcurrent(false)] // as the shipped motorlang executable runs
public class EditorServiceBenchmarks
{
    private AnalysisResult _analysis = null!;
    private int _motorLine;

    [Params(2_000, 50_000, 100_000)]
    public int Motors { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _analysis = Analyzer.Analyze(DocumentParser.Parse(MotorListGenerator.Generate(Motors)));
        _motorLine = _analysis.Parse.Model.Feeders[^1].Motors[^1].Header.Line.Index;
    }

    [Benchmark]
    public BreakdownView? HoverOnLastMotor() => Breakdown.At(_analysis, new TextPosition(_motorLine, 4));

    [Benchmark]
    public int InlayHintsForLastScreen() =>
        Breakdown.MotorsOnLines(_analysis, Math.Max(0, _motorLine - 60), _motorLine).Count(m => Breakdown.InlaySummary(m, true, true) is not null);
}
