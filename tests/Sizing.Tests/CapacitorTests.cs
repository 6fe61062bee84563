using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>Power-factor capacitors on motor circuits, NFPA 70-2023 Article 460 Part I; hand calculations beside each check.</summary>
public class CapacitorTests
{
    // Published formula for a three-phase reactive power: I = kvar × 1000 / (√3 × V).
    // Hand calculation: 15 kvar at 480 V: 15000 / (1.7320508 × 480) = 15000 / 831.38 = 18.04 A.
    [Fact]
    public void RatedCurrentFromKvarThreePhase()
    {
        var r = Capacitors.RatedCurrent(15m, null, 480m, Phases.Three, "");
        Assert.Equal(18.04m, decimal.Round(r.Value!.Value, 2));
        Assert.Contains(r.Steps, s => s.Rule == "NEC 460.8(A)");
    }

    // Single-phase: I = kvar × 1000 / V. Hand calculation: 2 kvar at 240 V: 2000 / 240 = 8.33 A.
    [Fact]
    public void RatedCurrentFromKvarSinglePhase()
    {
        Assert.Equal(8.33m, decimal.Round(Capacitors.RatedCurrent(2m, null, 240m, Phases.Single, "").Value!.Value, 2));
    }

    // Both written: the larger is used (conservative reading). 15 kvar at 480 V is 18.04 A; a nameplate 19 A wins.
    [Fact]
    public void TheLargerOfWrittenAndComputedCurrent()
    {
        Assert.Equal(19m, Capacitors.RatedCurrent(15m, 19m, 480m, Phases.Three, "").Value);
        Assert.Equal(18.04m, decimal.Round(Capacitors.RatedCurrent(15m, 17m, 480m, Phases.Three, "").Value!.Value, 2));
        Assert.Null(Capacitors.RatedCurrent(15m, null, 250m, Phases.Dc, "").Value);
    }

    // NFPA 70-2023 460.8(A), the published quiz worked example (Code Quiz, EC&M): a 20 A capacitor on the
    // terminals of a motor whose circuit conductors are 8 AWG THHN (55 A in the 90 °C column of Table 310.16).
    // 135 % × 20 = 27 A; one third of 55 = 18.3 A; 27 A governs.
    [Fact]
    public void ConductorsAre135PercentOrOneThirdOfTheMotorConductors()
    {
        var r = Capacitors.RequiredAmpacity(20m, 55m);
        Assert.Equal(27m, r.Value);
        // Where one third of the motor conductors is more: 10 A capacitor (13.5 A) on 4/0 AWG (260 A at 90 °C): 86.67 A.
        Assert.Equal(86.67m, decimal.Round(Capacitors.RequiredAmpacity(10m, 260m).Value!.Value, 2));
        Assert.All(r.Steps, s => Assert.Equal("NEC 460.8(A)", s.Rule));
    }

    // NFPA 70-2023 460.9: with the capacitor on the load side, the overload is selected from the improved-power-factor
    // current. Without the value nothing is computed (MotorLang cannot derive it); a value above the nameplate is not used.
    [Fact]
    public void OverloadBasisNeedsTheImprovedCurrent()
    {
        var missing = Capacitors.OverloadBasis(null, 30m);
        Assert.Null(missing.Value);
        Assert.Contains("improved power factor", missing.Unavailable);
        Assert.Contains("cannot compute", missing.Unavailable);
        Assert.Equal(26m, Capacitors.OverloadBasis(26m, 30m).Value);
        Assert.Equal(30m, Capacitors.OverloadBasis(32m, 30m).Value);
        // Hand calculation: 430.32(A)(1) 125 % (service factor 1.15) × 26 A = 32.5 A, not 125 % × 30 = 37.5 A.
        var limit = Overloads.FromBasis(Capacitors.OverloadBasis(26m, 30m), 1.15m, null, absolute: false);
        Assert.Equal(32.5m, limit.Value);
        Assert.Contains(limit.Steps, s => s.Rule == "NEC 460.9");
        Assert.Contains(limit.Steps, s => s.Rule == "NEC 430.32(A)(1)");
    }

    // NFPA 70-2023 430.22(C) Informational Note: the motor leads of a wye-delta motor carry 58 % of the line current
    // (1/√3 exactly). Hand calculation: nameplate 52 A, SF 1.15: 430.32(A)(1) 125 % → 65 A; in the delta leads
    // 65 / 1.7320508 = 37.53 A (the note's 58 % would give 37.7 A; the smaller exact value is used).
    [Fact]
    public void WyeDeltaOverloadInTheDeltaLeads()
    {
        var line = Overloads.Maximum(52m, 1.15m, null);
        var lead = WyeDelta.OverloadInDeltaLeads(line, locationWritten: true, "Overload limit in the delta leads");
        Assert.Equal(37.53m, decimal.Round(lead.Value!.Value, 2));
        Assert.True(lead.Value < 65m * 0.58m);
        Assert.Contains(lead.Steps, s => s.Rule.Contains("430.22(C) Informational Note"));
    }
}
