using System.Diagnostics;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;
using MotorLang.Tests.Shared;
using Xunit.Abstractions;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Mutation fuzzing of the formatter and the checker: 20,000 hostile documents per run, in two
/// halves with their own fixed seeds (two classes, so xunit can run them side by side). Each
/// document must analyse without an exception and format without losing a character, with
/// broken and unreadable lines left byte for byte, and formatting twice must change nothing.
/// </summary>
public abstract class FormatAndCheckFuzz(ITestOutputHelper output, ulong seed)
{
    public const int Documents = 10_000;

    private static readonly string[] Bases =
    [
        .. Directory.GetFiles(Path.Combine(RepoRoot, "examples"), "*.motors").Order().Select(File.ReadAllText),
        .. Directory.GetFiles(Path.Combine(RepoRoot, "tests", "Parser.Tests", "Fixtures"), "*.motors").Order().Select(File.ReadAllText),
        "project \"P\"\n  ambient 40C\nfeeder A 480V 3ph\n  motor P-101 10hp\n    nameplate 12A\n  motor P-102 10hp\n    like P-101\n" +
        "feeder SWBD-1 480V 3ph\n  wire 2x 250 kcmil\nfeeder B 480v 3ph\n  from SWBD-1\n  load L-1 12A continuous\n",
        "",
    ];

    [Fact]
    public void MutatedDocumentsAnalyseAndFormatWithoutLoss()
    {
        var clock = Stopwatch.StartNew();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var tried = 0;
        var counts = new Dictionary<string, int>();
        foreach (var text in HostileDocuments.Draw(HostileDocuments.Text(Bases), seed, Documents))
        {
            Count(counts, text);
            var parsed = DocumentParser.Parse(text);
            try
            {
                Analyzer.Analyze(parsed);
            }
            catch (Exception e)
            {
                Assert.Fail($"document {tried} (seed {seed}): the checker threw {e}\n---\n{Escape(text)}");
            }

            var violation = FormatOracle.Violation(text, parsed, Formatter.Format(parsed));
            Assert.True(violation is null, $"document {tried} (seed {seed}): {violation}\n---\n{Escape(text)}");
            tried++;
        }

        Assert.Equal(Documents, tried);
        output.WriteLine($"{tried} documents in {clock.Elapsed.TotalSeconds:F1} s ({(Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds:F1} s of processor time); "
                         + string.Join(", ", counts.OrderBy(c => c.Key).Select(c => $"{c.Key} {c.Value}")));
        // The campaign must reach every kind of hostile input it claims to try.
        foreach (var kind in new[] { "NUL", "replacement char", "lone surrogate", "CR only", "mixed endings", "BOM", "conflict", "tab", "long line" })
            Assert.True(counts.GetValueOrDefault(kind) >= Documents / 100, $"only {counts.GetValueOrDefault(kind)} documents with {kind}");
    }

    private static void Count(Dictionary<string, int> counts, string text)
    {
        void Add(string kind, bool when)
        {
            if (when) counts[kind] = counts.GetValueOrDefault(kind) + 1;
        }

        Add("NUL", text.Contains('\0'));
        Add("replacement char", text.Contains('\uFFFD'));
        Add("lone surrogate", HasLoneSurrogate(text));
        Add("CR only", text.Contains('\r') && !text.Contains('\n'));
        Add("mixed endings", text.Contains("\r\n") && text.Replace("\r\n", "").Contains('\n'));
        Add("BOM", text.Contains('\uFEFF'));
        Add("conflict", text.Contains("<<<<<<<"));
        Add("tab", text.Contains('\t'));
        Add("long line", text.Split('\n').Any(l => l.Length > 2000));
    }

    private static bool HasLoneSurrogate(string text)
    {
        for (var i = 0; i < text.Length; i++)
        {
            if (char.IsHighSurrogate(text[i]) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1])) i++;
            else if (char.IsSurrogate(text[i])) return true;
        }

        return false;
    }

    private static string Escape(string text) =>
        text.Length > 4000 ? Escape(text[..4000]) + "…" : text.Replace("\0", "\\0").Replace("\r", "\\r").Replace("\t", "\\t").Replace("\uFEFF", "\\uFEFF");

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

public sealed class FormatAndCheckFuzzFirstHalf(ITestOutputHelper output) : FormatAndCheckFuzz(output, 20261202);

public sealed class FormatAndCheckFuzzSecondHalf(ITestOutputHelper output) : FormatAndCheckFuzz(output, 70230);
