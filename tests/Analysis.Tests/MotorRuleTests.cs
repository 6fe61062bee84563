using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>430.62(B), 430.24 Exception No. 1, drives (430.122, 430.124, 430.128) and part-winding motors (430.4).</summary>
public class MotorRuleTests
{
    // One 40 hp 480 V motor: 52 A (Table 430.250). 430.24: 65 A. 430.62(A): 250 % × 52 = 130 A → branch
    // maximum 150 A, so the feeder may have 150 A. 500 kcmil Cu at 75 °C carries 380 A (Table 310.16),
    // more than 65 A: 430.62(B) lets the device go to 350 A, the largest standard rating not above 380 A.
    private static string Feeder(string protection, string ground = "") => Text(
        "feeder F 480V 3ph",
        "  wire 500 kcmil",
        protection,
        ground,
        "  motor M 40hp",
        "    protection inverse-time-breaker 150A");

    [Fact]
    public void Rule430_62B_ProtectionBasedOnLargerConductors()
    {
        Assert.DoesNotContain(Analyzer.Analyze(Feeder("  protection inverse-time-breaker 350A")).Findings, f => f.Code == FindingCodes.FeederProtectionTooLarge);
        var text = Feeder("  protection inverse-time-breaker 400A");
        var f = Single(text, FindingCodes.FeederProtectionTooLarge);
        Assert.Contains("protection inverse-time-breaker 350A", ApplyFix(text, f));
    }

    // size keeps the 350 A device and writes the grounding conductor for it: Table 250.122, 400 A row → 3 AWG Cu.
    [Fact]
    public void Rule430_62B_SizeKeepsTheDeviceAndGroundsForIt()
    {
        var sized = SizeAll.Apply(Feeder("  protection inverse-time-breaker 350A"));
        Assert.Contains("  protection inverse-time-breaker 350A\n", sized);
        Assert.Contains("  ground 3 AWG\n", sized);
    }

    // 430.24 Exception No. 1. D: 20 hp (27 A, Table 430.250), intermittent duty, 5-minute rated, nameplate 24 A:
    // 85 % × 24 = 20.4 A (Table 430.22(E)). C: 15 hp continuous, 21 A. D is the highest rated (430.17), so it
    // counts at the greater of 20.4 A and 125 % × 21 = 26.25 A; plus C's 21 A: 47.25 A (not 41.4 A).
    [Fact]
    public void Rule430_24_ExceptionNo1_HighestRatedDutyCycleMotor()
    {
        var text = Text(
            "feeder F 480V 3ph",
            "  motor D 20hp",
            "    nameplate 24A",
            "    duty intermittent 5min",
            "  motor C 15hp");
        var feeder = Analyzer.Analyze(text).Feeders.Values.Single();
        Assert.Equal(47.25m, feeder.RequiredAmpacity!.Value);
    }

    // 430.128: 115 % × 18 A drive input = 20.7 A; a 20 A disconnect is too small (115 % of the motor's 14 A would pass).
    // 430.122(A): conductors for 125 % × 18 A = 22.5 A.
    [Fact]
    public void Drive_DisconnectFromInputCurrent_ConductorsFromInputCurrent()
    {
        var text = Text([.. Base, "    starting drive 18A", "    disconnect 20A"]);
        var f = Single(text, FindingCodes.DisconnectTooSmall);
        Assert.Contains("20.7 A", f.Message);
        Assert.Contains("430.128", f.Message);
        Assert.Equal(22.5m, Analyzer.Analyze(text).Motors.Values.Single().RequiredAmpacity!.Value);
    }

    // 430.124(A): a drive marked as providing overload protection needs no separate overload (no M203).
    [Fact]
    public void Drive_ProvidingOverloadProtection_NoMissingOverloadWarning()
    {
        var without = Text([.. Base.Where(l => !l.Contains("overload")), "    starting drive 18A"]);
        Assert.Contains(Analyzer.Analyze(without).Findings, f => f.Code == FindingCodes.OverloadMissing);
        var marked = Text([.. Base.Where(l => !l.Contains("overload")), "    starting drive 18A", "    drive-overload"]);
        Assert.DoesNotContain(Analyzer.Analyze(marked).Findings, f => f.Code == FindingCodes.OverloadMissing);
        // Without 'starting drive' the statement cannot stand for a drive: the overload is still asked for.
        var noDrive = Text([.. Base.Where(l => !l.Contains("overload")), "    drive-overload"]);
        Assert.Contains(Analyzer.Analyze(noDrive).Findings, f => f.Code == FindingCodes.OverloadMissing);
    }

    // 430.4, 100 hp 480 V part-winding motor, 124 A (Table 430.250). Time-delay fuse: 175 % × 124 = 217 A → 225 A
    // (Table 430.52(C)(1), 430.52(C)(1)(a)). Per winding: ½ × 225 = 112.5 A → 110 A. Both windings (430.4
    // Exception): 150 % × 124 = 186 A → 175 A.
    private static string PartWinding(string protection, string extra = "") => Text(
        "feeder F 480V 3ph",
        "  motor M 100hp",
        "    starting part-winding",
        "    wire 2/0 AWG",
        protection + extra);

    [Fact]
    public void M117_PartWindingTimeDelayFuse()
    {
        var perWinding = PartWinding("    protection dual-element-fuse 225A");
        var f = Single(perWinding, FindingCodes.PartWindingProtectionTooLarge);
        Assert.Equal("5:34-5:38 M117", Describe(f));
        Assert.Contains("110 A", f.Message);
        Assert.Contains("430.4", f.Message);
        Assert.Contains("protection dual-element-fuse 110A", ApplyFix(perWinding, f));

        var both = PartWinding("    protection dual-element-fuse 225A both-windings");
        var g = Single(both, FindingCodes.PartWindingProtectionTooLarge);
        Assert.Contains("175 A", g.Message);
        Assert.Contains("protection dual-element-fuse 175A both-windings", ApplyFix(both, g));
    }

    // One inverse-time breaker for both windings: 430.4 sets no other ceiling, so the 430.52 maximum
    // (250 % × 124 = 310 A → 350 A) still applies (conservative reading): 350 A passes, 400 A does not.
    [Fact]
    public void PartWinding_OneBreakerForBothWindings()
    {
        Assert.DoesNotContain(Analyzer.Analyze(PartWinding("    protection inverse-time-breaker 350A both-windings")).Findings,
            f => f.Code is FindingCodes.PartWindingProtectionTooLarge or FindingCodes.ProtectionTooLarge);
        Single(PartWinding("    protection inverse-time-breaker 400A both-windings"), FindingCodes.PartWindingProtectionTooLarge);
    }

    // 430.4: separate overloads trip at one half of 430.32: nameplate 120 A, SF 1.15 → 125 % = 150 A → 75 A per winding;
    // 430.32(C) 140 % = 168 A → 84 A per winding. 100 A is above even that.
    [Fact]
    public void PartWinding_OverloadsAtOneHalf()
    {
        var text = PartWinding("    protection dual-element-fuse 110A", "\n    nameplate 120A\n    service-factor 1.15\n    overload 100A");
        var f = Single(text, FindingCodes.OverloadTooLarge);
        Assert.Contains("overload 75A", ApplyFix(text, f));
        Assert.DoesNotContain(Analyzer.Analyze(text.Replace("overload 100A", "overload 150A both-windings")).Findings,
            x => x.Code is FindingCodes.OverloadTooLarge or FindingCodes.OverloadAboveRunningLimit);
    }
}
