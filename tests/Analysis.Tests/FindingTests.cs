using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>One test per finding code: exact span, the code section in the message, and the fix.</summary>
public class FindingTests
{
    [Fact]
    public void TheBaseListIsClean()
    {
        Assert.Empty(Analyzer.Analyze(Text(Base)).Findings);
    }

    // 14 A x 125 % = 17.5 A (430.22); 14 AWG Cu at 75 C = 20 A (Table 310.16, design B -> 110.14(C)(1)(a)(4)).
    // At 50 C ambient a 75 C conductor is x 0.75 (Table 310.15(B)(1)(1)): 12 AWG 25 x 0.75 = 18.75 A still enough; 14 AWG 15 A not.
    [Fact]
    public void M101_WireUndersized()
    {
        var text = Text(["project \"P\"", "  ambient 50C", .. With(8, "    wire 14 AWG").TrimEnd('\n').Split('\n')]);
        var f = Single(text, FindingCodes.WireUndersized);
        Assert.Equal("11:10-11:16 M101", Describe(f));
        Assert.Equal(Severity.Error, f.Severity);
        Assert.Equal("wire 14 AWG carries 15 A here; NEC 430.22 requires 17.5 A: use 12 AWG", f.Message);
        Assert.Contains("    wire 12 AWG\n", ApplyFix(text, f));
    }

    // Inverse-time breaker: 250 % x 14 A = 35 A, a standard rating (Table 430.52(C)(1)).
    [Fact]
    public void M102_ProtectionTooLarge()
    {
        var text = With(10, "    protection inverse-time-breaker 50A");
        var f = Single(text, FindingCodes.ProtectionTooLarge);
        Assert.Equal("11:37-11:40 M102", Describe(f));
        Assert.Contains("NEC 430.52(C)(1)", f.Message);
        Assert.Contains("protection inverse-time-breaker 35A\n", ApplyFix(text, f));
    }

    // Overloads: 13 A x 125 % = 16.25 A (430.32(A)(1)); 140 % = 18.2 A (430.32(C)).
    [Fact]
    public void M103_OverloadTooLarge_And_M205_AboveRunningLimit()
    {
        var error = Single(With(11, "    overload 19A"), FindingCodes.OverloadTooLarge);
        Assert.Equal("12:14-12:17 M103", Describe(error));
        Assert.Contains("overload 16.25A", ApplyFix(With(11, "    overload 19A"), error));
        var warning = Single(With(11, "    overload 17A"), FindingCodes.OverloadAboveRunningLimit);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Contains("430.32(C)", warning.Message);
    }

    // 430.110(A): 115 % x 14 A = 16.1 A and at least 10 hp.
    [Fact]
    public void M104_DisconnectTooSmall()
    {
        var text = Text([.. Base, "    disconnect 15A 7.5hp"]);
        var findings = Analyzer.Analyze(text).Findings.Where(f => f.Code == FindingCodes.DisconnectTooSmall).ToList();
        Assert.Equal(["13:16-13:19 M104", "13:20-13:25 M104"], findings.Select(Describe));
        Assert.Contains("16.1 A", findings[0].Message);
        Assert.Contains("disconnect 15A 10hp", ApplyFix(text, findings[1]));
    }

    [Fact]
    public void M105_ControllerTooSmall()
    {
        var text = Text([.. Base, "    controller 7-1/2hp"]);
        var f = Single(text, FindingCodes.ControllerTooSmall);
        Assert.Equal("13:16-13:23 M105", Describe(f));
        Assert.Contains("430.83", f.Message);
        Assert.Contains("controller 10hp", ApplyFix(text, f));
    }

    // Table 250.122: a 35 A device -> 10 AWG Cu; a 12 AWG circuit needs no more than 12 AWG (250.122(A)),
    // so with 10 AWG phase conductors the grounding conductor must be 10 AWG.
    [Fact]
    public void M106_GroundUndersized()
    {
        var text = With(8, "    wire 10 AWG");
        var f = Single(text, FindingCodes.GroundUndersized);
        Assert.Equal("10:12-10:18 M106", Describe(f));
        Assert.Contains("250.122", f.Message);
        Assert.Contains("    ground 10 AWG\n", ApplyFix(text, f));
    }

    // Feeder: 430.24 -> 17.5 A; 14 AWG at 60 C (unmarked, non-motor terminations) = 15 A is short -> 12 AWG (20 A).
    [Fact]
    public void M107_FeederWireUndersized()
    {
        var text = With(1, "  wire 14 AWG");
        var f = Single(text, FindingCodes.FeederWireUndersized);
        Assert.Equal("2:8-2:14 M107", Describe(f));
        Assert.Contains("NEC 430.24", f.Message);
        Assert.Contains("  wire 12 AWG\n", ApplyFix(text, f));
    }

