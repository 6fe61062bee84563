using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;

namespace MotorLang.Analysis.Tests;

/// <summary>The starting dip through analysis: hand-worked on the example plant, the limits and their warnings, and properties.</summary>
public class StartingDipTests
{
    private static string RepoFile(params string[] parts)
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        return File.ReadAllText(Path.Combine([dir, .. parts]));
    }

    private static readonly string Packhouse = RepoFile("examples", "orchard-packhouse.motors");

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    [Fact]
    public void TheFlumePumpOfTheExampleByHand()
    {
        // Impedance method (IEEE Std 399 ch. 9, from memory). MCC-1's bus: utility 35 kA X/R 6 at 480 V
        // (0.0013017 + j0.0078102 Ω) plus 150 ft of 3/0 AWG in RMC (Table 9 steel: 0.079, 0.052 Ω/1000 ft):
        // 0.0131517 + j0.0156102 Ω. P-1: 25 hp, code letter G, upper end 6.29 kVA/hp (Table 430.7(B)) at its rated voltage,
        // the feeder's 480 V (none written): 157,250 VA ÷ (√3 × 480) = 189.14 A; |Zm| = 480 ÷ (√3 × 189.14) = 1.46518 Ω
        // at PF 0.35 → 0.51281 + j1.37251 Ω. Branch 80 ft of 8 AWG in RMC (0.78, 0.065 Ω/1000 ft): 0.0624 + j0.0052 Ω.
        // Total 0.58837 + j1.39332 Ω, |Z| 1.51245 Ω: at the motor 1 − 1.46518 ÷ 1.51245 = 3.13 %;
        // at the bus 1 − |Zb + Zm| ÷ |Z| = 1 − 1.49297 ÷ 1.51245 = 1.29 %.
        var a = Analyzer.Analyze(Packhouse);
        var p1 = a.Power.Dips.Values.Single(d => d.Motor.Tag!.Value == "P-1");
        Assert.Null(p1.Gap);
        Assert.Equal(3.13m, decimal.Round(p1.Dip.Value!.Value.MotorPercent, 2));
        Assert.Equal(1.29m, decimal.Round(p1.Dip.Value!.Value.BusPercent, 2));
        Assert.DoesNotContain(a.Findings, f => f.Code is FindingCodes.StartingDipAtMotorHigh or FindingCodes.StartingDipAtBusHigh);
    }

    private static string Generator(string hp, params string[] more) => Lines([
        "project \"P\"", "  source generator 500kVA 15%", .. more,
        "feeder SWBD 480V 3ph", $"  motor M-1 {hp}", "    code-letter G", "    length 20ft", "    wire 1/0 AWG"]);

    [Fact]
    public void AGeneratorStartingALargeMotorIsWarnedAtTheLimit()
    {
        // 100 hp on a 500 kVA generator (X"d 15 %): about 15 % dip, above the 10 % bus limit (common practice, no source).
        var a = Analyzer.Analyze(Generator("100hp"));
        Assert.Contains(a.Findings, f => f.Code == FindingCodes.StartingDipAtBusHigh);
        // A written limit above it silences it.
        Assert.DoesNotContain(Analyzer.Analyze(Generator("100hp", "  dip-limit 30% 30%")).Findings,
            f => f.Code is FindingCodes.StartingDipAtBusHigh or FindingCodes.StartingDipAtMotorHigh);
    }

    [Fact]
    public void TheDipGrowsWithHorsepower()
    {
        decimal Dip(string hp) => Analyzer.Analyze(Generator(hp)).Power.Dips.Values.Single().Dip.Value!.Value.MotorPercent;
        var dips = new[] { "10hp", "25hp", "50hp", "100hp", "200hp" }.Select(Dip).ToList();
        for (var i = 1; i < dips.Count; i++) Assert.True(dips[i] > dips[i - 1], $"{dips[i]} after {dips[i - 1]}");
    }

    [Fact]
    public void AReducedVoltageStarterLowersTheDip()
    {
        var full = Analyzer.Analyze(Generator("100hp")).Power.Dips.Values.Single().Dip.Value!.Value.MotorPercent;
        var wyeDelta = Analyzer.Analyze(Generator("100hp").Replace("    code-letter G", "    code-letter G\n    starting wye-delta")).Power.Dips.Values.Single();
        Assert.True(wyeDelta.Dip.Value!.Value.MotorPercent < full);
        Assert.Contains(wyeDelta.Current, s => s.Note.Contains("one third"));
    }

    [Fact]
    public void AMissingFeederLengthMakesTheDipALowerBound()
    {
        var a = Analyzer.Analyze(Lines("project \"P\"", "  source utility 35kA x/r 6", "feeder SWBD 480V 3ph", "feeder MCC 480V 3ph", "  from SWBD",
            "  motor M-1 50hp", "    length 50ft", "    wire 2 AWG"));
        var dip = a.Power.Dips.Values.Single();
        Assert.Contains("MCC writes no 'length'", dip.Gap);
        Assert.Contains("at least", DipSection.Of(dip).Verdict);
    }

    [Fact]
    public void WithoutASourceTheBranchOnlyStartingDropStays()
    {
        var a = Analyzer.Analyze(Lines("feeder F 480V 3ph", "  motor M-1 50hp", "    code-letter G", "    length 50ft", "    wire 2 AWG"));
        Assert.Empty(a.Power.Dips);
        var drop = Breakdown.MotorSections(a.Motors.Values.Single()).Single(s => s.Heading == "Voltage drop");
        Assert.Contains(drop.Steps, s => s.Label == "Starting voltage drop");
    }
}
