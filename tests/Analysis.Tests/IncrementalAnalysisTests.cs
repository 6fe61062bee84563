using System.Text;
using MotorLang.Tests.Shared;
using CsCheck;
using MotorLang.Analysis.Reports;
using MotorLang.Parser;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// An update after a one-line edit (re-read line, re-sized motors) must equal a fresh analysis of
/// the new text: the same findings in the same order, with the same fixes, and the same schedule.
/// </summary>
public class IncrementalAnalysisTests
{
    /// <summary>Invented for the test: 'like' chains across feeders, a feeder fed from another, loads and long runs, so drops add up.</summary>
    private const string Plant = """
        project "Incremental test plant"
          ambient 40C
          conductor cu THHN 75C

        feeder SW-1 "Main switchboard" 480V 3ph
          length 200ft
          wire 4/0 AWG
          protection inverse-time-breaker 400A

          motor C-1 "Compressor" 50hp
            nameplate 62A
            service-factor 1.15
            length 400ft
            wire 4 AWG
            protection inverse-time-breaker 150A
            overload 70A

        feeder MCC-2 "Process MCC" 480V 3ph
          from SW-1
          length 300ft
          wire 1/0 AWG
          protection dual-element-fuse 150A
          load L-1 "Heater" 20A continuous

          motor P-1 "Feed pump" 15hp
            design B
            code-letter G
            length 500ft
            wire 12 AWG
            protection inverse-time-breaker 70A
            overload 22A

          motor P-2 "Standby pump" 15hp
            like P-1
            length 250ft

          motor P-3 "Booster" 10hp
            like P-2
            wire 10 AWG

        feeder MCC-3 "Utility MCC" 480V 3ph
          wire 6 AWG

          motor F-1 "Fan" 7.5hp
            like P-1
            ground 14 AWG
        """;

    private static readonly string[] Documents =
    [
        Plant,
        .. Directory.GetFiles(Path.Combine(RepoRoot, "examples"), "*.motors").Order().Select(File.ReadAllText),
    ];

    private static readonly Gen<string> Inserted = Gen.OneOfConst(
        "", "1", "0", "5", "9", "x", " ", "  ", "hp", "A", "AWG", "kcmil", "ft", "\"", "#", "😀", "°", "B", "1/0", "-", "2x ", "kW", "V", "fuse", "M-1");

    /// <summary>A line (as a fraction of the line count), a start and length within it (fractions), and the text put there.</summary>
    private static readonly Gen<(int Document, (double Line, double Start, double Length, string Text)[] Edits)> Sessions =
        Gen.Select(Gen.Int[0, Documents.Length - 1], Gen.Select(Gen.Double[0, 1], Gen.Double[0, 1], Gen.Double[0, 0.5], Inserted).Array[1, 12]);

    [Fact]
    public void UpdatesEqualAFreshAnalysisAfterRandomOneLineEdits()
    {
        var incremental = 0;
        var steps = 0;
        Sessions.Sample(session =>
        {
            var text = Documents[session.Document];
            var analysis = Analyzer.Analyze(text);
            foreach (var (linePick, startPick, lengthPick, insert) in session.Edits)
            {
                var (newText, line) = EditOneLine(text, linePick, startPick, lengthPick, insert);
                var reread = DocumentParser.ReparseLine(analysis.Parse, newText, line);
                var updated = reread is null ? null : Analyzer.Update(analysis, reread);
                analysis = updated ?? Analyzer.Analyze(newText);
                text = newText;
                Interlocked.Increment(ref steps);
                if (updated is null) continue;
                Interlocked.Increment(ref incremental);
                Assert.Equal(text, analysis.Parse.Tree.Print());
                var expected = AnalysisText.Describe(Analyzer.Analyze(text));
                var actual = AnalysisText.Describe(analysis);
                if (expected != actual && Environment.GetEnvironmentVariable("DUMP") is { } dump)
                    File.WriteAllText(dump, $"line {line}: {text.Split('\n')[line]}\n---\n{text}\n---\n{expected}\n---\n{actual}");
                Assert.Equal(expected, actual);
            }
        }, iter: 300);

        // The generator must reach the incremental path often enough for the comparison to mean something.
        Assert.True(incremental > steps / 8, $"only {incremental} of {steps} edits were applied incrementally");
    }

