using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Tests;

/// <summary>The fault study wired through analysis: values at each bus, the M500-M509 checks, and what is said when nothing can be worked out.</summary>
public class FaultStudyTests
{
    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    private static string RepoFile(params string[] parts)
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        return File.ReadAllText(Path.Combine([dir, .. parts]));
    }

    private static readonly string Packhouse = RepoFile("examples", "orchard-packhouse.motors");

    private static string[] Codes(AnalysisResult a) => a.Findings.Select(f => $"{f.Code}@{f.Range.Start.Line + 1}").ToArray();

    [Fact]
    public void TheExamplePlantShowsItsPlantedMistakesAndNothingElse()
    {
        var a = Analyzer.Analyze(Packhouse);
        // SWBD-1 writes no conductors or device (M301 says what they need); MCC-1's 35 kA breaker and CV-1's 5 kA starter are the planted mistakes.
        Assert.Equal(["M301@12", "M301@12", "M301@12", "M500@25", "M502@37"], Codes(a));
    }

    [Fact]
    public void EveryBusOfTheExampleHasItsHandWorkedValue()
    {
        var a = Analyzer.Analyze(Packhouse);
        var bus = a.Power.Feeders.Values.ToDictionary(f => f.Feeder.Tag!.Value, f => f.Bus);
        // The service: the utility's 35 kA; SWBD-1 has no length, so the same.
        Assert.Equal(35000m, decimal.Round(a.Power.Service!.Bolted.Value!.Value));
        Assert.Equal(35000m, decimal.Round(bus["SWBD-1"].Bolted.Value!.Value));
        // MCC-1: 35 kA X/R 6 plus 150 ft of 3/0 AWG in RMC = 13,577 A (hand calculation in Sizing.Tests FaultCurrentTests).
        Assert.Equal(13577m, decimal.Round(bus["MCC-1"].Bolted.Value!.Value));
        // PNL-2: through 75 kVA 5 %Z X/R 4 and 8 ft of 250 kcmil = 3,894.7 A (same file).
        Assert.Equal(3894.7m, decimal.Round(bus["PNL-2"].Bolted.Value!.Value, 1));
        // Motor contribution: 4 × (14 + 34 A at 480 V + 16.7 A at 208 V referred: 7.2367 A) = 220.95 A at 480 V.
        // FLC from NFPA 70-2023 Table 430.250: 10 hp 480 V 14 A, 25 hp 34 A, 5 hp 208 V 16.7 A.
        Assert.Equal(220.95m, decimal.Round(bus["MCC-1"].MotorAmps!.Value, 2));
        Assert.True(bus["MCC-1"].WithMotors.Value > bus["MCC-1"].Bolted.Value);
    }

    [Fact]
    public void TheHoverNamesTheMethodAndEveryReference()
    {
        var a = Analyzer.Analyze(Packhouse);
        var line = Packhouse.Split('\n').ToList().FindIndex(l => l.StartsWith("feeder MCC-1", StringComparison.Ordinal));
        var view = Breakdown.At(a, new TextPosition(line, 0))!;
        var fault = view.Sections.Single(s => s.Heading.StartsWith(FaultSections.Heading, StringComparison.Ordinal) && s.Heading.Contains("MCC-1"));
        Assert.Contains(fault.Steps, s => s.Note.Contains("ohmic (R + jX) method"));
        Assert.Contains(fault.Steps, s => s.Rule == "NFPA 70-2023 Chapter 9 Table 9");
        Assert.Contains(fault.Steps, s => s.Label.StartsWith("Motor contribution", StringComparison.Ordinal));
        Assert.All(fault.Steps, s => Assert.False(string.IsNullOrWhiteSpace(s.Rule)));
        Assert.Contains("X/R", fault.Verdict);
        Assert.Contains("✓ bus SCCR 22 kA", fault.Verdict);
    }

    [Fact]
    public void TheSourceLineShowsTheValueToDocumentAtTheService()
    {
        var a = Analyzer.Analyze(Packhouse);
        var line = Packhouse.Split('\n').ToList().FindIndex(l => l.TrimStart().StartsWith("source", StringComparison.Ordinal));
        var view = Breakdown.At(a, new TextPosition(line, 3))!;
        Assert.Contains("110.24", view.Sections.Single().Heading);
    }

    private const string Mcc = "feeder MCC-1 480V 3ph";

    [Fact]
    public void WithoutASourceNothingIsGuessedAndTheCircuitSaysSo()
    {
        var a = Analyzer.Analyze(Lines("project \"P\"", Mcc, "  sccr 1kA", "  motor P-1 10hp", "    sccr 1kA"));
        Assert.DoesNotContain(a.Findings, f => f.Code.StartsWith("M50", StringComparison.Ordinal));
        var rules = CircuitCoverage.For(a.Motors.Values.Single(), a.Power).NotChecked.Select(n => n.Rule).ToList();
        Assert.Contains("110.10, 409.22, 430.8", rules);
        // 110.24 is the service's business: said on the feeder supplied at the service.
        Assert.Contains(CircuitCoverage.For(a.Feeders.Values.Single(), a.Power).NotChecked, n => n.Rule == "110.24");
        Assert.Contains("no 'source'", a.Power.Feeders.Values.Single().Bus.Bolted.Unavailable);
    }

    [Fact]
    public void SinglePhaseFaultCurrentIsMarkedNotImplemented()
    {
        var a = Analyzer.Analyze(Lines("project \"P\"", "  source utility 10kA x/r 4", "feeder P-1 240V 1ph", "  sccr 1kA", "  motor M-1 2hp"));
        Assert.DoesNotContain(a.Findings, f => f.Code == "M501");
        Assert.Contains("single-phase", a.Power.Feeders.Values.Single().Bus.Bolted.Unavailable);
        Assert.Contains(CircuitCoverage.For(a.Feeders.Values.Single(), a.Power).NotChecked, n => n.Rule == "110.9, 110.10");
    }

    private static AnalysisResult Transformer(string transformer, params string[] more) => Analyzer.Analyze(Lines(
        ["project \"P\"", "  source utility 35kA x/r 6", "feeder SWBD-1 480V 3ph", "feeder PNL-2 208V 3ph", "  from SWBD-1", "  " + transformer, .. more.Select(m => "  " + m)]));

    [Fact]
    public void ATransformerWithoutImpedanceStopsTheStudyBelowIt()
    {
        var a = Transformer("transformer 75kVA 480V 208V", "sccr 1kA");
        Assert.DoesNotContain(a.Findings, f => f.Code == "M501");
        Assert.Contains("%Z", a.Power.Feeders.Values.Single(f => f.Feeder.Tag!.Value == "PNL-2").Bus.Bolted.Unavailable);
    }

    [Fact]
    public void BusRatingBelowTheTransformerSecondaryFaultIsAnError()
    {
        // No length written: no conductor impedance, so the bus sees the transformer secondary value (below the 4,163.6 A infinite-bus value).
        var a = Transformer("transformer 75kVA 480V 208V 5% x/r 4", "sccr 3kA");
        Assert.Contains(a.Findings, f => f.Code == "M501");
        Assert.DoesNotContain(Transformer("transformer 75kVA 480V 208V 5% x/r 4", "sccr 5kA").Findings, f => f.Code == "M501");
    }

    [Fact]
    public void TransformerProtectionAboveTable450_3BIsAnError()
    {
        // 75 kVA 480 V: 90.21 A primary. Primary only: 125 % = 112.8 A, Note 1 → 125 A; 150 A is too large (M504).
        Assert.Contains(Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 150A").Findings, f => f.Code == "M504");
        Assert.DoesNotContain(Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 125A").Findings, f => f.Code == "M504");
        // With a secondary device the primary may be 250 % (225.5 A); the secondary 125 % of 208.2 A → Note 1 → 300 A.
        var both = Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 200A", "length 8ft", "wire 2x 250 kcmil",
            "protection inverse-time-breaker 350A");
        Assert.DoesNotContain(both.Findings, f => f.Code == "M504");
        Assert.Contains(both.Findings, f => f.Code == "M505");
    }

    [Fact]
    public void SecondaryConductorsByTheirLength()
    {
        // 8 ft of 3/0 AWG (200 A at 75 °C, Table 310.16) ending in a 225 A breaker: 240.21(C)(2) asks 225 A (M506).
        var shortRun = Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 100A", "length 8ft", "wire 3/0 AWG",
            "protection inverse-time-breaker 225A");
        Assert.Contains(shortRun.Findings, f => f.Code == "M506" && f.Message.Contains("240.21(C)(2)"));
        var longRun = Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 100A", "length 40ft", "wire 250 kcmil",
            "protection inverse-time-breaker 225A");
        Assert.Contains(longRun.Findings, f => f.Code == "M507");
        var none = Transformer("transformer 75kVA 480V 208V 5% x/r 4", "primary-protection dual-element-fuse 100A", "length 20ft", "wire 250 kcmil");
        Assert.Contains(none.Findings, f => f.Code == "M509");
    }

    [Fact]
    public void TransformerVoltagesThatDoNotMatchAreAnError()
    {
        var a = Transformer("transformer 75kVA 480V 240V 5% x/r 4");
        Assert.Contains(a.Findings, f => f.Code == "M508");
    }

    [Fact]
    public void AMotorCopiedWithLikeKeepsItsControllerRating()
    {
        var a = Analyzer.Analyze(Lines("project \"P\"", "  source utility 35kA x/r 6", Mcc, "  motor P-1 10hp", "    sccr 5kA", "  motor P-2 10hp", "    like P-1"));
        Assert.Equal(2, a.Findings.Count(f => f.Code == "M502"));
    }

    [Fact]
    public void RemovingAMotorNeverRaisesTheMotorContribution()
    {
        var with = Analyzer.Analyze(Packhouse).Power.Feeders.Values.Single(f => f.Feeder.Tag!.Value == "MCC-1").Bus.MotorAmps!.Value;
        var text = Packhouse.Replace("  motor P-1 \"Flume water pump\" 25hp", "  load P-1 \"Flume water pump\" 1A");
        var without = Analyzer.Analyze(text).Power.Feeders.Values.Single(f => f.Feeder.Tag!.Value == "MCC-1").Bus.MotorAmps!.Value;
        Assert.True(without < with);
    }

    [Fact]
    public void TheScheduleAndTheFeederSummaryShowTheFaultCurrentAtEachBus()
    {
        var a = Analyzer.Analyze(Packhouse);
        var schedule = Reports.Schedule.Of(a);
        Assert.True(schedule.ShowsFaultCurrent);
        var mcc = schedule.Feeders.Single(f => f.Tag == "MCC-1");
        // 13,577 A bolted (hand calculation in Sizing.Tests FaultCurrentTests) and 4 × 55.24 A = 220.95 A from the motors; X/R 1.19.
        Assert.Equal("13.58 kA + 0.22 motors, X/R 1.2", mcc.FaultCurrent);
        var summary = Breakdown.FeederSummary(a.Feeders.Values.Single(f => f.Tag == "MCC-1"), a.Power);
        Assert.EndsWith("fault 13.8 kA with motors, X/R 1.2", summary);
        // Without a source neither shows anything about fault current.
        var none = Analyzer.Analyze(Lines(Mcc, "  motor P-1 10hp"));
        Assert.False(Reports.Schedule.Of(none).ShowsFaultCurrent);
        Assert.Equal("", Reports.Schedule.Of(none).Feeders.Single().FaultCurrent);
        Assert.DoesNotContain("fault", Breakdown.FeederSummary(none.Feeders.Values.Single(), none.Power));
    }
}
