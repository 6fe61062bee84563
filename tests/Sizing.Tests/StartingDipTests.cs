using MotorLang.Domain;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// The starting dip by the impedance method (IEEE Std 399 ch. 9, from memory): the motor at locked rotor
/// is a constant impedance |Zm| = V ÷ (√3 × I) at power factor 0.35 (common practice, no source), and
/// V_motor ÷ V = |Zm| ÷ |Zs + Zb + Zm|. Each case is worked out by hand below.
/// </summary>
public class StartingDipTests
{
    [Fact]
    public void AOneOhmMotorBehindAPointOneOhmReactance()
    {
        // 480 V, 277.13 A: |Zm| = 480 ÷ (√3 × 277.13) = 1.0 Ω → 0.35 + j0.93675 Ω. Zs = j0.1 Ω, no branch.
        // |Zs + Zm| = |0.35 + j1.03675| = 1.09423 Ω; V_motor ÷ V = 1 ÷ 1.09423 = 0.91389: dip 8.61 % at motor and bus alike.
        var d = StartingDip.Of(new Impedance(0, 0.1m), Impedance.Zero, 480m / 1.7320508075688772935274463415m, 480, 480, Phases.Three).Value!.Value;
        Assert.Equal(8.61m, decimal.Round(d.MotorPercent, 2));
        Assert.Equal(8.61m, decimal.Round(d.BusPercent, 2));
    }

    [Fact]
    public void GeneratorInitialDipFromItsSubtransientReactance()
    {
        // 500 kVA generator at 480 V, X"d 15 %: X = 0.15 × 480² ÷ 500,000 = 0.06912 Ω (pure reactance, no X/R).
        // A motor of 629 locked-rotor kVA (100 hp, code letter G upper end 6.29 kVA/hp, Table 430.7(B)) at 480 V:
        // I = 629,000 ÷ (√3 × 480) = 756.57 A; |Zm| = 480² ÷ 629,000 = 0.36630 Ω → 0.12821 + j0.34314 Ω.
        // |Zs + Zm| = |0.12821 + j0.41226| = 0.43173 Ω; 1 − 0.36630 ÷ 0.43173 = 15.15 %.
        // Cross-check: the usual estimate X"d·kVA_LR ÷ (kVA_gen + X"d·kVA_LR) = 94.35 ÷ 594.35 = 15.9 %
        // (common practice, no source), which adds the impedances as if in phase and so lies a little above.
        var gen = FaultCurrent.Generator(500, 15, null, 480).Value!.Value;
        var d = StartingDip.Of(gen, Impedance.Zero, 629000m / (1.7320508075688772935274463415m * 480m), 480, 480, Phases.Three).Value!.Value;
        Assert.Equal(15.15m, decimal.Round(d.MotorPercent, 2));
        Assert.True(d.MotorPercent < 15.9m);
    }

    [Fact]
    public void WyeDeltaDrawsOneThirdAndDipsLess()
    {
        // The same generator and motor through a wye-delta starter: I ÷ 3 = 252.19 A, |Zm| = 1.09889 Ω → dip 5.58 %.
        var gen = FaultCurrent.Generator(500, 15, null, 480).Value!.Value;
        var (factor, _, _) = StartingDip.StarterFactor(StartingMethod.WyeDelta);
        var d = StartingDip.Of(gen, Impedance.Zero, factor * 629000m / (1.7320508075688772935274463415m * 480m), 480, 480, Phases.Three).Value!.Value;
        Assert.Equal(5.58m, decimal.Round(d.MotorPercent, 2));
    }

    [Fact]
    public void BranchConductorsDipTheMotorMoreThanTheBus()
    {
        var d = StartingDip.Of(new Impedance(0.01m, 0.02m), new Impedance(0.06m, 0.005m), 200, 480, 460, Phases.Three).Value!.Value;
        Assert.True(d.MotorPercent > d.BusPercent);
        Assert.True(d.BusPercent > 0);
    }

    [Theory]
    [InlineData(50, 100)]
    [InlineData(100, 400)]
    [InlineData(400, 1600)]
    public void MoreStartingCurrentNeverDipsLess(int smaller, int larger)
    {
        // Property: a larger locked-rotor current (a larger motor) never gives a smaller dip.
        var zs = new Impedance(0.005m, 0.02m);
        var a = StartingDip.Of(zs, Impedance.Zero, smaller, 480, 460, Phases.Three).Value!.Value;
        var b = StartingDip.Of(zs, Impedance.Zero, larger, 480, 460, Phases.Three).Value!.Value;
        Assert.True(b.MotorPercent > a.MotorPercent);
    }

    [Fact]
    public void SinglePhaseIsSaidNotWorkedOut() =>
        Assert.Contains("three-phase", StartingDip.Of(Impedance.Zero, Impedance.Zero, 100, 240, 230, Phases.Single).Unavailable);

    [Fact]
    public void EveryStarterFactorNamesItsSource()
    {
        foreach (var method in Enum.GetValues<StartingMethod>())
            Assert.False(string.IsNullOrWhiteSpace(StartingDip.StarterFactor(method).Source));
        Assert.Equal("common practice, no source", StartingDip.StarterFactor(StartingMethod.PartWinding).Source);
    }
}
