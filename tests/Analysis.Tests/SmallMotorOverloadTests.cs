using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Overloads of motors of 1 hp or less (NFPA 70-2023 430.32(B), (D)) and wye-delta overloads in the delta leads.</summary>
public class SmallMotorOverloadTests
{
    // 3/4 hp 460 V three-phase (Table 430.250 1.6 A), nameplate 1.4 A, no service factor: 430.32(B)(1) 115 % × 1.4 = 1.61 A.
    private static string ThreeQuarter(params string[] lines) => Text(["feeder F 480V 3ph", "  motor CV 3/4hp 460V", "    nameplate 1.4A", .. lines]);

    // 1/2 hp 115 V single-phase (Table 430.248 9.8 A), nameplate 9.2 A.
    private static string Half(params string[] lines) => Text(["feeder F 120V 1ph", "  motor FN 1/2hp 115V 1ph", "    nameplate 9.2A", .. lines]);

    [Fact]
    public void AutomaticallyStartedSmallMotorFollows430_32B1()
    {
        var f = Single(ThreeQuarter(), FindingCodes.OverloadMissing);
        Assert.Contains("430.32(B)(1)", f.Message);
        Assert.Contains("1.61 A", f.Message);
        var r = Analyzer.Analyze(ThreeQuarter("    overload 1.6A")).Motors.Values.Single();
        Assert.Equal(1.61m, r.OverloadLimit!.Value);
        Assert.Contains(r.OverloadLimit.Steps, s => s.Rule == "NEC 430.32(B)(1)" && s.Value == "1.61 A");
        Assert.DoesNotContain(r.OverloadLimit.Steps, s => s.Rule == "NEC 430.32(A)(1)");
        // 430.32(C) still caps it: 130 % × 1.4 = 1.82 A; 1.9 A is above even that.
        Assert.Contains("430.32(B)(1)", Single(ThreeQuarter("    overload 1.9A"), FindingCodes.OverloadTooLarge).Message);
    }

    // 430.32(D)(2)(a): manually started, not permanently installed, within sight from the controller: the branch device
    // may serve as the overload, so no M203.
    [Fact]
    public void PortableWithinSightNeedsNoSeparateOverload()
    {
        var text = Half("    manual-start portable within-sight");
        Assert.DoesNotContain(Analyzer.Analyze(text).Findings, f => f.Code == FindingCodes.OverloadMissing);
        var r = Analyzer.Analyze(text).Motors.Values.Single();
        Assert.Contains(r.NoOverloadRequired!.Steps, s => s.Rule == "NEC 430.32(D)(2)(a)");
        Assert.Contains("430.32(D)(2)(a)", Breakdown.MotorSections(r).Single(s => s.Heading == "Overload").Verdict);
    }

    // Traps: within sight but permanently installed (430.32(D)(1)), or portable but out of sight (430.32(D)(2)(b)), is
    // protected as 430.32(B) says: the overload is still required (115 % × 9.2 = 10.58 A).
    [Fact]
    public void OtherManuallyStartedSmallMotorsStillNeedAnOverload()
    {
        var fixed1 = Single(Half("    manual-start within-sight"), FindingCodes.OverloadMissing);
        Assert.Contains("430.32(D)(1)", fixed1.Message);
        Assert.Contains("10.58 A", fixed1.Message);
        Assert.Contains("430.32(D)(2)(b)", Single(Half("    manual-start portable"), FindingCodes.OverloadMissing).Message);
    }