    /// <summary>
    /// Edits re-read one after another without analysing in between, each chained onto the model
    /// of the analysis made before the first: one update then equals a fresh analysis of the final
    /// text (it sizes again the union of what every edit reached).
    /// </summary>
    [Fact]
    public void ChainedEditsUpdatedOnceEqualAFreshAnalysis()
    {
        var chained = 0;
        var sessions = 0;
        Sessions.Sample(session =>
        {
            var text = Documents[session.Document];
            var analysis = Analyzer.Analyze(text);
            var parse = analysis.Parse;
            foreach (var (linePick, startPick, lengthPick, insert) in session.Edits)
            {
                var (newText, line) = EditOneLine(text, linePick, startPick, lengthPick, insert);
                var content = newText.Split('\n')[line].TrimEnd('\r');
                var reread = newText.Split('\n')[line].EndsWith('\r') == text.Split('\n')[line].EndsWith('\r')
                    ? DocumentParser.ReparseLine(parse, line, content, analysis.Parse.Model)
                    : null;
                text = newText;
                if (reread is null) return;
                parse = reread;
            }

            Interlocked.Increment(ref sessions);
            var updated = Analyzer.Update(analysis, parse);
            Assert.Equal(text, parse.Tree.Print());
            if (updated is null) return;
            Interlocked.Increment(ref chained);
            Assert.Equal(AnalysisText.Describe(Analyzer.Analyze(text)), AnalysisText.Describe(updated));
        }, iter: 600);

        Assert.True(chained > sessions / 2, $"only {chained} of {sessions} chains were updated");
    }

    /// <summary>
    /// A list large enough that the shared tables fold their layers of changes into new bases
    /// (600 motors, 15 feeders, a chain of 'from', 'like' across feeders), edited many times in a row.
    /// </summary>
    [Fact]
    public void LongRunsOfEditsOnALargerListEqualAFreshAnalysis()
    {
        var sb = new StringBuilder("project \"Larger incremental test plant\"\n  ambient 40C\n\n");
        for (var f = 0; f < 15; f++)
        {
            sb.Append($"feeder F-{f} \"Feeder {f}\" 480V 3ph\n").Append(f > 0 && f % 3 != 0 ? $"  from F-{f - 1}\n" : "")
                .Append($"  length {100 + f * 10}ft\n  wire 4/0 AWG\n");
            for (var m = 0; m < 40; m++)
            {
                var n = f * 40 + m;
                sb.Append($"  motor M-{n} \"Motor {n}\" {(n % 5 + 1) * 5}hp\n");
                if (n % 7 == 3 && n > 40) sb.Append($"    like M-{n - 37}\n");
                sb.Append($"    length {20 + n % 90}ft\n    wire {(n % 3 == 0 ? "10" : "8")} AWG\n    protection inverse-time-breaker {(n % 4 + 3) * 10}A\n\n");
            }
        }

        var text = sb.ToString();
        var lines = text.Split('\n');
        var valueLines = Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith("    length ") || lines[i].StartsWith("    wire ") || lines[i].StartsWith("  motor ")).ToArray();
        var analysis = Analyzer.Analyze(text);
        var random = new Random(7);
        var updated = 0;
        for (var step = 0; step < 400; step++)
        {
            var line = valueLines[random.Next(valueLines.Length)];
            var content = lines[line];
            var at = content.LastIndexOf(' ') + 1;
            lines[line] = content[..at] + random.Next(1, 9) + content[(at + 1)..];
            var edited = string.Join('\n', lines);
            var reread = DocumentParser.ReparseLine(analysis.Parse, line, lines[line]);
            var next = reread is null ? null : Analyzer.Update(analysis, reread);
            analysis = next ?? Analyzer.Analyze(edited);
            if (next is not null) updated++;
            if (step % 40 == 39) Assert.Equal(AnalysisText.Describe(Analyzer.Analyze(edited)), AnalysisText.Describe(analysis));
        }

