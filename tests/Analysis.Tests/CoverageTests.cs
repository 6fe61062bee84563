using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Reports;
using MotorLang.Parser.Text;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Each circuit says which rules it applied (from its steps) and which it did not check (from the one table).</summary>
public class CoverageTests
{
    private static readonly string Plain = Text(Base);

    // The base list's motor on a drive: 430.122(A) sizes its conductors from the drive's 15 A input.
    private static readonly string DriveFed = With(7, "    starting drive 15A");

    private static AnalysisResult Analyze(string text) => Analyzer.Analyze(text);

    private static IReadOnlyList<string> NotCheckedRules(string text) => CircuitCoverage.For(Analyze(text).Motors.Values.Single()).NotChecked.Select(n => n.Rule).ToList();

    [Fact]
    public void ADriveFedMotorListsTheDriveItemsAndAPlainMotorDoesNot()
    {
        // NFPA 70-2023 Part X of Article 430: 430.126 (overtemperature), 430.130 (branch device for drives), 430.131 (several motors on one drive).
        string[] driveItems = ["430.126", "430.130, 110.3(B)", "430.131"];
        var drive = NotCheckedRules(DriveFed);
        var plain = NotCheckedRules(Plain);
        Assert.All(driveItems, i => Assert.Contains(i, drive));
        Assert.All(driveItems, i => Assert.DoesNotContain(i, plain));
        // Both are motors: the short-circuit current rating (110.10, 409.22, 430.8) and control circuits (430.72) concern each.
        Assert.Contains("110.10, 409.22, 430.8", plain);
        Assert.Contains("430.73–430.75", drive);
        Assert.Contains("430.72", drive);
        Assert.DoesNotContain("430.28, 240.21(B)", plain);
    }

    [Fact]
    public void AFeederListsFeederItemsAndNoMotorItems()
    {
        var feeder = CircuitCoverage.For(Analyze(Plain).Feeders.Values.Single()).NotChecked.Select(n => n.Rule).ToList();
        // Taps from feeder to feeder are 240.21(B) (a motor's tap is checked by 430.28); transformer protection is 450.3 (NFPA 70-2023).
        Assert.Contains("240.21(B)", feeder);
        Assert.DoesNotContain("430.28(1), (2), Exception", feeder);
        Assert.Contains("450.3", feeder);
        Assert.Contains("110.9", feeder);
        Assert.DoesNotContain("430.73–430.75", feeder);
        Assert.DoesNotContain("430.72", feeder);
        Assert.DoesNotContain("430.126", feeder);
    }

    [Fact]
    public void AppliedRulesAreTheRulesOfTheMotorsSteps()
    {
        var motor = Analyze(Plain).Motors.Values.Single();
        var applied = CircuitCoverage.For(motor).Applied.Select(a => a.Rule).ToList();
        // 10 hp 480 V: FLC from Table 430.250 under 430.6(A)(1); conductors at 125 % (430.22); breaker limit 250 %
        // (Table 430.52(C)(1)); overload from the nameplate (430.32(A)(1)); ground from Table 250.122; disconnect 430.110(A).
        foreach (var rule in new[] { "Table 430.250", "430.6(A)(1)", "430.22", "Table 310.16", "Table 430.52(C)(1)", "430.32(A)(1)", "Table 250.122", "430.110(A)", "430.83(A)(1)" })
            Assert.Contains(rule, applied);
        // No length is written, so no voltage drop was worked out, and no rule of thumb counts as a rule.
        Assert.DoesNotContain(applied, r => r.Contains("Chapter 9 Table 9"));
        Assert.DoesNotContain(applied, r => r.Contains("common practice"));
        Assert.Equal(applied.Distinct().Count(), applied.Count);
    }

    [Fact]
    public void EveryRuleTheHoverShowsIsInTheAppliedList()
    {
        // The hover's steps and the applied list come from the same results: nothing shown is left out of the list.
        var analysis = Analyze(With(7, "    design B\n    length 200ft\n    code-letter G"));
        var motor = analysis.Motors.Values.Single();
        var view = Breakdown.At(analysis, new TextPosition(motor.Motor.Header.Line.Index, 3))!;
        Assert.NotNull(view.Coverage);
        var applied = view.Coverage!.Applied.Select(a => a.Rule).ToHashSet();
        var shown = view.Sections.SelectMany(s => s.Steps).SelectMany(s => RulesApplied.References(s.Rule)).ToList();
        Assert.Contains("Chapter 9 Table 9, note 2", shown);
        Assert.All(shown, r => Assert.Contains(r, applied));
    }

