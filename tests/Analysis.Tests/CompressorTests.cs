using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Reports;
using MotorLang.Parser.Diagnostics;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Motor-compressors and marked equipment ('compressor') on a motor list, to NFPA 70-2023 Article 440.</summary>
public class CompressorTests
{
    // A rooftop unit marked RLA 18.6 A, LRA 123 A, MCA 28 A, MOP 50 A at 460 V on a 480 V feeder.
    private static string Rooftop(params string[] lines) => Text([
        "feeder F 480V 3ph",
        "  wire 8 AWG",
        "  ground 8 AWG",
        "  protection inverse-time-breaker 50A",
        "  compressor RTU-1 \"Rooftop unit\" 460V",
        "    rated-load 18.6A",
        "    locked-rotor 123A",
        "    min-ampacity 28A",
        "    max-protection 50A",
        .. lines]);

    // The trap: 10 AWG (35 A at 75 C, Table 310.16) on a 50 A breaker is correct here: 440.35 asks
    // for 28 A, the marked maximum is 50 A, and 240.4(G) sends these conductors to Article 440, so
    // no small-conductor limit applies. Nothing may be reported against it.
    [Fact]
    public void TenAwgUnderAFiftyAmpMarkedMaximumIsLegal()
    {
        var text = Rooftop("    wire 10 AWG", "    ground 10 AWG", "    protection inverse-time-breaker 50A", "    disconnect 30A 20hp");
        var analysis = Analyzer.Analyze(text);
        Assert.Empty(analysis.Parse.Diagnostics);
        Assert.DoesNotContain(analysis.Findings, f => f.Severity is Severity.Error or Severity.Warning);
        var row = Schedule.Of(analysis).Rows.Single();
        Assert.Equal("10 AWG", row.MinimumWire);
        Assert.Equal("50 A ITB", row.MaximumProtection);
        Assert.Equal("21.39 A, 20 hp", row.Disconnect); // NEC 440.12(A): see MotorCompressorTests
    }

    // NEC 440.35: 12 AWG copper at 60 C (unmarked terminations, 110.14(C)(1)) carries 20 A < 28 A MCA: use 10 AWG (30 A).
    [Fact]
    public void M130_WireBelowTheMarkedMinimumAmpacity()
    {
        var text = Rooftop("    wire 12 AWG", "    protection inverse-time-breaker 50A", "    ground 10 AWG");
        var f = Single(text, FindingCodes.CompressorWireUndersized);
        Assert.Equal("10:10-10:16 M130", Describe(f));
        Assert.Contains("440.35", f.Message);
        Assert.Contains("wire 10 AWG", ApplyFix(text, f));
    }

    // NEC 440.4(B), 110.3(B): 60 A above the marked 50 A; the fix writes 50 A, never more.
    [Fact]
    public void M131_ProtectionAboveTheMarkedMaximum()
    {
        var text = Rooftop("    wire 10 AWG", "    ground 10 AWG", "    protection inverse-time-breaker 60A");
        var f = Single(text, FindingCodes.CompressorProtectionTooLarge);
        Assert.Equal("12:37-12:40 M131", Describe(f));
        Assert.Contains("protection inverse-time-breaker 50A", ApplyFix(text, f));
    }

    // NEC 440.22(A) with no marking: RLA 55 A (selection current) -> 175 % = 96.25 A -> 90 A fuse.
    // NEC 440.32: 125 % x 55 = 68.75 A -> 4 AWG at 75 C (6 AWG carries 65 A).
    // NEC 440.12(A): 1.15 x 55 = 63.25 A; Table 430.250 460 V 40 hp 52 A < 55 <= 50 hp 65 A; Table
    // 430.251(B) 460 V 40 hp 290 A < 310 <= 50 hp 363 A: 50 hp.
    [Fact]
    public void ChillerCompressorFromItsSelectionCurrent()
    {
        var text = Text(
            "feeder F 480V 3ph",
            "  compressor CH-1",
            "    rated-load 52A",
            "    selection-current 55A",
            "    locked-rotor 310A",
            "    wire 6 AWG",
            "    protection dual-element-fuse 100A",
            "    disconnect 60A 30hp");
        var findings = Analyzer.Analyze(text).Findings;
        var wire = Single(text, FindingCodes.CompressorWireUndersized);
        Assert.Contains("68.75 A", wire.Message);
        Assert.Contains("wire 4 AWG", ApplyFix(text, wire));
        var protection = Single(text, FindingCodes.CompressorProtectionTooLarge);
        Assert.Contains("90 A", protection.Message);
        Assert.Contains("protection dual-element-fuse 90A", ApplyFix(text, protection));
        var disconnects = findings.Where(f => f.Code == FindingCodes.CompressorDisconnectTooSmall).ToList();
        Assert.Equal(2, disconnects.Count);
        Assert.Contains(disconnects, f => f.Message.Contains("63.25 A"));
        Assert.Contains(disconnects, f => f.Message.Contains("50 hp"));
        // The general motor rules never run on it.
        Assert.DoesNotContain(findings, f => f.Code is FindingCodes.WireUndersized or FindingCodes.ProtectionTooLarge or FindingCodes.OverloadMissing);
    }

