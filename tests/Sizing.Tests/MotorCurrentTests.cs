using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

public class MotorCurrentTests
{
    // Table 430.250 headnote: system voltage ranges map to the rated-voltage columns.
    [Theory]
    [InlineData(480, 21)]   // 440-480 -> 460 V column
    [InlineData(460, 21)]
    [InlineData(240, 42)]   // 220-240 -> 230 V column
    [InlineData(208, 46.2)] // its own column
    [InlineData(200, 48.3)]
    [InlineData(600, 17)]   // 550-600 -> 575 V column
    public void VoltageColumnsForA15HpMotor(decimal volts, decimal expected)
    {
        Assert.Equal(expected, MotorCurrent.DesignCurrent(new MotorRating(15, false, volts, Phases.Three)).Value);
    }

    [Fact]
    public void UncoveredRatingsNeedTheNameplateNeverAGuess()
    {
        // 3 hp has no 115 V three-phase value; 400 V is in no column's range; 1000 hp is beyond the table.
        foreach (var m in new[]
                 {
                     new MotorRating(3, false, 115, Phases.Three), new MotorRating(10, false, 400, Phases.Three),
                     new MotorRating(1000, false, 460, Phases.Three), new MotorRating(10, false, 460, Phases.Three, MotorKind.Synchronous),
                 })
        {
            var r = MotorCurrent.DesignCurrent(m);
            Assert.False(r.HasValue);
            Assert.Contains("nameplate", r.Unavailable);
        }
    }

    [Fact]
    public void NameplateIsUsedWhereTheTablesStop()
    {
        var r = MotorCurrent.DesignCurrent(new MotorRating(1000, false, 460, Phases.Three, NameplateAmps: 1100m));
        Assert.Equal(1100m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC 430.6(A)(2)");
    }

    [Fact]
    public void LowSpeedMotorsUseTheNameplate()
    {
        var r = MotorCurrent.DesignCurrent(new MotorRating(50, false, 460, Phases.Three, Basis: NameplateBasis.LowSpeed, NameplateAmps: 71m));
        Assert.Equal(71m, r.Value);
        Assert.False(MotorCurrent.DesignCurrent(new MotorRating(50, false, 460, Phases.Three, Basis: NameplateBasis.LowSpeed)).HasValue);
    }

    // kW ratings: 11 kW / 0.746 = 14.75 hp -> next larger table rating 15 hp -> 21 A at 460 V (common practice, no source).
    [Fact]
    public void KilowattRatingsUseTheNextLargerHorsepower()
    {
        var r = MotorCurrent.DesignCurrent(new MotorRating(11, true, 460, Phases.Three));
        Assert.Equal(21m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "common practice, no source");
    }

    // NFPA 70-2023 Table 430.250 note: synchronous at 0.8 PF = unity-PF current x 1.25 (100 hp 460 V: 101 x 1.25 = 126.25 A),
    // at 0.9 PF x 1.1 (111.1 A); other power factors are not tabulated.
    [Theory]
    [InlineData(0.8, 126.25)]
    [InlineData(0.9, 111.1)]
    public void SynchronousPowerFactorNote(decimal pf, decimal expected)
    {
        Assert.Equal(expected, MotorCurrent.DesignCurrent(new MotorRating(100, false, 460, Phases.Three, MotorKind.Synchronous, PowerFactor: pf)).Value);
        Assert.False(MotorCurrent.DesignCurrent(new MotorRating(100, false, 460, Phases.Three, MotorKind.Synchronous, PowerFactor: 0.7m)).HasValue);
    }

    // Table 430.250 synchronous column: 100 hp 460 V unity PF -> 101 A; Table 430.247: 10 hp 240 V dc -> 38 A.
    [Fact]
    public void SynchronousAndDcTables()
    {
        Assert.Equal(101m, MotorCurrent.DesignCurrent(new MotorRating(100, false, 460, Phases.Three, MotorKind.Synchronous)).Value);
        Assert.Equal(38m, MotorCurrent.DesignCurrent(new MotorRating(10, false, 240, Phases.Dc, MotorKind.Dc)).Value);
        Assert.False(MotorCurrent.DesignCurrent(new MotorRating(10, false, 230, Phases.Dc, MotorKind.Dc)).HasValue);
    }
}
