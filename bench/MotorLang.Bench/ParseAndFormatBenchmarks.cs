using BenchmarkDotNet.Attributes;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Bench;

/// <summary>Parse to the model, and format, for 1k / 10k / 100k motors, to show cost grows linearly.</summary>
[MemoryDiagnoser]
[GcConcurrent(false)] // as the shipped motorlang executable runs
public class ParseAndFormatBenchmarks
{
    private string _text = "";
    private ParseResult _parsed = null!;

    [Params(1_000, 10_000, 100_000)]
    public int Motors { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _text = MotorListGenerator.Generate(Motors);
        _parsed = DocumentParser.Parse(_text);
    }

    [Benchmark]
    public ParseResult Parse() => DocumentParser.Parse(_text);

    /// <summary>Formatting includes its own re-parse of the output, which it uses to verify itself.</summary>
    [Benchmark]
    public FormatResult Format() => Formatter.Format(_parsed);
}
