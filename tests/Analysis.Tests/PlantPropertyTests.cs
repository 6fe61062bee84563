using CsCheck;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Plant;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// A plant analysed as a whole equals its files' records concatenated into one file and analysed
/// alone: the same findings (code, severity, message), each at its position mapped back to its file.
/// </summary>
public sealed class PlantPropertyTests
{
    private static readonly string[] Powers = ["1hp", "5hp", "10hp", "25hp", "60hp"];
    private static readonly string[] Wires = ["14 AWG", "10 AWG", "6 AWG", "2 AWG", "4/0 AWG"];

    // One file: a few feeders, each maybe 'from' a feeder of any file (or a tag nobody has), with
    // motors maybe 'like' a motor of any file. Tags carry the file's number so they are unique.
    private static Gen<string> File(int index, int files) =>
        Gen.Select(Gen.Int[0, 2], Gen.Int[0, 3].Array[3], Gen.Int[0, 9].Array[12], Gen.Bool, Gen.Bool).Select((feeders, motors, picks, bom, endBreak) =>
        {
            var lines = new List<string> { $"# file {index}" };
            var p = 0;
            int Pick() => picks[p++ % picks.Length];
            for (var f = 0; f < feeders; f++)
            {
                lines.Add($"feeder F{index}-{f} 480V 3ph");
                var from = Pick();
                if (from < 6) lines.Add($"  from F{from % files}-{from % 3}");
                if (Pick() < 5) lines.Add($"  wire {Wires[Pick() % Wires.Length]}");
                if (Pick() < 3) lines.Add("  length 200ft");
                for (var m = 0; m < motors[f]; m++)
                {
                    lines.Add($"  motor M{index}-{f}-{m} {Powers[Pick() % Powers.Length]}");
                    var like = Pick();
                    if (like < 3) lines.Add($"    like M{like % files}-0-0");
                    if (Pick() < 4) lines.Add($"    wire {Wires[Pick() % Wires.Length]}");
                }
            }

            var text = string.Join(Pick() < 3 ? "\r\n" : "\n", lines) + (endBreak ? "\n" : "");
            return bom ? "\uFEFF" + text : text;
        });

    internal static readonly Gen<string[]> Plants = Gen.Int[1, 4].SelectMany(n =>
        Gen.Select(File(0, n), File(1, n), File(2, n), File(3, n)).Select((a, b, c, d) =>
        {
            var texts = new[] { a, b, c, d }.Take(n).ToArray();
            texts[0] = "project \"Plant\"\n  plant\n  drop-limit 3% 5%\n" + texts[0].TrimStart('\uFEFF');
            return texts;
        }));

    [Fact]
    public void APlantEqualsItsFilesConcatenated()
    {
        Plants.Sample(texts =>
        {
            var plant = PlantAnalyzer.Analyze(texts.Select((t, i) => new PlantFile($"f{i}.motors", t)).ToList());

            // The concatenation, written out independently of the plant layer: each file without its
            // byte order mark, each ending in a line break; a file starts at the line count so far.
            var starts = new List<int>();
            var joined = new System.Text.StringBuilder();
            foreach (var t in texts)
            {
                starts.Add(joined.ToString().Count(c => c == '\n'));
                var body = t.TrimStart('\uFEFF');
                joined.Append(body);
                if (!body.EndsWith('\n')) joined.Append('\n');
            }

            var single = Analyzer.Analyze(joined.ToString()).Findings;
            var expected = single.Select(f =>
            {
                var file = starts.FindLastIndex(s => s <= f.Range.Start.Line);
                return $"f{file}.motors {Shift(f.Range, -starts[file])} {f.Code} {f.Severity} {Normalise(f.Message)}";
            }).ToList();
            var actual = plant.Findings.Select(f => $"{f.File} {f.Finding.Range} {f.Finding.Code} {f.Finding.Severity} {Normalise(f.Finding.Message)}").ToList();
            Assert.Equal(expected, actual);
        }, iter: 60);
    }

    private static MotorLang.Parser.Text.SourceRange Shift(MotorLang.Parser.Text.SourceRange r, int by) =>
        new(r.Start with { Line = r.Start.Line + by }, r.End with { Line = r.End.Line + by });

    // Messages that point at another line name it by file in a plant; the rest is the same text.
    private static string Normalise(string message) =>
        System.Text.RegularExpressions.Regex.Replace(message, @"line \d+( of f\d+\.motors)?", "line N").Replace("in a plant", "in a file");
}