    [Fact]
    public void ManualStartOnALargerMotorIsNotUsed()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 5hp", "    nameplate 7A", "    overload 8A", "    manual-start portable within-sight");
        Assert.Contains("430.32(D)", Single(text, FindingCodes.NotUsedHere).Message);
    }

    // A motor over 1 hp keeps 430.32(A)(1).
    [Fact]
    public void LargerMotorsKeep430_32A1() =>
        Assert.Contains("430.32(A)(1)", Single(Text("feeder F 480V 3ph", "  motor M 5hp", "    nameplate 7A"), FindingCodes.OverloadMissing).Message);

    // Wye-delta overload in the delta leads (430.22(C) Informational Note; 430.32(A)(1), (C)): 50 hp 460 V, nameplate 62 A,
    // SF 1.15. Line value 125 % × 62 = 77.5 A; in the leads × 1/√3 = 44.74 A; 430.32(C) 140 % × 62 / √3 = 50.11 A.
    [Fact]
    public void WyeDeltaOverloadInTheDeltaLeads()
    {
        string M(string overload) => Text("feeder F 480V 3ph", "  motor M 50hp 460V", "    nameplate 62A", "    service-factor 1.15", "    starting wye-delta", $"    {overload}");
        Assert.Contains("44.74 A", Single(M("overload 46A delta-leads"), FindingCodes.OverloadAboveRunningLimit).Message);
        Assert.DoesNotContain(Analyzer.Analyze(M("overload 44A delta-leads")).Findings, f => f.Code is FindingCodes.OverloadAboveRunningLimit or FindingCodes.OverloadTooLarge);
        // Trap: a relay set for the line current (77 A) with no location written is taken to be in the leads: above 50.11 A.
        Assert.Contains("50.11 A", Single(M("overload 77A"), FindingCodes.OverloadTooLarge).Message);
        Assert.DoesNotContain(Analyzer.Analyze(M("overload 77A line-leads")).Findings, f => f.Code is FindingCodes.OverloadAboveRunningLimit or FindingCodes.OverloadTooLarge);
    }
}

/// <summary>NFPA 70-2023 430.32(D)(2)(a) Exception: a small portable motor within sight on a 120 V branch circuit at not over 20 A.</summary>
public class SmallMotorTwentyAmpCircuitTests
{
    // 1/6 hp 115 V single-phase: Table 430.248 4.4 A. 430.52 inverse-time breaker 250 % x 4.4 = 11 A -> next standard 15 A.
    private static string Sixth(string volts, string feederVolts, string breaker, params string[] lines) =>
        Text([$"feeder F {feederVolts} 1ph", $"  motor FN 1/6hp {volts} 1ph", "    nameplate 4.2A", $"    protection inverse-time-breaker {breaker}", .. lines]);

    [Fact]
    public void TwentyAmpBreakerIsPermittedForAPortableMotorWithinSight()
    {
        // Trap: the general rule (430.52: at most 15 A) flags the 20 A breaker.
        Assert.Contains("15 A", Single(Sixth("115V", "120V", "20A"), FindingCodes.ProtectionTooLarge).Message);
        var text = Sixth("115V", "120V", "20A", "    manual-start portable within-sight");
        var a = Analyzer.Analyze(text);
        Assert.DoesNotContain(a.Findings, f => f.Code == FindingCodes.ProtectionTooLarge);
        var section = Breakdown.MotorSections(a.Motors.Values.Single()).Single(s => s.Heading == "Short-circuit and ground-fault protection");
        Assert.Contains(section.Steps, s => s.Rule == "NEC 430.32(D)(2)(a) Exception");
        Assert.StartsWith("✓", section.Verdict);
    }

    [Fact]
    public void TheExceptionStopsAtTwentyAmpsAndAtOneHundredTwentyVolts()
    {
        Assert.Contains("15 A", Single(Sixth("115V", "120V", "25A", "    manual-start portable within-sight"), FindingCodes.ProtectionTooLarge).Message);
        // 1/6 hp 230 V: Table 430.248 2.2 A, 250 % = 5.5 A -> 10 A (the next standard rating, Table 240.6(A) 2023); a 240 V circuit is not a 120 V one.
        Assert.Single(Analyzer.Analyze(Sixth("230V", "240V", "20A", "    manual-start portable within-sight")).Findings, f => f.Code == FindingCodes.ProtectionTooLarge);
        // Permanently installed: no exception.
        Assert.Single(Analyzer.Analyze(Sixth("115V", "120V", "20A", "    manual-start within-sight")).Findings, f => f.Code == FindingCodes.ProtectionTooLarge);
    }
}
