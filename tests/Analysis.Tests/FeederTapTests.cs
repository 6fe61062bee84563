using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Text;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Feeder taps ('tap') through analysis: M510-M515 and their fixes, against hand calculations of 430.28
/// (NFPA 70-2023; see Sizing.Tests FeederTapTests for the rule). Conductors are copper with 75 °C
/// terminations, ampacities from NFPA 70-2023 Table 310.16.
/// </summary>
public class FeederTapTests
{
    // A 400 A feeder of 500 kcmil (380 A) with a 25 hp 480 V motor (FLC 34 A, Table 430.250; Part II 125 % = 42.5 A).
    private static string List(string tap, params string[] more) => Text([
        "project \"P\"", "  conductor cu THWN 75C",
        "feeder F 480V 3ph", "  wire 500 kcmil", "  ground 3 AWG", "  protection inverse-time-breaker 400A", .. more,
        "  motor P-1 25hp", "    " + tap, "    wire 8 AWG", "    ground 10 AWG", "    protection inverse-time-breaker 80A", "    overload 38A",
    ]);

    private static List<Finding> Tap(AnalysisResult a) => a.Findings.Where(f => string.CompareOrdinal(f.Code, "M510") >= 0 && string.CompareOrdinal(f.Code, "M519") <= 0).ToList();

    // A termination rating that is no column of Table 310.16 (a typo, 8 °C): the list is still
    // analysed, and the tap is reported as not checked rather than the analysis failing.
    [Fact]
    public void ATerminationRatingThatIsNoColumnLeavesTheTapUncheckedAndTheListAnalysed()
    {
        var a = Analyzer.Analyze(List("tap 8ft 6 AWG").Replace("conductor cu THWN 75C", "conductor cu THWN 8C"));
        var tap = a.Power.Taps.Values.Single();
        Assert.NotEqual(true, tap.Check?.Passes);
        Assert.Contains(a.Findings, f => f.Code == "M514");
    }

    [Fact]
    public void ATenFootTapWithinTheRulesIsClean()
    {
        // 8 ft of 6 AWG (65 A): 430.28(1) asks 400 ÷ 10 = 40 A, Part II 42.5 A.
        var a = Analyzer.Analyze(List("tap 8ft 6 AWG"));
        Assert.Empty(Tap(a));
        Assert.True(a.Power.Taps.Values.Single().Check!.Passes);
    }

    [Fact]
    public void BelowPartTwoIsM510WithTheSmallestConductorAsItsFix()
    {
        // 10 AWG at 75 °C: 35 A < 42.5 A (Part II). The least ampacity is 42.5 A: 8 AWG (50 A).
        var text = List("tap 8ft 10 AWG");
        var f = Single(text, FindingCodes.TapBelowPartTwo);
        Assert.Equal(FindingCodes.TapBelowPartTwo, f.Code);
        Assert.Equal("Change the tap conductors to 8 AWG", f.Fix!.Title);
        Assert.Contains("tap 8ft 8 AWG", Fixes.SizeAll.Apply(text));
    }

    [Fact]
    public void TenFootRuleUnderAnEightHundredAmpDevice()
    {
        // 800 A device, 2x 500 kcmil (760 A): (1) 80 A, (2) 253.33 A. 8 AWG (50 A) fails: M511; 4 AWG (85 A) is the fix.
        var text = Text([
            "project \"P\"", "  conductor cu THWN 75C",
            "feeder F 480V 3ph", "  wire 2x 500 kcmil", "  protection inverse-time-breaker 800A",
            "  motor P-1 25hp", "    tap 8ft 8 AWG", "    protection inverse-time-breaker 80A",
        ]);
        var f = Single(text, FindingCodes.TapTenFootRule);
        Assert.Contains("at least 80 A", f.Message);
        Assert.Equal("Change the tap conductors to 4 AWG", f.Fix!.Title);
    }