        Assert.Equal(AnalysisText.Describe(Analyzer.Analyze(string.Join('\n', lines))), AnalysisText.Describe(analysis));
        Assert.True(updated > 300, $"only {updated} of 400 edits were applied incrementally");
    }

    [Fact]
    public void EditingAMotorValueResizesItAndTheMotorsLikeIt()
    {
        var before = Analyzer.Analyze(Plant);
        var (text, line) = Replace(Plant, "    wire 12 AWG", "    wire 10 AWG");
        var reread = DocumentParser.ReparseLine(before.Parse, text, line);
        Assert.NotNull(reread);
        var after = Analyzer.Update(before, reread!);
        Assert.NotNull(after);
        Assert.Equal(AnalysisText.Describe(Analyzer.Analyze(text)), AnalysisText.Describe(after!));
        // Motors in untouched feeders keep their very results, except those that inherit the edited wire.
        var c1 = before.Motors.Single(m => m.Key.Tag?.Value == "C-1");
        Assert.Same(c1.Value, after!.Motors[c1.Key]);
        var f1 = after.Motors.Single(m => m.Key.Tag?.Value == "F-1");
        Assert.NotSame(before.Motors.Single(m => m.Key.Tag?.Value == "F-1").Value, f1.Value);
    }

    [Fact]
    public void AnUpdateNeverChangesThePreviousAnalysis()
    {
        var before = Analyzer.Analyze(Plant);
        var snapshot = AnalysisText.Describe(before);
        var (text, line) = Replace(Plant, "  length 200ft", "  length 900ft");   // every motor's total drop moves
        var after = Analyzer.Update(before, DocumentParser.ReparseLine(before.Parse, text, line)!);
        Assert.NotNull(after);
        Assert.NotEqual(snapshot, AnalysisText.Describe(after!));
        Assert.Equal(snapshot, AnalysisText.Describe(before));
    }

    [Fact]
    public void AnAnalysisOfAnotherDocumentIsNotUpdated()
    {
        var before = Analyzer.Analyze(Plant);
        var (text, line) = Replace(Plant, "    wire 12 AWG", "    wire 10 AWG");
        var unrelated = Analyzer.Analyze(Plant);
        var reread = DocumentParser.ReparseLine(before.Parse, text, line)!;
        Assert.Null(Analyzer.Update(unrelated, reread));
    }

    private static (string Text, int Line) Replace(string text, string oldLine, string newLine)
    {
        var lines = text.Split('\n');
        var index = Array.IndexOf(lines, oldLine);
        Assert.True(index >= 0, $"no line '{oldLine}'");
        lines[index] = newLine;
        return (string.Join('\n', lines), index);
    }

    /// <summary>Replaces part of one line's content (never its ending) and says which line.</summary>
    private static (string Text, int Line) EditOneLine(string text, double linePick, double startPick, double lengthPick, string insert)
    {
        var lines = text.Split('\n');
        var index = Math.Min(lines.Length - 1, (int)(linePick * lines.Length));
        var content = lines[index];
        var contentLength = content.EndsWith('\r') ? content.Length - 1 : content.Length;
        var start = (int)(startPick * contentLength);
        var end = Math.Min(contentLength, start + (int)(lengthPick * contentLength));
        // Never split a surrogate pair: an editor never produces such a range.
        while (start > 0 && start < contentLength && char.IsLowSurrogate(content[start])) start--;
        while (end < contentLength && char.IsLowSurrogate(content[end])) end++;
        lines[index] = content[..start] + insert + content[end..];
        return (string.Join('\n', lines), index);
    }


    private static string RepoRoot
    {
        get
        {
            var dir = AppContext.BaseDirectory;
            while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
            return dir;
        }
    }
}