    [Theory]
    [InlineData("dairy-bottling.motors")]
    [InlineData("booster-station.motors")]
    [InlineData("cabinet-shop.motors")]
    [InlineData("cold-storage.motors")]
    public void EveryExampleCircuitsHoverRulesAreInItsAppliedList(string example)
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        var analysis = Analyze(File.ReadAllText(Path.Combine(dir, "examples", example)));
        var headers = analysis.Motors.Values.Select(m => m.Motor.Header.Line.Index).Concat(analysis.Feeders.Values.Select(f => f.Feeder.Header.Line.Index));
        foreach (var line in headers)
        {
            var view = Breakdown.At(analysis, new TextPosition(line, 0))!;
            var applied = view.Coverage!.Applied.Select(a => a.Rule).ToHashSet();
            var shown = view.Sections.SelectMany(s => s.Steps).SelectMany(s => RulesApplied.References(s.Rule));
            Assert.All(shown, r => Assert.True(applied.Contains(r), $"{view.Title}: {r} is shown but not listed as applied"));
        }
    }

    [Fact]
    public void ConditionalItemsFollowWhatIsWritten()
    {
        // The base list writes no length and no conduit: the drop and the conduit fill are listed as not checked.
        Assert.Contains("210.19 IN No. 4, 215.2(A)(2) IN No. 2", NotCheckedRules(Plain));
        Assert.Contains("Chapter 9 Table 1", NotCheckedRules(Plain));
        var written = NotCheckedRules(With(8, "    wire 12 AWG\n    length 100ft\n    conduit 3/4in"));
        Assert.DoesNotContain("210.19 IN No. 4, 215.2(A)(2) IN No. 2", written);
        Assert.DoesNotContain("Chapter 9 Table 1", written);
    }

    [Fact]
    public void AMotorOver1000VoltsAppliesNothingAndSaysPartXIIsNotChecked()
    {
        // NFPA 70-2023 Article 430 Part XI governs motors over 1000 V; MotorLang sizes nothing there (M210).
        var a = Analyze(Text("feeder MV 4160V 3ph", "  motor P-1 500hp 4000V"));
        var coverage = CircuitCoverage.For(a.Motors.Values.Single());
        Assert.Empty(coverage.Applied);
        Assert.Contains(coverage.NotChecked, n => n.Rule == "Article 430 Part XI");
        Assert.Contains(CircuitCoverage.For(a.Feeders.Values.Single()).NotChecked, n => n.Rule == "Article 430 Part XI");
        Assert.DoesNotContain(NotCheckedRules(Plain), r => r == "Article 430 Part XI");
    }

    [Fact]
    public void ALineHoverLeavesTheCoverageToTheWholeMotor()
    {
        var analysis = Analyze(Plain);
        Assert.Null(Breakdown.At(analysis, new TextPosition(8, 6))!.Coverage); // the wire line
        Assert.NotNull(Breakdown.At(analysis, new TextPosition(0, 2))!.Coverage); // the feeder
    }

    [Theory]
    [InlineData("NEC 430.6(A)(1), Table 430.250", new[] { "430.6(A)(1)", "Table 430.250" })]
    [InlineData("NEC Chapter 9 Table 9, note 2", new[] { "Chapter 9 Table 9, note 2" })]
    [InlineData("NEC 430.62(A), 240.6(A)", new[] { "430.62(A)", "240.6(A)" })]
    [InlineData("NEC 430.7(B), Equation 430.110(C)(1)a", new[] { "430.7(B)", "Equation 430.110(C)(1)a" })]
    [InlineData("NEMA ICS 2 (as collected, not checked against the standard)", new string[0])]
    [InlineData("common practice, no source", new string[0])]
    public void ARulesReferencesAreSplitAtCommasBetweenReferences(string rule, string[] expected)
    {
        Assert.Equal(expected, RulesApplied.References(rule));
    }

    [Fact]
    public void TheScheduleCarriesBothListsPerRowAndFeeder()
    {
        var schedule = Schedule.Of(Analyze(DriveFed));
        var row = schedule.Rows.Single();
        // On a drive the conductors are sized from the drive's input current, NFPA 70-2023 430.122(A), not 430.22.
        Assert.Contains(row.RulesApplied, a => a.Rule == "430.122(A)");
        Assert.DoesNotContain(row.RulesApplied, a => a.Rule == "430.22");
        Assert.Contains(row.NotChecked, n => n.Rule == "430.126" && n.Reason.Length > 0);
        var feeder = schedule.Feeders.Single();
        Assert.Contains(feeder.RulesApplied, a => a.Rule == "430.24");
        Assert.Contains(feeder.NotChecked, n => n.Rule == "450.3");
    }

    [Fact]
    public void ChecksMdListsEveryRuleThatIsNotChecked()
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        var doc = File.ReadAllText(Path.Combine(dir, "docs", "checks.md"));
        const string heading = "## What MotorLang does not check";
        var start = doc.IndexOf(heading, StringComparison.Ordinal);
        Assert.True(start >= 0, $"docs/checks.md has no section \"{heading}\"");
        var end = doc.IndexOf("\n## ", start + heading.Length, StringComparison.Ordinal);
        var section = end < 0 ? doc[start..] : doc[start..end];
        var missing = NotChecked.All.Where(r => !section.Contains($"| {r.Rule} | {r.Text} | {NotChecked.Describe(r.Reach)} | {r.Reason} |")).ToList();
        Assert.Empty(missing);
    }
}