    // NEC 440.33 with 430.24: feeder with the rooftop unit (18.6 A, other loads 28 - 1.25 x 18.6 = 4.75 A)
    // and a 10 hp motor (14 A, Table 430.250): largest is the compressor, 1.25 x 18.6 = 23.25; + 14 + 4.75 = 42 A.
    // NEC 430.62(A) with 440.22: largest device 50 A (marked) + 14 A = 64 A -> 60 A (other loads left out).
    [Fact]
    public void FeederCountsTheCompressorAsAMotor()
    {
        var text = Rooftop("    wire 10 AWG", "    protection inverse-time-breaker 50A",
            "  motor M 10hp", "    nameplate 13A", "    wire 12 AWG", "    protection inverse-time-breaker 35A", "    overload 14A");
        var analysis = Analyzer.Analyze(text);
        var feeder = analysis.Feeders.Values.Single();
        Assert.Equal(42m, feeder.RequiredAmpacity!.Value);
        Assert.Equal(60m, feeder.MaximumProtection!.Value);
        Assert.Contains(feeder.RequiredAmpacity.Steps, s => s.Rule.Contains("440.33"));
        Assert.Contains(feeder.MaximumProtection.Steps, s => s.Rule.Contains("440.22"));
    }

    // A compressor with no RLA or selection current cannot be counted in its feeder: the feeder is not summed.
    [Fact]
    public void NoRatedLoadMeansNoFeederSum()
    {
        var text = Text("feeder F 480V 3ph", "  compressor RTU-9", "    min-ampacity 28A", "    max-protection 50A", "    wire 10 AWG");
        var analysis = Analyzer.Analyze(text);
        Assert.Null(analysis.Feeders.Values.Single().RequiredAmpacity);
        var row = Schedule.Of(analysis).Rows.Single();
        Assert.Equal("10 AWG", row.MinimumWire); // NEC 440.35: 28 A -> 10 AWG at 60 C (30 A)
        Assert.Contains(analysis.Findings, f => f.Code == FindingCodes.CannotCheck && f.Message.Contains("440.33"));
    }

    // M133: a motor attribute under a compressor, and an Article 440 marking under a motor, are said to be unused.
    [Fact]
    public void M133_StatementsWithNoMeaningHere()
    {
        var onCompressor = Single(Rooftop("    overload 20A"), FindingCodes.NotUsedHere);
        Assert.Contains("440", onCompressor.Message);
        var onMotor = Single(With(5, "    max-protection 50A"), FindingCodes.NotUsedHere);
        Assert.Equal("6:5-6:19 M133", Describe(onMotor));
    }

    // The hover and the JSON list the Article 440 rules, and say what is not checked for a compressor.
    [Fact]
    public void CoverageNamesArticle440()
    {
        var analysis = Analyzer.Analyze(Rooftop("    wire 10 AWG", "    protection inverse-time-breaker 50A"));
        var row = Schedule.Of(analysis).Rows.Single();
        foreach (var rule in new[] { "440.6(A)", "440.35", "440.4(B)", "440.12(A)(1)", "440.12(A)(2)" })
            Assert.Contains(row.RulesApplied, r => r.Rule == rule);
        Assert.Contains(row.NotChecked, n => n.Rule == "440.51–440.55");
        Assert.DoesNotContain(row.NotChecked, n => n.Rule == "430.37");
        var hover = Editing.Breakdown.At(analysis, new Parser.Text.TextPosition(4, 4))!;
        Assert.Contains("motor-compressor", hover.Title);
        Assert.Contains(hover.Sections, s => s.Heading == "Motor-compressor current");
    }
}
