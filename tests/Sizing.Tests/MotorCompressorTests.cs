using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Article 440 (NFPA 70-2023) for motor-compressors and marked equipment. Each case is a hand
/// calculation written out beside it, with the table rows it reads.
/// </summary>
public class MotorCompressorTests
{
    private static CompressorMarking Rla(decimal rla, decimal? lra = null, decimal? bcsc = null, decimal? mca = null, decimal? mop = null) =>
        new(rla, bcsc, lra, mca, mop);

    // NEC 440.6(A) Exception No. 1: a marked selection current larger than the RLA is used instead.
    // hand calculation: RLA 52 A, BCSC 55 A -> 55 A; RLA 52 A with no BCSC -> 52 A.
    [Fact]
    public void SelectionCurrentReplacesRatedLoadWhenLarger()
    {
        Assert.Equal(55m, MotorCompressors.DesignCurrent(Rla(52m, bcsc: 55m)).Value);
        Assert.Equal(52m, MotorCompressors.DesignCurrent(Rla(52m)).Value);
        Assert.Contains(MotorCompressors.DesignCurrent(Rla(52m, bcsc: 55m)).Steps, s => s.Rule.Contains("440.6(A) Exception No. 1"));
        Assert.Null(MotorCompressors.DesignCurrent(new CompressorMarking(null, null, null, 30m, 50m)).Value);
    }

    // NEC 440.32: 125 % of the RLA. hand calculation: 230 V single-phase compressor, RLA 18 A:
    // 1.25 x 18 = 22.5 A (12 AWG copper at 60 C carries 20 A, 10 AWG 30 A: 10 AWG).
    // NEC 440.35: marked equipment, MCA 28 A > 1.25 x 18.6 = 23.25 A: 28 A.
    [Fact]
    public void ConductorsFrom440_32And440_35()
    {
        Assert.Equal(22.5m, MotorCompressors.RequiredAmpacity(Rla(18m), 18m).Value);
        var marked = MotorCompressors.RequiredAmpacity(Rla(18.6m, mca: 28m), 18.6m);
        Assert.Equal(28m, marked.Value);
        Assert.Contains(marked.Steps, s => s.Rule.Contains("440.35"));
        // A marking below 125 % of the compressor's current never lowers the conductors (conservative reading).
        Assert.Equal(25m, MotorCompressors.RequiredAmpacity(Rla(20m, mca: 22m), 20m).Value);
        var wire = Ampacity.Minimum(22.5m, new InstallationConditions(ConductorMaterial.Copper, InsulationRating: 60, TerminationRating: 60));
        Assert.Equal("10 AWG", wire.Value.ToString()); // NFPA 70-2023 Table 310.16, 60 C: 12 AWG 20 A, 10 AWG 30 A
    }

    // NEC 440.22(A): 175 % of the RLA, "not exceeding" -> the standard rating at or below (Table 240.6(A)).
    // hand calculation: RLA 18 A: 1.75 x 18 = 31.5 A -> 30 A; will not start (225 %): 40.5 A -> 40 A.
    // RLA 55 A: 96.25 A -> 90 A (fuse or breaker). RLA 6 A: 10.5 A -> not required below 15 A: 15 A.
    [Theory]
    [InlineData(18, false, 30)]
    [InlineData(18, true, 40)]
    [InlineData(55, false, 90)]
    [InlineData(6, false, 15)]
    [InlineData(20, false, 35)]
    public void ProtectionFrom440_22A(decimal rla, bool hardStart, decimal expected)
    {
        var max = MotorCompressors.MaximumProtection(Rla(rla), rla, hardStart, fuse: false);
        Assert.Equal(expected, max.Value);
        Assert.Contains(max.Steps, s => s.Rule.Contains("440.22(A)"));
    }

    // NEC 440.22(C), 110.3(B): a marked maximum below the 440.22(A) value is a ceiling.
    // hand calculation: RLA 20 A -> 175 % = 35 A; marked 30 A -> 30 A.
    // NEC 440.4(B): marked equipment (MCA 28 A, MOP 50 A, RLA 18.6 A -> 175 % = 32.55 A): the marking, 50 A, governs.
    [Fact]
    public void MarkedMaximumIsTheCeiling()
    {
        Assert.Equal(30m, MotorCompressors.MaximumProtection(Rla(20m, mop: 30m), 20m, false, false).Value);
        Assert.Equal(50m, MotorCompressors.MaximumProtection(Rla(18.6m, mca: 28m, mop: 50m), 18.6m, false, false).Value);
        Assert.Equal(50m, MotorCompressors.MaximumProtection(Rla(18.6m, mca: 28m, mop: 50m), 18.6m, true, true).Value);
        Assert.Equal(45m, MotorCompressors.MaximumProtection(new CompressorMarking(null, null, null, null, 45m), null, false, false).Value);
    }

    // NEC 440.12(A). hand calculation, 460 V three-phase, RLA 18.6 A, LRA 123 A:
    // amperes 1.15 x 18.6 = 21.39 A; Table 430.250 460 V: 10 hp 14 A < 18.6 <= 15 hp 21 A -> 15 hp;
    // Table 430.251(B) 460 V: 15 hp 116 A < 123 <= 20 hp 145 A -> 20 hp; the larger: 20 hp.
    // 230 V single-phase, RLA 20 A, LRA 100 A: Table 430.248 230 V: 3 hp 17 A < 20 <= 5 hp 28 A -> 5 hp;
    // Table 430.251(A) 230 V: 2 hp 72 A < 100 <= 3 hp 102 A -> 3 hp; the larger: 5 hp; 23 A.
    [Fact]
    public void DisconnectEquivalentHorsepower()
    {
        var three = MotorCompressors.Disconnect(18.6m, 123m, 460m, Phases.Three);
        Assert.Equal(new DisconnectRating(21.39m, 20m), three.Value);
        var single = MotorCompressors.Disconnect(20m, 100m, 230m, Phases.Single);
        Assert.Equal(new DisconnectRating(23m, 5m), single.Value);
        Assert.Contains(single.Steps, s => s.Rule.Contains("Table 430.251(A)"));
        Assert.Null(MotorCompressors.Disconnect(20m, null, 230m, Phases.Single).Value);
    }
}