    // 430.62(A): largest branch device 35 A + no other motors = 35 A.
    [Fact]
    public void M108_FeederProtectionTooLarge()
    {
        var text = With(3, "  protection inverse-time-breaker 60A");
        var f = Single(text, FindingCodes.FeederProtectionTooLarge);
        Assert.Equal("4:35-4:38 M108", Describe(f));
        Assert.Contains("protection inverse-time-breaker 35A", ApplyFix(text, f));
    }

    // Chapter 9: 3 x 12 AWG THHN (0.0133) + 12 AWG ground = 0.0532 in2 fits 1/2 in EMT at 40 % (0.1216).
    // 3 x 4/0 THHN + ground would not: that test uses a larger motor. Here: 1/2 in holds 4 x 12 AWG; a
    // 100 hp motor (124 A, 155 A required -> 2/0 AWG) does not fit 1 in EMT.
    [Fact]
    public void M109_ConduitOverfilled()
    {
        var text = Text(
            "project \"P\"", "  conductor cu THHN 75C", "feeder F 480V 3ph", "  motor M 100hp", "    nameplate 120A", "    service-factor 1.15",
            "    wire 2/0 AWG", "    ground 6 AWG", "    protection inverse-time-breaker 300A", "    overload 150A", "    conduit 1in");
        var f = Single(text, FindingCodes.ConduitOverfilled);
        Assert.Equal("11:13-11:16 M109", Describe(f));
        Assert.Contains("Chapter 9 Table 1", f.Message);
        Assert.Contains("conduit 1-1/2in", ApplyFix(text, f));
    }

    [Fact]
    public void M110_VoltageMismatch()
    {
        var f = Single(With(4, "  motor M 10hp 230V"), FindingCodes.VoltageMismatch);
        Assert.Equal("5:16-5:20 M110", Describe(f));
        Assert.Equal(Severity.Error, f.Severity);
        var dc = Single(Text("feeder F 480V 3ph", "  motor M 10hp dc"), FindingCodes.VoltageMismatch);
        Assert.Contains("dc motor", dc.Message);
    }

    // 430.6(A): 3 hp has no 115 V three-phase value in Table 430.250.
    [Fact]
    public void M111_NeedsNameplate()
    {
        var f = Single(Text("feeder F 115V 3ph", "  motor M 3hp"), FindingCodes.NeedsNameplate);
        Assert.Equal("2:11-2:14 M111", Describe(f));
        Assert.Contains("nameplate", f.Message);
        Assert.DoesNotContain(Analyzer.Analyze(Text("feeder F 115V 3ph", "  motor M 3hp", "    nameplate 20A")).Findings, x => x.Code == FindingCodes.NeedsNameplate);
    }

    // Common practice, no source: a device under 125 % of FLC (17.5 A) trips on starting.
    [Fact]
    public void M201_ProtectionMayTrip()
    {
        var f = Single(With(10, "    protection inverse-time-breaker 15A"), FindingCodes.ProtectionMayTrip);
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Equal("11:37-11:40 M201", Describe(f));
    }

    // 14 A over 500 ft of 12 AWG in EMT at PF 0.85: Ze = 2.0 x 0.85 + 0.068 x 0.527 = 1.736; 1.732 x 14 x 1.736 x 0.5 = 21.0 V = 4.4 %.
    [Fact]
    public void M202_VoltageDropHigh()
    {
        var f = Single(Text([.. Base, "    length 500ft"]), FindingCodes.VoltageDropHigh);
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Contains("4.38 %", f.Message);
    }

    [Fact]
    public void M203_OverloadMissing()
    {
        var text = With(11, null);
        var f = Single(text, FindingCodes.OverloadMissing);
        Assert.Equal("5:3-5:8 M203", Describe(f));
        Assert.Contains("    overload 16.25A\n", ApplyFix(text, f));
    }

    [Fact]
    public void M204_CannotCheckWithoutNameplate()
    {
        var f = Single(With(5, "    service-factor 1.0").Replace("    service-factor 1.15\n", ""), FindingCodes.CannotCheck);
        Assert.Contains("nameplate", f.Message);
    }