    [Fact]
    public void TwentyFiveFootRuleIsOneThirdOfTheFeederConductors()
    {
        // 20 ft: 380 ÷ 3 = 126.67 A. 2 AWG (115 A) fails: M512, fix 1 AWG (130 A).
        var f = Single(List("tap 20ft 2 AWG"), FindingCodes.TapTwentyFiveFootRule);
        Assert.Contains("at least 126.67 A", f.Message);
        Assert.Equal("Change the tap conductors to 1 AWG", f.Fix!.Title);
        Assert.Empty(Tap(Analyzer.Analyze(List("tap 20ft 1 AWG"))));
    }

    [Fact]
    public void OverTwentyFiveFeetTheTapMustMatchTheFeeder()
    {
        var f = Single(List("tap 30ft 4/0 AWG"), FindingCodes.TapOverTwentyFiveFeet);
        Assert.Contains("at least 380 A", f.Message);
        Assert.Empty(Tap(Analyzer.Analyze(List("tap 30ft 500 kcmil"))));
    }

    [Fact]
    public void WithoutTheFeedersValuesTheTapIsNotCheckedAndSaysWhy()
    {
        // No feeder wire and no device: nothing to hold the tap to (M514), never a pass.
        var a = Analyzer.Analyze(Text(["feeder F 480V 3ph", "  motor P-1 25hp", "    tap 8ft 6 AWG", "    protection inverse-time-breaker 80A"]));
        Assert.Contains(Tap(a), f => f.Code == FindingCodes.TapNotChecked && f.Message.Contains("'protection'"));
        Assert.Null(a.Power.Taps.Values.Single().Check!.Passes);
    }

    [Fact]
    public void ATapMustEndInABranchDevice()
    {
        var a = Analyzer.Analyze(Text(["project \"P\"", "  conductor cu THWN 75C", "feeder F 480V 3ph", "  wire 500 kcmil", "  protection inverse-time-breaker 400A",
            "  motor P-1 25hp", "    tap 8ft 6 AWG"]));
        Assert.Contains(Tap(a), f => f.Code == FindingCodes.TapWithoutBranchDevice);
    }

    [Fact]
    public void TheHoverOnTheTapLineShowsEachItemOfTheRule()
    {
        var text = List("tap 20ft 2 AWG");
        var a = Analyzer.Analyze(text);
        var line = text.Split('\n').ToList().FindIndex(l => l.TrimStart().StartsWith("tap", StringComparison.Ordinal));
        var section = Breakdown.At(a, new TextPosition(line, 5))!.Sections.Single();
        Assert.Equal(TapSection.Heading, section.Heading);
        Assert.Contains(section.Steps, s => s.Label == "430.28(2) asks");
        Assert.Contains(section.Steps, s => s.Label == "430.28(3) asks");
        Assert.DoesNotContain(section.Steps, s => s.Label == "430.28(1) asks");
        Assert.StartsWith("✗", section.Verdict);
    }

    [Fact]
    public void OnlyHowATapIsEnclosedIsLeftNotCheckedAndOnlyOnMotorsWithATap()
    {
        // The ampacity and length rules are checked: what is left is the enclosure and the high-bay Exception, on tapped motors only.
        var row = Assert.Single(Coverage.NotChecked.All, r => r.Rule.Contains("430.28"));
        Assert.Equal(Coverage.Reach.Tap, row.Reach);
        var tapped = Analyzer.Analyze(List("tap 8ft 6 AWG"));
        Assert.Contains(row, Coverage.NotChecked.For(tapped.Motors.Values.Single(), tapped.Power));
        var plain = Analyzer.Analyze(Text(Base));
        Assert.DoesNotContain(row, Coverage.NotChecked.For(plain.Motors.Values.Single(), plain.Power));
        Assert.DoesNotContain(row, Coverage.NotChecked.For(plain.Feeders.Values.Single(), plain.Power));
    }
}
