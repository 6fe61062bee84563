using MotorLang.Analysis.Findings;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Tests;

/// <summary>A small clean motor list to vary one line at a time, and helpers to read findings and apply fixes.</summary>
internal static class AnalysisFixture
{
    // 10 hp 480 V: Table 430.250 gives 14 A (460 V column). Checked by hand to give no findings.
    public static readonly string[] Base =
    [
        "feeder F 480V 3ph",
        "  wire 8 AWG",
        "  ground 10 AWG",
        "  protection inverse-time-breaker 35A",
        "  motor M 10hp",
        "    nameplate 13A",
        "    service-factor 1.15",
        "    design B",
        "    wire 12 AWG",
        "    ground 12 AWG",
        "    protection inverse-time-breaker 35A",
        "    overload 16A",
    ];

    public static string Text(params string[] lines) => string.Join("\n", lines) + "\n";

    /// <summary>The base list with line <paramref name="index"/> replaced (or removed when <paramref name="line"/> is null).</summary>
    public static string With(int index, string? line)
    {
        var lines = Base.ToList();
        if (line is null) lines.RemoveAt(index);
        else lines[index] = line;
        return Text([.. lines]);
    }

    public static string Describe(Finding f) =>
        $"{f.Range.Start.Line + 1}:{f.Range.Start.Column + 1}-{f.Range.End.Line + 1}:{f.Range.End.Column + 1} {f.Code}";

    public static Finding Single(string text, string code)
    {
        var all = Analyzer.Analyze(text).Findings;
        var matching = all.Where(f => f.Code == code).ToList();
        Assert.True(matching.Count == 1, $"expected one {code}, got: {string.Join("; ", all.Select(f => $"{Describe(f)} {f.Message}"))}");
        return matching[0];
    }

    /// <summary>Applies the finding's fix and checks that it parses cleanly and the finding is gone.</summary>
    public static string ApplyFix(string text, Finding finding)
    {
        Assert.NotNull(finding.Fix);
        var fixedText = TextEdits.Apply(text, finding.Fix!.Edits);
        var after = Analyzer.Analyze(fixedText);
        Assert.Empty(after.Parse.Diagnostics);
        Assert.DoesNotContain(after.Findings, f => f.Code == finding.Code && f.Message == finding.Message);
        return fixedText;
    }
}
