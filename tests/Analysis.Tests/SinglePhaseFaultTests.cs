using MotorLang.Analysis.Findings;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Single-phase line-to-line fault current where a single-phase transformer feeds, by the ohmic method
/// (IEEE Std 141 ch. 4, from memory) on the loop impedance: I = V ÷ |Z_loop|. Hand calculations below.
/// </summary>
public class SinglePhaseFaultTests
{
    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    private static AnalysisResult Panel(string source, params string[] more) => Analyzer.Analyze(Lines([
        "project \"P\"", "  " + source, "  raceway PVC",
        "feeder SWBD-1 480V 3ph", "feeder LP-1 240V 1ph", "  from SWBD-1", "  transformer 25kVA 480V 240V 2% x/r 2", .. more.Select(m => "  " + m)]));

    private static Power.FaultPoint Bus(AnalysisResult a) => a.Power.Feeders.Values.Single(f => f.Feeder.Tag!.Value == "LP-1").Bus;

    [Fact]
    public void AnInfiniteBusGivesRatedCurrentOverPercentImpedance()
    {
        // 25 kVA 240 V: rated 104.17 A; 2 %Z: |Z| = 0.02 × 240² ÷ 25,000 = 0.04608 Ω; I = 240 ÷ 0.04608 = 5,208 A = 104.17 ÷ 0.02.
        var bus = Bus(Panel("source infinite-bus"));
        Assert.True(bus.SinglePhase);
        Assert.Equal(5208m, decimal.Round(bus.Bolted.Value!.Value));
    }

    [Fact]
    public void TheUtilityLoopIsTwoPhasesReferredToTheSecondary()
    {
        // Utility 35 kA X/R 6 at 480 V: 0.0013017 + j0.0078102 Ω per phase; line to line two phases are in the loop:
        // 0.0026034 + j0.0156204 Ω, × (240 ÷ 480)² = 0.00065085 + j0.00390511 Ω. Transformer 0.04608 Ω at X/R 2:
        // 0.0206076 + j0.0412152 Ω. Loop 0.0212585 + j0.0451203 Ω, |Z| 0.0498775 Ω: I = 240 ÷ 0.0498775 = 4,811.8 A.
        var bus = Bus(Panel("source utility 35kA x/r 6"));
        Assert.Equal(4811.8m, decimal.Round(bus.Bolted.Value!.Value, 1));
        // With 20 ft of 2 AWG copper in PVC (Table 9: R 0.19, X 0.045 Ω per 1000 ft), out and back:
        // + 0.0076 + j0.0018 Ω; loop 0.0288585 + j0.0469203 Ω, |Z| 0.0550847 Ω: I = 4,356.9 A.
        var longer = Bus(Panel("source utility 35kA x/r 6", "length 20ft", "wire 2 AWG"));
        Assert.Equal(4356.9m, decimal.Round(longer.Bolted.Value!.Value, 1));
        Assert.True(longer.Bolted.Value < bus.Bolted.Value);
    }

    [Fact]
    public void RatingsBelowTheTransformerAreHeldToTheLineToNeutralBound()
    {
        // 1.5 × 4,356.9 A = 6,535.4 A (a center-tapped secondary's line-to-neutral bound, conservative reading):
        // a 6 kA panel passes the 4.36 kA line-to-line value but not the bound.
        var a = Panel("source utility 35kA x/r 6", "length 20ft", "wire 2 AWG", "sccr 6kA");
        var f = Assert.Single(a.Findings, x => x.Code == FindingCodes.BusSccrTooLow);
        Assert.Contains("line-to-neutral bound", f.Message);
        Assert.DoesNotContain(Panel("source utility 35kA x/r 6", "length 20ft", "wire 2 AWG", "sccr 10kA").Findings, x => x.Code == FindingCodes.BusSccrTooLow);
    }

    [Fact]
    public void DcIsStillSaidNotWorkedOut()
    {
        var a = Analyzer.Analyze(Lines("project \"P\"", "  source utility 35kA x/r 6", "feeder SWBD-1 480V 3ph", "feeder DC-1 250V dc", "  from SWBD-1", "  sccr 1kA"));
        Assert.Contains("dc", a.Power.Feeders.Values.Single(f => f.Feeder.Tag!.Value == "DC-1").Bus.Bolted.Unavailable);
    }
}
