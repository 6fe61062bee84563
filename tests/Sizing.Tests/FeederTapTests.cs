using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// 430.28 feeder taps against hand calculations. The rule (NFPA 70-2023 430.28, wording checked against
/// public reproductions; the 1000 % of (1) from memory for 2023): the tap's ampacity is at least what
/// Part II asks for the motor, and (1) not over 10 ft with the feeder device at most 1000 % of it, or
/// (2) not over 25 ft with at least one third of the feeder conductors' ampacity, or (3) at least the
/// feeder conductors' ampacity. Ampacities are NFPA 70-2023 Table 310.16 copper at 75 °C.
/// </summary>
public class FeederTapTests
{
    // A 25 hp 480 V motor: FLC 34 A (Table 430.250); Part II (430.22): 125 % = 42.5 A.
    private const decimal PartTwo = 42.5m;

    [Fact]
    public void TenFootTapFromAFourHundredAmpFeeder()
    {
        // 8 ft of 6 AWG (65 A) from 500 kcmil (380 A) under a 400 A device:
        // (1) 400 ÷ 10 = 40 A; (2) 380 ÷ 3 = 126.67 A; (3) 380 A. Least 40 A; with Part II: max(42.5, 40) = 42.5 A.
        var c = FeederTaps.Check(8, PartTwo, 65, 380, 400);
        Assert.Equal("430.28(1)", c.Rule);
        Assert.Equal(42.5m, c.MinimumAmpacity.Value);
        Assert.True(c.Passes);
        // 10 AWG (35 A) is below Part II's 42.5 A whatever its length.
        Assert.False(FeederTaps.Check(8, PartTwo, 35, 380, 400).Passes);
    }

    [Fact]
    public void TenFootTapUnderALargeDeviceNeedsATenth()
    {
        // 8 ft of 8 AWG (50 A) from 2x 500 kcmil (760 A) under an 800 A device: (1) 80 A, (2) 253.33 A: least 80 A > 50 A.
        var c = FeederTaps.Check(8, PartTwo, 50, 760, 800);
        Assert.Equal(80m, c.MinimumAmpacity.Value);
        Assert.False(c.Passes);
        // 4 AWG (85 A) meets (1).
        Assert.True(FeederTaps.Check(8, PartTwo, 85, 760, 800).Passes);
    }

    [Fact]
    public void TwentyFiveFootTapNeedsOneThirdOfTheFeederConductorsNotOfTheDevice()
    {
        // 20 ft from 500 kcmil (380 A) under a 400 A device: (2) 380 ÷ 3 = 126.67 A (one third of the conductors'
        // ampacity; one third of the 400 A device would be 133.33 A). 1 AWG (130 A) passes, 2 AWG (115 A) does not.
        var c = FeederTaps.Check(20, PartTwo, 130, 380, 400);
        Assert.Equal("430.28(2)", c.Rule);
        Assert.Equal(126.67m, decimal.Round(c.MinimumAmpacity.Value!.Value, 2));
        Assert.True(c.Passes);
        Assert.False(FeederTaps.Check(20, PartTwo, 115, 380, 400).Passes);
        // The device plays no part over 10 ft: a larger one changes nothing.
        Assert.Equal(c.MinimumAmpacity.Value, FeederTaps.Check(20, PartTwo, 130, 380, 4000).MinimumAmpacity.Value);
    }

    [Fact]
    public void OverTwentyFiveFeetOnlyTheFeederConductorsAmpacityWill()
    {
        // 30 ft from 500 kcmil (380 A): (3) 380 A. 4/0 AWG (230 A) fails; 500 kcmil passes.
        var c = FeederTaps.Check(30, PartTwo, 230, 380, 400);
        Assert.Equal("430.28(3)", c.Rule);
        Assert.Equal(380m, c.MinimumAmpacity.Value);
        Assert.False(c.Passes);
        Assert.True(FeederTaps.Check(30, PartTwo, 380, 380, 400).Passes);
    }

    [Fact]
    public void AnUnknownFeederValueNeverFailsATapThatCouldPass()
    {
        // 8 ft, no feeder device written: (1) unknown, (2) 126.67 A. 6 AWG (65 A) misses (2) but might meet (1): not checked.
        var c = FeederTaps.Check(8, PartTwo, 65, 380, null);
        Assert.Null(c.Passes);
        Assert.Contains("'protection'", c.MinimumAmpacity.Unavailable);
        // 1 AWG (130 A) meets (2), so it passes without the device.
        Assert.True(FeederTaps.Check(8, PartTwo, 130, 380, null).Passes);
        // Below Part II it fails whatever the feeder's values.
        Assert.False(FeederTaps.Check(8, PartTwo, 30, 380, null).Passes);
        // Nothing known of the feeder: nothing to check against.
        Assert.Null(FeederTaps.Check(20, PartTwo, 65, null, null).Passes);
    }

    [Theory]
    [InlineData(5)]
    [InlineData(10)]
    [InlineData(18)]
    [InlineData(25)]
    [InlineData(40)]
    public void ALongerTapNeverNeedsLess(int feet)
    {
        // Property: the least ampacity never falls as the tap grows longer (the items open to it only narrow).
        var shorter = FeederTaps.Check(feet, PartTwo, null, 380, 400).MinimumAmpacity.Value!.Value;
        var longer = FeederTaps.Check(feet + 1, PartTwo, null, 380, 400).MinimumAmpacity.Value!.Value;
        Assert.True(longer >= shorter);
    }
}
