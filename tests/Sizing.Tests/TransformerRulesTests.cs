using MotorLang.Sizing.Rules.Faults;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Tests;

/// <summary>Table 450.3(B) cell by cell and the 240.21(C) secondary-conductor rules, each against a hand calculation.</summary>
public class TransformerRulesTests
{
    [Theory]
    // NFPA 70-2023 Table 450.3(B) (checked against two public reproductions; see transformer-protection.csv):
    // primary only: 125 % at 9 A or more, 167 % under 9 A, 300 % under 2 A; primary and secondary: 250 % primary,
    // secondary 125 % at 9 A or more, 167 % under 9 A.
    [InlineData(TransformerProtectionMethod.PrimaryOnly, true, 1.5, 4.5)]        // 300 %
    [InlineData(TransformerProtectionMethod.PrimaryOnly, true, 6.0, 10.02)]      // 167 %
    [InlineData(TransformerProtectionMethod.PrimaryOnly, true, 80.0, 100.0)]     // 125 % = 100 A, a standard rating
    [InlineData(TransformerProtectionMethod.PrimaryAndSecondary, true, 1.5, 3.75)]  // 250 %
    [InlineData(TransformerProtectionMethod.PrimaryAndSecondary, true, 90.2, 225.5)] // 250 %, no next size up
    [InlineData(TransformerProtectionMethod.PrimaryAndSecondary, false, 6.0, 10.02)] // 167 %
    [InlineData(TransformerProtectionMethod.PrimaryAndSecondary, false, 160.0, 200.0)] // 125 % = 200 A, standard
    public void TableCells(TransformerProtectionMethod method, bool primary, double rated, double expected)
    {
        var r = TransformerProtection.Maximum(method, primary, (decimal)rated, fuse: false);
        Assert.Equal((decimal)expected, decimal.Round(r.Value!.Value, 2));
        Assert.Contains(r.Steps, s => s.Rule.Contains("Table 450.3(B)"));
    }

    [Fact]
    public void NoteOneTakesTheNextStandardRatingOnlyForTheOneHundredTwentyFivePercentCells()
    {
        // 75 kVA 480 V three-phase: rated primary 75,000 ÷ (√3 × 480) = 90.21 A; 125 % = 112.77 A, not standard:
        // Note 1 permits the next standard rating, 125 A (240.6(A)).
        var ip = FaultCurrent.RatedCurrent(75m, 480m);
        Assert.Equal(90.21m, decimal.Round(ip, 2));
        Assert.Equal(125m, TransformerProtection.Maximum(TransformerProtectionMethod.PrimaryOnly, true, ip, fuse: true).Value);
        // Secondary at 208 V: 208.18 A; 125 % = 260.2 A, next standard 300 A.
        var @is = FaultCurrent.RatedCurrent(75m, 208m);
        Assert.Equal(300m, TransformerProtection.Maximum(TransformerProtectionMethod.PrimaryAndSecondary, false, @is, fuse: false).Value);
        // The 250 % primary cell has no Note 1: 225.53 A stays 225.53 A (not 250 A).
        Assert.Equal(225.53m, decimal.Round(TransformerProtection.Maximum(TransformerProtectionMethod.PrimaryAndSecondary, true, ip, fuse: false).Value!.Value, 2));
    }

    [Fact]
    public void TheTableNamesItsSource() =>
        Assert.Contains("450.3(B)", CodeTables.TransformerProtection.Source);

    [Fact]
    public void TenFootRuleAsksTheDeviceAndOneTenthOfThePrimary()
    {
        // 240.21(C)(2): 8 ft ending in a 225 A breaker; primary 100 A at 480/208 V: one tenth = 100 × 480/208 ÷ 10 = 23.08 A.
        var c = SecondaryConductors.Check(8m, 225m, 100m, 480m, 208m);
        Assert.Equal("240.21(C)(2)", c.Subsection);
        Assert.Equal(225m, c.MinimumAmpacity.Value);
        // With a small secondary device the one-tenth condition governs: 500 A primary → 115.38 A.
        Assert.Equal(115.38m, decimal.Round(SecondaryConductors.Check(10m, 100m, 500m, 480m, 208m).MinimumAmpacity.Value!.Value, 2));
    }

    [Fact]
    public void TwentyFiveFootRuleAsksOneThirdOfThePrimaryReferred()
    {
        // 240.21(C)(6): 20 ft, primary 400 A at 480/208 V: 400 × 480/208 ÷ 3 = 307.69 A, above the 225 A device.
        var c = SecondaryConductors.Check(20m, 225m, 400m, 480m, 208m);
        Assert.Equal("240.21(C)(6)", c.Subsection);
        Assert.Equal(307.69m, decimal.Round(c.MinimumAmpacity.Value!.Value, 2));
        Assert.False(c.NeedsDevice);
        Assert.True(SecondaryConductors.Check(20m, null, 400m, 480m, 208m).NeedsDevice);
    }

    [Fact]
    public void OverTwentyFiveFeetOrNoLengthIsNotGuessed()
    {
        Assert.True(SecondaryConductors.Check(30m, 225m, 100m, 480m, 208m).TooLong);
        var none = SecondaryConductors.Check(null, 225m, 100m, 480m, 208m);
        Assert.False(none.MinimumAmpacity.HasValue);
        Assert.Null(none.Subsection);
    }
}
