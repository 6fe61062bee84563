using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Motor control circuits (NFPA 70-2023 430.72) and overload units (430.37) through the analyzer; hand calculations beside each check.</summary>
public class ControlCircuitFindingTests
{
    // 30 hp 460 V on 480 V: Table 430.250 40 A. Inverse-time breaker 250 % × 40 = 100 A (Table 430.52(C)(1)). Nameplate 38 A, SF 1.15.
    private static string Motor(params string[] lines) => Text([
        "feeder F 480V 3ph",
        "  motor M 30hp 460V",
        "    nameplate 38A",
        "    service-factor 1.15",
        "    design B",
        "    wire 6 AWG",
        "    ground 8 AWG",
        "    protection inverse-time-breaker 100A",
        "    overload 47A",
        .. lines]);

    private static IEnumerable<Finding> ControlFindings(string text) => Analyzer.Analyze(text).Findings
        .Where(f => f.Code is "M170" or "M171" or "M172" or "M173" or "M174" or "M175" or "M176");

    // NFPA 70-2023 430.72(B)(2), Table 430.72(B) Column C: 14 AWG copper leaving the enclosure, protected only by the
    // motor branch device, at most 45 A; the 100 A breaker is too large. The fix adds a control device at Column A, 15 A.
    [Fact]
    public void BranchDeviceTooLargeForControlConductorsLeavingTheEnclosure()
    {
        var text = Motor("    control-wire 14 AWG");
        var f = Single(text, FindingCodes.ControlBranchDeviceTooLarge);
        Assert.Contains("45 A", f.Message);
        var fixedText = ApplyFix(text, f);
        Assert.Contains("    control-protection 15A\n", fixedText);
        Assert.Empty(ControlFindings(fixedText));
    }

    // Trap: the same 14 AWG within the enclosure (Column B, 100 A) on the 100 A breaker is allowed, although the
    // conductor's ampacity (15 A) is far below it.
    [Fact]
    public void FourteenAwgWithinTheEnclosureOnTheHundredAmpBranchIsAllowed()
    {
        Assert.Empty(ControlFindings(Motor("    control-wire 14 AWG cu in-enclosure")));
        var r = Analyzer.Analyze(Motor("    control-wire 14 AWG cu in-enclosure")).Motors.Values.Single();
        Assert.Equal(100m, r.ControlConductorLimit!.Value);
        Assert.Contains(r.ControlConductorLimit.Steps, s => s.Rule == "NEC 430.72(B)(2), Table 430.72(B) Column B");
    }

    // 430.72(B)(1), Column A: 14 AWG copper with its own 20 A device; Note 1, the 60 °C ampacity, 15 A. Fix: 15 A.
    [Fact]
    public void SeparateDeviceAboveColumnA()
    {
        var text = Motor("    control-wire 14 AWG", "    control-protection 20A");
        var f = Single(text, FindingCodes.ControlProtectionTooLarge);
        Assert.Contains("15 A", f.Message);
        Assert.Contains("control-protection 15A", ApplyFix(text, f));
        Assert.Empty(ControlFindings(Motor("    control-wire 16 AWG", "    control-protection 10A")));
    }

    // 430.72(C)(4): 150 VA at 480 V is 0.3125 A; under 2 A the primary may be 500 % = 1.5625 A. A 2 A fuse is too large,
    // 1.5 A is not (Table 450.3(B) alone would give 300 % = 0.94 A: trap).
    [Fact]
    public void ControlTransformerPrimaryDevice()
    {
        var f = Single(Motor("    control-transformer 150VA 480V 120V", "    control-primary-protection 2A", "    control-protection 2A", "    control-wire 14 AWG"),
            FindingCodes.ControlTransformerPrimaryTooLarge);
        Assert.Contains("1.56 A", f.Message);
        Assert.Empty(ControlFindings(Motor("    control-transformer 150VA 480V 120V", "    control-primary-protection 1.5A", "    control-protection 2A", "    control-wire 14 AWG")));
    }

    // 430.72(B) Exception No. 2: 500 VA, 480 V to 120 V, 14 AWG secondary with no device of its own: the primary device at
    // most 15 A × 120 / 480 = 3.75 A. The 5 A primary is within 430.72(C) (1.0417 A × 500 % = 5.21 A) but not within 3.75 A.
    // The fix adds a 15 A secondary device; then the secondary conductors are protected by it (Column A) and the primary
    // stays within its 5.21 A.
    [Fact]
    public void SecondaryConductorsProtectedByThePrimaryDevice()
    {
        var text = Motor("    control-transformer 500VA 480V 120V", "    control-primary-protection 5A", "    control-wire 14 AWG");
        var f = Single(text, FindingCodes.ControlSecondaryUnprotected);
        Assert.Contains("3.75 A", f.Message);
        var fixedText = ApplyFix(text, f);
        Assert.Contains("    control-protection 15A\n", fixedText);
        Assert.Empty(ControlFindings(fixedText));
        Assert.Empty(ControlFindings(Motor("    control-transformer 500VA 480V 120V", "    control-primary-protection 3.5A", "    control-wire 14 AWG")));
    }

