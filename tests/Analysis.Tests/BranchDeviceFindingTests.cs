using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Findings for the branch devices of 430.52(C)(3), (C)(5)-(7) and the Class CC fuse (NFPA 70-2023).</summary>
public class BranchDeviceFindingTests
{
    // NFPA 70-2023 430.52(C)(3): an instantaneous-trip breaker only as part of a listed combination motor controller.
    // Trap: the general table would let it be set to 800 % x 14 A = 112 A and call 100 A correct.
    [Fact]
    public void M150_InstantaneousTripBreakerOutsideAListedCombination()
    {
        var text = With(10, "    protection instantaneous-trip-breaker 100A");
        var f = Single(text, FindingCodes.NotInListedCombination);
        Assert.Equal("11:16-11:42 M150", Describe(f));
        Assert.Equal(Severity.Error, f.Severity);
        Assert.Contains("NEC 430.52(C)(3)", f.Message);
        Assert.Null(f.Fix);
        var motor = Analyzer.Analyze(text).Motors.Values.Single();
        Assert.Null(motor.MaximumProtection!.Value);

        // Stated to be in a listed combination: 800 % x 14 A = 112 A (Table 430.52(C)(1)), so 100 A passes and 120 A does not.
        Assert.DoesNotContain(Analyzer.Analyze(With(10, "    protection instantaneous-trip-breaker 100A listed-combination")).Findings,
            x => x.Code is FindingCodes.NotInListedCombination or FindingCodes.ProtectionTooLarge);
        var tooHigh = Single(With(10, "    protection instantaneous-trip-breaker 120A listed-combination"), FindingCodes.ProtectionTooLarge);
        Assert.Contains("112 A", tooHigh.Message);
        Assert.Contains("NEC 430.52(C)(3)", tooHigh.Message);
    }

    // NFPA 70-2023 430.52(C)(7): a motor short-circuit protector, too, only in a listed combination motor controller.
    [Fact]
    public void M150_MotorShortCircuitProtectorOutsideAListedCombination()
    {
        var f = Single(With(10, "    protection motor-short-circuit-protector 150A"), FindingCodes.NotInListedCombination);
        Assert.Contains("NEC 430.52(C)(7)", f.Message);
        // Listed: 1300 % x 14 A = 182 A (430.52(C)(7)); 190 A is above it and the fix writes the whole-ampere setting.
        var text = With(10, "    protection motor-short-circuit-protector 190A listed-combination");
        var tooHigh = Single(text, FindingCodes.ProtectionTooLarge);
        Assert.Contains("NEC 430.52(C)(7)", tooHigh.Message);
        Assert.Contains("protection motor-short-circuit-protector 182A listed-combination", ApplyFix(text, tooHigh));
    }

    // NFPA 70-2023 430.52(C)(5): semiconductor fuses are rated as marked; said, not checked.
    [Fact]
    public void M151_SemiconductorFuseNotChecked()
    {
        var f = Single(With(10, "    protection semiconductor-fuse 40A"), FindingCodes.SemiconductorFuseNotChecked);
        Assert.Equal("11:16-11:34 M151", Describe(f));
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Contains("430.52(C)(5)", f.Message);
        var a = Analyzer.Analyze(With(10, "    protection semiconductor-fuse 40A"));
        Assert.DoesNotContain(a.Findings, x => x.Code == FindingCodes.ProtectionTooLarge);
        // 250.122(D)(1) from the 40 A written: Table 250.122 (60 A row) 10 AWG, capped by 250.122(A) at the 12 AWG phase conductors.
        var ground = a.Motors.Values.Single().MinimumGround!;
        Assert.Equal("12 AWG", ground.Value.ToString());
        Assert.Contains(ground.Steps, s => s.Rule == "NEC Table 250.122" && s.Note.Contains("250.122(D)(1)"));
        Assert.Contains(ground.Steps, s => s.Rule == "NEC 250.122(A)");
    }

    // 'class-cc' on a breaker means nothing; it is said and ignored (the breaker keeps its 250 % x 14 A = 35 A).
    [Fact]
    public void M152_ClassCcOnABreaker()
    {
        var text = With(10, "    protection inverse-time-breaker 35A class-cc");
        var f = Single(text, FindingCodes.ClassCcNotAFuse);
        Assert.Equal("11:41-11:49 M152", Describe(f));
        Assert.Equal(35m, Analyzer.Analyze(text).Motors.Values.Single().MaximumProtection!.Value);
    }

    // Time-delay Class CC: Table 430.52(C)(1) note 1, the non-time-delay column. 300 % x 14 A = 42 A -> 45 A
    // (430.52(C)(1)(a)); an ordinary time-delay fuse 175 % = 24.5 A -> 25 A. So 45 A passes only as class-cc.
    [Fact]
    public void ClassCcTimeDelayFuseIsNotFlagged()
    {
        Assert.DoesNotContain(Analyzer.Analyze(With(10, "    protection dual-element-fuse 45A class-cc")).Findings,
            x => x.Code == FindingCodes.ProtectionTooLarge);
        Assert.Contains("25 A", Single(With(10, "    protection dual-element-fuse 45A"), FindingCodes.ProtectionTooLarge).Message);
    }

    // NFPA 70-2023 430.62(A) Exception No. 1: a motor short-circuit protector counts at the feeder device's table
    // percentage: inverse-time breaker feeder, 250 % x 14 A = 35 A, so the feeder limit is 35 A (not 182 A).
    // A self-protected controller is counted the same way (conservative reading, docs/checks.md).
    [Theory]
    [InlineData("    protection motor-short-circuit-protector 150A listed-combination")]
    [InlineData("    protection self-protected-controller 150A")]
    public void DevicesInLieuCountAtTheAssumedRatingOnTheFeeder(string branch)
    {
        var lines = Base.ToList();
        lines[10] = branch;
        lines.RemoveAt(1);
        var feeder = Analyzer.Analyze(Text([.. lines])).Feeders.Values.Single();
        Assert.Equal(35m, feeder.MaximumProtection!.Value);
        Assert.Contains(feeder.MaximumProtection.Steps, s => s.Rule == "NEC 430.62(A) Exception No. 1");
    }

    // A feeder protected by a branch-only device gets no 430.62 limit, and says so.
    [Fact]
    public void BranchOnlyDeviceOnAFeederIsNotSized()
    {
        var f = Single(With(3, "  protection self-protected-controller 60A"), FindingCodes.FeederDeviceNotSized);
        Assert.Contains("430.62", f.Message);
    }
}