    [Fact]
    public void M301_NotWrittenOffersTheSizes()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 10hp", "    nameplate 13A", "    design B");
        var all = Analyzer.Analyze(text).Findings.Where(f => f.Code == FindingCodes.NotWritten).ToList();
        Assert.Equal(Severity.Information, all[0].Severity);
        Assert.Contains(all, f => f.Message.Contains("14 AWG"));
        var sized = Parser.Text.TextEdits.Apply(text, Analyzer.Analyze(text).SizeEverything());
        Assert.Contains("    wire 14 AWG\n", sized);
        Assert.Contains("    protection inverse-time-breaker 35A\n", sized);
        Assert.Contains("    overload 14.95A\n", sized); // no service factor marked: 115 % x 13 A (430.32(A)(1))
        Assert.Contains("    ground 14 AWG\n", sized);    // 250.122(A): no larger than the 14 AWG circuit conductors
        Assert.Empty(Analyzer.Analyze(sized).Parse.Diagnostics);
    }

    [Fact]
    public void InheritedProblemsAreFixedAtTheirSource()
    {
        var text = Text([.. With(10, "    protection inverse-time-breaker 50A").TrimEnd('\n').Split('\n'), "  motor M2 10hp", "    like M"]);
        var findings = Analyzer.Analyze(text).Findings.Where(f => f.Code == FindingCodes.ProtectionTooLarge).ToList();
        Assert.Equal(2, findings.Count);
        Assert.NotNull(findings[0].Fix);
        Assert.Null(findings[1].Fix);
        Assert.Equal("14:10-14:11 M102", Describe(findings[1]));
        Assert.Contains("inherited from M", findings[1].Message);
    }

    // NFPA 70-2023 430.62(A) Exception No. 1: an instantaneous-trip branch breaker counts at the Table 430.52(C)(1)
    // percentage for the feeder's device type. Base motor 14 A (Table 430.250, 10 hp 480 V), squirrel cage not design B premium:
    // inverse-time breaker feeder: 250 % x 14 = 35 A -> 35 A (a standard rating, 240.6(A)); dual-element fuse feeder:
    // 175 % x 14 = 24.5 A -> 20 A (rounded down). At its instantaneous setting (800 % x 14 = 112 A) the limit would be 110 A.
    [Theory]
    [InlineData("  protection inverse-time-breaker 35A", 35)]
    [InlineData("  protection dual-element-fuse 20A", 20)]
    public void InstantaneousTripBranchBreakersCountAtTheAssumedRatingOnTheFeeder(string feederProtection, int expected)
    {
        var lines = Base.ToList();
        lines[3] = feederProtection;
        lines[10] = "    protection instantaneous-trip-breaker 100A listed-combination";
        // No feeder wire: the written 8 AWG carries more than 430.24 needs, and 430.62(B) would then allow up to its ampacity.
        lines.RemoveAt(1);
        var a = Analyzer.Analyze(Text([.. lines]));
        var feeder = a.Feeders.Values.Single();
        Assert.Equal(expected, feeder.MaximumProtection!.Value);
        Assert.Contains(feeder.MaximumProtection.Steps, s => s.Rule == "NEC 430.62(A) Exception No. 1");
        Assert.DoesNotContain(a.Findings, f => f.Code == FindingCodes.FeederProtectionTooLarge);
    }

    [Fact]
    public void M215_FeederDeviceNotSized()
    {
        // 430.52(C)(3): an instantaneous-trip breaker is permitted only in a listed combination controller on a motor branch.
        var text = With(3, "  protection instantaneous-trip-breaker 60A");
        var f = Single(text, FindingCodes.FeederDeviceNotSized);
        Assert.Equal("4:14-4:40 M215", Describe(f));
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Null(f.Fix);
        var a = Analyzer.Analyze(text);
        Assert.Null(a.Feeders.Values.Single().MaximumProtection!.Value);
        Assert.DoesNotContain(a.Findings, x => x.Code == FindingCodes.FeederProtectionTooLarge);
    }

    [Fact]
    public void ALoadWithNoCurrentLeavesItsFeederUnsizedAndSaysSo()
    {
        // 430.24(3) and (4) add every other load; one without amperes or kVA cannot be added, so no feeder size is given.
        var text = Text([.. Base, "  load L-1 \"Heaters\""]);
        var a = Analyzer.Analyze(text);
        var warnings = a.Findings.Where(f => f.Code == FindingCodes.CannotCheck).Select(Describe).ToList();
        Assert.Contains("13:3-13:7 M204", warnings);
        Assert.Contains("1:1-1:7 M204", warnings);
        var feeder = a.Feeders.Values.Single();
        Assert.Null(feeder.RequiredAmpacity);
        Assert.Null(feeder.MaximumProtection);
    }

    [Fact]
    public void AWireWithNoAmpacityAtThisAmbientIsNotPassedInSilence()
    {
        // Table 310.15(B)(1)(1): the 75 C column has no factor above 70 C ambient, so no 75 C conductor has an ampacity at 75 C.
        var text = Text(["project \"P\"", "  ambient 75C", .. Base]);
        var a = Analyzer.Analyze(text);
        var cannot = a.Findings.Where(f => f.Code == FindingCodes.CannotCheck).ToList();
        Assert.Contains(cannot, f => Describe(f) == "11:10-11:16 M204" && f.Message.Contains("75 °C ambient"));
        Assert.Contains(cannot, f => Describe(f) == "4:8-4:13 M204");
        Assert.DoesNotContain(a.Findings, f => f.Code is FindingCodes.WireUndersized or FindingCodes.FeederWireUndersized);
    }

    [Fact]
    public void M216_SuppliesAnotherVoltage()
    {
        // A 208 V panel supplied from a 480 V feeder is behind a transformer: its motors' currents (Table 430.250, 208 V column)
        // cannot be added to the 480 V feeder's, and its protection is a 450.3 question. The 208 V panel is still sized.
        var text = Text([.. Base, "feeder P 208V 3ph", "  from F", "  motor N 5hp"]);
        var f = Single(text, FindingCodes.SuppliesAnotherVoltage);
        Assert.Equal("1:1-1:7 M216", Describe(f));
        Assert.Null(f.Fix);
        var a = Analyzer.Analyze(text);
        Assert.Null(a.Feeders.Values.Single(x => x.Tag == "F").RequiredAmpacity);
        // 5 hp at 208 V: 16.7 A (Table 430.250); 430.24: 125 % = 20.88 A.
        Assert.Equal(20.875m, a.Feeders.Values.Single(x => x.Tag == "P").RequiredAmpacity!.Value);
    }

    [Fact]
    public void M216_NotOnTheFeederThatSuppliesAWrittenTransformer()
    {
        // The 208 V panel writes its transformer: the 480 V feeder carries the transformer, not the panel's 208 V currents.
        var text = Text([.. Base, "feeder P 208V 3ph", "  from F", "  transformer 75kVA 480V 208V 5% x/r 4", "  motor N 5hp"]);
        var a = Analyzer.Analyze(text);
        Assert.DoesNotContain(a.Findings, x => x.Code == FindingCodes.SuppliesAnotherVoltage);
        var f = a.Feeders.Values.Single(x => x.Tag == "F");
        var without = Analyzer.Analyze(Text(Base)).Feeders.Values.Single(x => x.Tag == "F");
        // Rated primary current 75,000 VA ÷ (√3 × 480 V) = 90.21 A, counted as a continuous load (the conservative
        // reading, docs/checks.md M216): 430.24 adds 125 % of 90.211 A = 112.76 A; the running load adds 90.21 A.
        Assert.Equal(112.76m, decimal.Round(f.RequiredAmpacity!.Value!.Value - without.RequiredAmpacity!.Value!.Value, 2));
        Assert.Equal(90.21m, decimal.Round(f.CalculatedLoad - without.CalculatedLoad, 2));
        // A single-phase 25 kVA transformer on the same feeder draws 25,000 ÷ 480 = 52.08 A.
        var single = Analyzer.Analyze(Text([.. Base, "feeder Q 240V 1ph", "  from F", "  transformer 25kVA 480V 240V 3% x/r 2", "  motor N 2hp"]));
        Assert.DoesNotContain(single.Findings, x => x.Code == FindingCodes.SuppliesAnotherVoltage);
        Assert.Equal(52.08m, decimal.Round(single.Feeders.Values.Single(x => x.Tag == "F").CalculatedLoad - without.CalculatedLoad, 2));
        // A transformer whose primary is not the feeder's voltage says nothing about what it draws here: still M216.
        var wrong = Analyzer.Analyze(Text([.. Base, "feeder P 208V 3ph", "  from F", "  transformer 75kVA 600V 208V 5% x/r 4", "  motor N 5hp"]));
        Assert.Contains(wrong.Findings, x => x.Code == FindingCodes.SuppliesAnotherVoltage);
        // A fire pump behind the transformer keeps the feeder unsized (695.4(B)(2) needs every part).
        var fire = Analyzer.Analyze(Text([.. Base, "feeder P 208V 3ph", "  from F", "  transformer 75kVA 480V 208V 5% x/r 4", "  motor N 5hp", "    fire-service pump"]));
        Assert.Contains(fire.Findings, x => x.Code == FindingCodes.SuppliesAnotherVoltage);
    }
}