    // 430.72(C): no primary device written is a warning (430.72(C)(3) and (C)(5) permit other means), with the maximum.
    [Fact]
    public void ControlTransformerWithoutPrimaryDevice()
    {
        var f = Single(Motor("    control-transformer 100VA 480V 120V", "    control-protection 1A", "    control-wire 14 AWG"), FindingCodes.ControlTransformerUnprotected);
        Assert.Equal(Parser.Diagnostics.Severity.Warning, f.Severity);
        // 100 / 480 = 0.2083 A; secondary 100 / 120 = 0.833 A, 167 % = 1.39 A, so the 1 A secondary is within and 250 %
        // applies (0.52 A); 430.72(C)(4) 500 % = 1.04 A is larger.
        Assert.Contains("1.04 A", f.Message);
        Assert.Contains("430.72(C)(5)", f.Message);
        Assert.Contains("430.72(C)(3)", Single(Motor("    control-transformer 40VA 480V 120V"), FindingCodes.ControlTransformerUnprotected).Message);
    }

    [Fact]
    public void ControlProtectionWithoutConductorsCannotBeChecked()
    {
        var f = Single(Motor("    control-protection 10A"), FindingCodes.ControlCircuitNotChecked);
        Assert.Contains("control-wire", f.Message);
        // 14 AWG aluminum has no Table 430.72(B) value.
        Assert.Contains("aluminum", Single(Motor("    control-wire 14 AWG al", "    control-protection 10A"), FindingCodes.ControlCircuitNotChecked).Message);
    }

    // The hover shows the control conductors' and the transformer's calculation with their rules.
    [Fact]
    public void HoverShowsTheControlCircuit()
    {
        var r = Analyzer.Analyze(Motor("    control-transformer 150VA 480V 120V", "    control-primary-protection 1.5A", "    control-protection 2A", "    control-wire 14 AWG")).Motors.Values.Single();
        var sections = Breakdown.MotorSections(r).ToList();
        var conductors = sections.Single(s => s.Heading == "Control conductors");
        Assert.Contains(conductors.Steps, s => s.Rule.Contains("Table 430.72(B) Column A"));
        Assert.StartsWith("✓", conductors.Verdict);
        var transformer = sections.Single(s => s.Heading == "Control transformer");
        Assert.Contains(transformer.Steps, s => s.Rule == "NEC 430.72(C)(4)");
        Assert.StartsWith("✓", transformer.Verdict);
        // 430.72 is no longer listed as not checked on this motor; 430.73–430.75 still are.
        var notChecked = CircuitCoverage.For(r).NotChecked.Select(n => n.Rule).ToList();
        Assert.DoesNotContain("430.72", notChecked);
        Assert.Contains("430.73–430.75", notChecked);
        Assert.Contains("430.72(B)", notChecked);
    }

    // NFPA 70-2023 Table 430.37: a three-phase motor needs three overload units; two are an error, fixed to 3.
    [Fact]
    public void TooFewOverloadUnits()
    {
        var text = Motor("    overload-units 2");
        var f = Single(text, FindingCodes.TooFewOverloadUnits);
        Assert.Contains("Table 430.37", f.Message);
        Assert.Contains("overload-units 3", ApplyFix(text, f));
        var r = Analyzer.Analyze(Motor("    overload-units 3")).Motors.Values.Single();
        Assert.DoesNotContain("430.37", CircuitCoverage.For(r).NotChecked.Select(n => n.Rule));
        Assert.Contains("430.37", CircuitCoverage.For(Analyzer.Analyze(Motor()).Motors.Values.Single()).NotChecked.Select(n => n.Rule));
    }

    // Single-phase: one unit is enough (Table 430.37, 1-phase ac row). 2 hp 230 V single-phase: Table 430.248 12 A.
    [Fact]
    public void OneUnitForASinglePhaseMotor()
    {
        var text = Text("feeder F 240V 1ph", "  motor M 2hp 230V 1ph", "    nameplate 11.5A", "    overload 13A", "    overload-units 1");
        Assert.Empty(ControlFindings(text));
    }

    // size writes the control device and the overload units, and afterwards nothing of this block is left.
    [Fact]
    public void SizeLeavesNoControlFinding()
    {
        var sized = SizeAll.Apply(Motor("    control-wire 14 AWG", "    overload-units 1"));
        Assert.Contains("control-protection 15A", sized);
        Assert.Contains("overload-units 3", sized);
        Assert.Empty(ControlFindings(sized));
    }

    // A fire pump's control circuit is not checked (430.72(B) Exception No. 1, 695.14): said, not passed.
    [Fact]
    public void FirePumpControlCircuitIsNotChecked()
    {
        var text = Text("feeder F 480V 3ph", "  motor FP 50hp 460V", "    fire-service pump", "    control-wire 14 AWG");
        Assert.Contains("fire pump", Single(text, FindingCodes.ControlCircuitNotChecked).Message);
    }
}
