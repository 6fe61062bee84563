using MotorLang.Analysis.Findings;

namespace MotorLang.Analysis.Tests;

/// <summary>Fixes where Table 450.3(B) or 240.21(C) leaves a single right value, each against a hand calculation.</summary>
public class TransformerFixTests
{
    private static AnalysisResult Transformer(params string[] more) => Analyzer.Analyze(string.Join("\n",
        ["project \"P\"", "  source utility 35kA x/r 6", "  conductor cu THWN 75C", "feeder SWBD-1 480V 3ph", "feeder PNL-2 208V 3ph", "  from SWBD-1",
         "  transformer 75kVA 480V 208V 5% x/r 4", .. more.Select(m => "  " + m)]) + "\n");

    private static Finding One(AnalysisResult a, string code) => Assert.Single(a.Findings, f => f.Code == code);

    [Fact]
    public void PrimaryOnlyTakesTheNoteOneRating()
    {
        // 75 kVA 480 V: 75,000 ÷ (√3 × 480) = 90.21 A; primary only, 125 % = 112.77 A, Note 1 → 125 A (NFPA 70-2023 Table 450.3(B), 240.6(A)).
        var f = One(Transformer("primary-protection dual-element-fuse 150A"), FindingCodes.TransformerPrimaryTooLarge);
        Assert.Equal("Change the primary device to 125 A", f.Fix!.Title);
        Assert.Equal("125A", f.Fix.Edits.Single().NewText);
    }

    [Fact]
    public void PrimaryAndSecondaryTakeTheLargestStandardRatingUnderTheLimit()
    {
        // With a secondary device the primary may be 250 % = 225.53 A, no next size up: 225 A is the largest standard rating under it.
        // Secondary 75,000 ÷ (√3 × 208) = 208.18 A; 125 % = 260.22 A, Note 1 → 300 A.
        var a = Transformer("primary-protection dual-element-fuse 250A", "length 8ft", "wire 2x 250 kcmil", "protection inverse-time-breaker 350A");
        Assert.Equal("225A", One(a, FindingCodes.TransformerPrimaryTooLarge).Fix!.Edits.Single().NewText);
        Assert.Equal("300A", One(a, FindingCodes.TransformerSecondaryTooLarge).Fix!.Edits.Single().NewText);
    }

    [Fact]
    public void SecondaryConductorsTakeTheSmallestSizeThatCarriesWhatTheRuleAsks()
    {
        // 8 ft of 3/0 AWG (200 A, Table 310.16 75 °C) ending in a 225 A breaker: 240.21(C)(2) asks 225 A → 4/0 AWG (230 A).
        var a = Transformer("primary-protection dual-element-fuse 100A", "length 8ft", "wire 3/0 AWG", "protection inverse-time-breaker 225A");
        var f = One(a, FindingCodes.SecondaryConductorsUndersized);
        Assert.Equal("Change the secondary conductors to 4/0 AWG", f.Fix!.Title);
        Assert.Equal("4/0 AWG", f.Fix.Edits.Single().NewText);
    }

    [Fact]
    public void ATransformerLoadedBeyondItsRatingIsWarned()
    {
        // 75 kVA at 208 V three-phase: 75,000 ÷ (√3 × 208) = 208.18 A rated secondary current; 250 A of load is above it.
        var over = Transformer("load L-1 250A");
        var f = One(over, FindingCodes.TransformerOverloaded);
        Assert.Contains("208.2 A", f.Message);
        Assert.DoesNotContain(Transformer("load L-1 200A").Findings, x => x.Code == FindingCodes.TransformerOverloaded);
    }
}
