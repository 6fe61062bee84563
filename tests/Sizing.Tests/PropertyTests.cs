using CsCheck;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Tests;

/// <summary>Properties that must hold for every motor the tables cover.</summary>
public class PropertyTests
{
    private static readonly decimal[] ThreePhaseHp = CodeTables.ThreePhaseFlc.Rows.Select(r => Numbers.Parse(r[0])!.Value).ToArray();

    private static readonly Gen<InstallationConditions> Conditions =
        Gen.Select(Gen.OneOfConst(ConductorMaterial.Copper, ConductorMaterial.Aluminum), Gen.OneOfConst(60, 75, 90),
            Gen.OneOfConst<int?>(null, 60, 75), Gen.Int[10, 50], Gen.Int[1, 12])
            .Select((m, ins, term, amb, ccc) => new InstallationConditions(m, ins, term, amb, ccc));

    private static readonly Gen<(decimal Hp, decimal Volts)> Motor =
        Gen.Select(Gen.Int[0, ThreePhaseHp.Length - 1], Gen.OneOfConst(200m, 208m, 230m, 460m, 480m, 575m))
            .Select((i, v) => (ThreePhaseHp[i], v));

    /// <summary>The number-only ampacity used to search sizes is the same computation as the explained one.</summary>
    [Fact]
    public void AllowableAmpsEqualsTheExplainedAllowableAmpacity() =>
        Gen.Select(Gen.Int[0, ConductorSize.All.Count - 1], Gen.Int[1, 4], Conditions, Gen.Bool).Sample((size, sets, c, bcd) =>
        {
            var wire = new WireSpec(sets, ConductorSize.All[size]);
            Assert.Equal(Ampacity.Allowable(wire, c, bcd).Value, Ampacity.AllowableAmps(wire, c, bcd));
        }, iter: 2000);

    [Fact]
    public void MinimumConductorCarriesAtLeast125PercentOfFlc() =>
        Gen.Select(Motor, Conditions).Sample((motor, c) =>
        {
            var flc = MotorCurrent.DesignCurrent(new MotorRating(motor.Hp, false, motor.Volts, Phases.Three));
            if (flc.Value is not { } amps) return;
            var required = BranchConductors.RequiredAmpacity(new BranchInput(amps)).Value!.Value;
            Assert.True(required >= amps * 1.25m);
            var wire = Ampacity.Minimum(required, c);
            if (wire.Value is not { } w) return;
            Assert.True(Ampacity.Allowable(w, c).Value >= required);
        }, iter: 500);

    [Fact]
    public void LargerMotorsNeverGetSmallerResults() =>
        Gen.Select(Gen.Int[0, ThreePhaseHp.Length - 2], Gen.OneOfConst(208m, 230m, 460m, 575m), Conditions,
                Gen.Enum<ProtectiveDevice>())
            .Sample((i, volts, c, device) =>
            {
                var small = Size(ThreePhaseHp[i], volts, c, device);
                var large = Size(ThreePhaseHp[i + 1], volts, c, device);
                if (small is null || large is null) return;
                Assert.True(large.Value.Flc >= small.Value.Flc);
                Assert.True(large.Value.Protection >= small.Value.Protection);
                // Wires compare in the order they are tried: one conductor up to 500 kcmil, then more parallel sets.
                if (large.Value.Wire is { } lw && small.Value.Wire is { } sw)
                    Assert.True(Order(lw).CompareTo(Order(sw)) >= 0, $"{lw} for the larger motor, {sw} for the smaller");
            }, iter: 500);

    [Fact]
    public void ProtectionMaximumIsAStandardRating() =>
        Gen.Select(Motor, Gen.OneOfConst(ProtectiveDevice.DualElementFuse, ProtectiveDevice.NonTimeDelayFuse, ProtectiveDevice.InverseTimeBreaker),
                Gen.Enum<MotorKind>(), Gen.Bool)
            .Sample((motor, device, kind, hardStart) =>
            {
                var flc = MotorCurrent.DesignCurrent(new MotorRating(motor.Hp, false, motor.Volts, Phases.Three, kind == MotorKind.Dc ? MotorKind.Induction : kind));
                if (flc.Value is not { } amps) return;
                var max = ShortCircuitProtection.Maximum(new ProtectionInput(amps, device, Phases.Three, kind == MotorKind.Dc ? MotorKind.Induction : kind, HardStart: hardStart));
                if (max.Value is not { } rating) return;
                var fuse = device != ProtectiveDevice.InverseTimeBreaker;
                Assert.True(StandardRatings.IsStandard(rating, fuse), $"{rating} A is not a standard rating");
            }, iter: 500);

    private static (int, int) Order(WireSpec w) =>
        w.Sets == 1 && w.Size > Ampacity.LargestSingle ? (11, w.Size.Index) : (w.Sets, w.Size.Index);

    private static (decimal Flc, decimal Protection, WireSpec? Wire)? Size(decimal hp, decimal volts, InstallationConditions c, ProtectiveDevice device)
    {
        var flc = MotorCurrent.DesignCurrent(new MotorRating(hp, false, volts, Phases.Three)).Value;
        if (flc is null) return null;
        var protection = ShortCircuitProtection.Maximum(new ProtectionInput(flc.Value, device, Phases.Three)).Value;
        if (protection is null) return null;
        var wire = Ampacity.Minimum(BranchConductors.RequiredAmpacity(new BranchInput(flc.Value)).Value!.Value, c).Value;
        return (flc.Value, protection.Value, wire);
    }
}
