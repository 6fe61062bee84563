using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Branch devices beyond the four Table 430.52(C)(1) columns, and the fuse class the table's note
/// treats apart. Hand calculations written out beside each check (NFPA 70-2023 numbering).
/// </summary>
public class BranchDeviceTests
{
    // NFPA 70-2023 430.52(C)(7): a motor short-circuit protector may open at no more than 1300 % of
    // full-load current, 1700 % for design B energy-efficient and premium efficiency motors.
    // Hand calculation: 10 hp 460 V, Table 430.250 14 A: 14 x 13 = 182 A; design B premium 14 x 17 = 238 A.
    // Not rounded to a standard rating: it is a setting.
    [Fact]
    public void MotorShortCircuitProtector()
    {
        var ordinary = ShortCircuitProtection.Maximum(new ProtectionInput(14m, ProtectiveDevice.MotorShortCircuitProtector, Phases.Three));
        Assert.Equal(182m, ordinary.Value);
        Assert.Contains(ordinary.Steps, s => s.Rule == "NEC 430.52(C)(7)");
        var premium = ShortCircuitProtection.Maximum(new ProtectionInput(14m, ProtectiveDevice.MotorShortCircuitProtector, Phases.Three,
            Design: DesignLetter.B, Efficiency: Efficiency.Premium));
        Assert.Equal(238m, premium.Value);
    }

    // NFPA 70-2023 430.52(C)(6): self-protected combination controller, adjustable instantaneous setting at
    // most 1300 % (1700 % design B EE/premium). Hand calculation: 7.6 A (5 hp 460 V, Table 430.250) x 13 = 98.8 A.
    // Trap: the general Table 430.52(C)(1) rule would give an inverse-time breaker 250 % -> 19 A -> 20 A; the
    // controller is not held to that.
    [Fact]
    public void SelfProtectedCombinationController()
    {
        var r = ShortCircuitProtection.Maximum(new ProtectionInput(7.6m, ProtectiveDevice.SelfProtectedController, Phases.Three));
        Assert.Equal(98.8m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC 430.52(C)(6)");
    }

    // NFPA 70-2023 430.52(C)(5): fuses for power electronic devices are rated as marked beside them; the
    // code gives no percentage, so no maximum is computed (never a guess from another column).
    [Fact]
    public void SemiconductorFusesHaveNoCodeMaximum()
    {
        var r = ShortCircuitProtection.Maximum(new ProtectionInput(14m, ProtectiveDevice.SemiconductorFuse, Phases.Three));
        Assert.Null(r.Value);
        Assert.Contains("430.52(C)(5)", r.Unavailable);
    }

    // NFPA 70-2023 Table 430.52(C)(1), note 1: the non-time-delay fuse column applies to time-delay Class CC
    // fuses. Hand calculation: 3 hp 460 V, 4.8 A (Table 430.250). Ordinary time-delay fuse 175 % = 8.4 A -> 10 A
    // (430.52(C)(1)(a), 240.6(A)). Class CC time-delay 300 % = 14.4 A -> 15 A.
    // 430.52(C)(1)(b)(1): a time-delay Class CC fuse may go to 400 % where it will not start the motor:
    // 19.2 A -> 15 A (rounded down, 240.6(A)); any other time-delay fuse 225 % = 10.8 A -> 10 A, and the
    // table 10 A stays permitted.
    [Fact]
    public void TimeDelayClassCcFuseTakesTheNonTimeDelayColumn()
    {
        Assert.Equal(10m, ShortCircuitProtection.Maximum(new ProtectionInput(4.8m, ProtectiveDevice.DualElementFuse, Phases.Three)).Value);
        var cc = ShortCircuitProtection.Maximum(new ProtectionInput(4.8m, ProtectiveDevice.DualElementFuse, Phases.Three, ClassCc: true));
        Assert.Equal(15m, cc.Value);
        Assert.Contains(cc.Steps, s => s.Rule == "NEC Table 430.52(C)(1), note 1");
        var hard = ShortCircuitProtection.Maximum(new ProtectionInput(4.8m, ProtectiveDevice.DualElementFuse, Phases.Three, HardStart: true, ClassCc: true));
        Assert.Contains(hard.Steps, s => s.Rule == "NEC 430.52(C)(1)(b)(1)");
        Assert.Equal(15m, hard.Value);
        // 20 A motor (hand calculation): ordinary time-delay (b)(2) 225 % = 45 A; Class CC (b)(1) 400 % = 80 A.
        Assert.Equal(45m, ShortCircuitProtection.Maximum(new ProtectionInput(20m, ProtectiveDevice.DualElementFuse, Phases.Three, HardStart: true)).Value);
        Assert.Equal(80m, ShortCircuitProtection.Maximum(new ProtectionInput(20m, ProtectiveDevice.DualElementFuse, Phases.Three, HardStart: true, ClassCc: true)).Value);
    }

    // NFPA 70-2023 250.122(D)(2): for a motor short-circuit protector the grounding conductor is sized from the
    // dual-element fuse 430.52(C)(1) would allow. Hand calculation: 14 A x 175 % = 24.5 A -> 25 A -> Table
    // 250.122 (60 A row) 10 AWG Cu. The protector's own 182 A setting would give 6 AWG (200 A row).
    [Fact]
    public void GroundingConductorForMotorShortCircuitProtector()
    {
        var p = new ProtectionInput(14m, ProtectiveDevice.MotorShortCircuitProtector, Phases.Three);
        var g = Grounding.ForInstantaneousTrip(p, ConductorMaterial.Copper);
        Assert.Equal(ConductorSize.Parse("10"), g.Value);
    }

    // A device that is not a column of Table 430.52(C)(1) never gets a column's percentage by default.
    [Fact]
    public void NoSilentTableColumnForDevicesInLieu()
    {
        foreach (var d in new[] { ProtectiveDevice.MotorShortCircuitProtector, ProtectiveDevice.SelfProtectedController, ProtectiveDevice.SemiconductorFuse })
        {
            Assert.False(ShortCircuitProtection.IsTableDevice(d));
            Assert.Throws<ArgumentOutOfRangeException>(() => ShortCircuitProtection.Percent("squirrel-cage", d));
        }
    }
}
