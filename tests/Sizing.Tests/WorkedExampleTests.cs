using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Published worked examples where one was at hand; otherwise a hand calculation written out in
/// the comment, marked as such, so a reviewer can redo it with the code book open.
/// </summary>
public class WorkedExampleTests
{
    private static readonly InstallationConditions Copper60 = new(ConductorMaterial.Copper, InsulationRating: 60, TerminationRating: 60);

    // Single motor branch circuit. Source: electricianmath.com, "Motor Conductors" (worked example):
    // 5 hp, 240 V single-phase -> FLC 28 A; x 125 % = 35 A; 60 C column -> 8 AWG (10 AWG is only 30 A).
    [Fact]
    public void SingleMotorBranchCircuit()
    {
        var flc = MotorCurrent.DesignCurrent(new MotorRating(5, false, 240, Phases.Single));
        Assert.Equal(28m, flc.Value);
        var required = BranchConductors.RequiredAmpacity(new BranchInput(28m));
        Assert.Equal(35m, required.Value);
        var wire = Ampacity.Minimum(35m, Copper60);
        Assert.Equal(WireSpec.Single(ConductorSize.Parse("8")), wire.Value);
        Assert.Contains(flc.Steps, s => s.Rule.Contains("Table 430.248"));
    }

    // Multi-motor feeder. Source: electricianmath.com, "Motor Conductors" (worked example):
    // four 5 hp 240 V single-phase motors at 28 A: 35 + 3 x 28 = 119 A -> 1/0 AWG at 60 C (125 A; 1 AWG is 110 A).
    // (The page quotes 100 A for 1 AWG, the pre-2011 value; the 2023 table gives 110 A, still too small.)
    [Fact]
    public void MultiMotorFeeder()
    {
        var motors = Enumerable.Range(1, 4).Select(i => new FeederMotor($"M{i}", 28m, 70m)).ToList();
        var required = Feeders.RequiredAmpacity(motors, []);
        Assert.Equal(119m, required.Value);
        Assert.Equal(WireSpec.Single(ConductorSize.Parse("1/0")), Ampacity.Minimum(119m, Copper60).Value);
    }

    // 10 hp 460 V three-phase: Table 430.250 gives 14 A (also quoted for 480 V in forums.mikeholt.com thread "Motors", post 140).
    // Hand calculation, Table 430.52(C)(1): inverse-time 250 % = 35 A (a standard rating); dual-element 175 % = 24.5 A -> 25 A;
    // non-time-delay 300 % = 42 A -> 45 A; instantaneous 800 % = 112 A setting; design B premium 1100 % = 154 A.
    [Theory]
    [InlineData(ProtectiveDevice.InverseTimeBreaker, Efficiency.Standard, 35)]
    [InlineData(ProtectiveDevice.DualElementFuse, Efficiency.Standard, 25)]
    [InlineData(ProtectiveDevice.NonTimeDelayFuse, Efficiency.Standard, 45)]
    [InlineData(ProtectiveDevice.InstantaneousTripBreaker, Efficiency.Standard, 112)]
    [InlineData(ProtectiveDevice.InstantaneousTripBreaker, Efficiency.Premium, 154)]
    public void ShortCircuitProtectionFor10Hp460V(ProtectiveDevice device, Efficiency efficiency, int expected)
    {
        var flc = MotorCurrent.DesignCurrent(new MotorRating(10, false, 480, Phases.Three)).Value!.Value;
        Assert.Equal(14m, flc);
        var max = ShortCircuitProtection.Maximum(new ProtectionInput(flc, device, Phases.Three, Design: DesignLetter.B, Efficiency: efficiency));
        Assert.Equal(expected, max.Value);
    }

    // Hand calculation, 430.52(C)(1)(b): a 10 hp 460 V motor (14 A) that will not start on its table rating:
    // inverse-time <= 400 % = 56 A -> 50 A (round down, "shall in no case exceed"); dual-element <= 225 % = 31.5 A -> 30 A.
    [Theory]
    [InlineData(ProtectiveDevice.InverseTimeBreaker, 50)]
    [InlineData(ProtectiveDevice.DualElementFuse, 30)]
    [InlineData(ProtectiveDevice.NonTimeDelayFuse, 50)]
    public void HardStartMaximums(ProtectiveDevice device, int expected)
    {
        var max = ShortCircuitProtection.Maximum(new ProtectionInput(14m, device, Phases.Three, HardStart: true));
        Assert.Equal(expected, max.Value);
    }

    // Wound-rotor motor. Hand calculation, no published example at hand: 50 hp 460 V -> 65 A (Table 430.250);
    // Table 430.52(C)(1) wound-rotor inverse-time 150 % = 97.5 A -> next standard 100 A (430.52(C)(1)(a));
    // conductors 125 % = 81.25 A -> 4 AWG Cu at 75 C (85 A).
    [Fact]
    public void WoundRotorMotor()
    {
        var rating = new MotorRating(50, false, 460, Phases.Three, MotorKind.WoundRotor);
        var flc = MotorCurrent.DesignCurrent(rating).Value!.Value;
        Assert.Equal(65m, flc);
        Assert.Equal(100m, ShortCircuitProtection.Maximum(new ProtectionInput(flc, ProtectiveDevice.InverseTimeBreaker, Phases.Three, MotorKind.WoundRotor)).Value);
        var wire = Ampacity.Minimum(BranchConductors.RequiredAmpacity(new BranchInput(flc)).Value!.Value,
            new InstallationConditions(InsulationRating: 75, TerminationRating: 75));
        Assert.Equal("4 AWG", wire.Value.ToString());
    }

    // Duty-cycle motor. Hand calculation from Table 430.22(E): intermittent duty, 15-minute rated motor,
    // nameplate 20 A -> 85 % = 17 A; varying duty, continuous rated -> 200 % = 40 A.
    [Theory]
    [InlineData(DutyKind.Intermittent, DutyRating.Minutes15, 17)]
    [InlineData(DutyKind.Varying, DutyRating.Continuous, 40)]
    [InlineData(DutyKind.ShortTime, DutyRating.Minutes5, 22)]
    public void DutyCycleMotor(DutyKind duty, DutyRating rating, decimal expected)
    {
        var r = BranchConductors.RequiredAmpacity(new BranchInput(18m, NameplateAmps: 20m, Duty: duty, Rating: rating));
        Assert.Equal(expected, r.Value);
        Assert.Contains(r.Steps, s => s.Rule.Contains("430.22(E)"));
    }

    // Ambient and bundling. Hand calculation: 10 AWG Cu THHN (90 C column 40 A, Table 310.16) at 40 C ambient
    // (x 0.91, Table 310.15(B)(1)(1)) with 6 current-carrying conductors (x 0.80, Table 310.15(C)(1)) = 29.12 A;
    // below the 75 C termination value (35 A), so 29.12 A is allowable.
    [Fact]
    public void AmbientAndBundlingCorrections()
    {
        var c = new InstallationConditions(InsulationRating: 90, TerminationRating: 75, AmbientCelsius: 40, CurrentCarrying: 6);
        var r = Ampacity.Allowable(WireSpec.Single(ConductorSize.Parse("10")), c);
        Assert.Equal(29.12m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC Table 310.15(B)(1)(1)" && s.Value == "× 0.91");
        Assert.Contains(r.Steps, s => s.Rule == "NEC Table 310.15(C)(1)" && s.Value == "× 0.8");
    }

    // Hand calculation: 10 AWG Cu THHN at 30 C, 3 conductors: 40 A (90 C) but 75 C terminations limit it to 35 A.
    [Fact]
    public void TerminationsLimitTheNinetyDegreeColumn()
    {
        var r = Ampacity.Allowable(WireSpec.Single(ConductorSize.Parse("10")), new InstallationConditions(InsulationRating: 90, TerminationRating: 75));
        Assert.Equal(35m, r.Value);
    }

    // 110.14(C)(1)(a): unmarked terminations on a 14-1 AWG circuit are 60 C, except design B/C/D motors (75 C).
    // Hand calculation: 10 AWG Cu THHN, unmarked -> 30 A; for a design B motor -> 35 A.
    // NFPA 70-2023 110.14(C), Table 310.16: the columns are 60, 75 and 90 C. A termination rating
    // written as 8 C (a typo) or 105 C is none of them: no ampacity is given rather than a column guessed.
    [Theory]
    [InlineData(8)]
    [InlineData(105)]
    public void ATerminationRatingThatIsNoColumnGivesNoAmpacity(int termination)
    {
        var r = Ampacity.Allowable(WireSpec.Single(ConductorSize.Parse("10")), new InstallationConditions(InsulationRating: 90, TerminationRating: termination));
        Assert.Null(r.Value);
        Assert.Contains("not a column of Table 310.16", r.Unavailable);
        Assert.Null(Ampacity.AllowableAmps(WireSpec.Single(ConductorSize.Parse("10")), new InstallationConditions(InsulationRating: 75, TerminationRating: termination)));
    }

    [Fact]
    public void UnmarkedTerminationsDependOnTheDesignLetter()
    {
        var c = new InstallationConditions(InsulationRating: 90);
        Assert.Equal(30m, Ampacity.Allowable(WireSpec.Single(ConductorSize.Parse("10")), c).Value);
        Assert.Equal(35m, Ampacity.Allowable(WireSpec.Single(ConductorSize.Parse("10")), c, designBcdMotor: true).Value);
    }

    // Parallel sets. Hand calculation: 2 x 250 kcmil Cu, 75 C: 2 x 255 = 510 A (310.10(G), Table 310.16).
    [Fact]
    public void ParallelSets()
    {
        Assert.Equal(510m, Ampacity.Allowable(new WireSpec(2, ConductorSize.Parse("250")), new InstallationConditions(TerminationRating: 75)).Value);
        var min = Ampacity.Minimum(800m, new InstallationConditions(InsulationRating: 75, TerminationRating: 75));
        // Parallel sets of at most 500 kcmil (common practice, no source): 2 x 500 = 760 A is short; 3 x 300 = 855 A.
        Assert.Equal("3x 300 kcmil", min.Value.ToString());
    }

    // Voltage drop. Hand calculation with Chapter 9 Table 9 note 2: 2/0 Cu in steel conduit, R 0.10, XL 0.054 ohm/1000 ft,
    // PF 0.85 (sin 0.5268): Ze = 0.085 + 0.02845 = 0.11345 ohm/1000 ft; 65 A over 1000 ft at 480 V three-phase:
    // 1.732 x 65 x 0.11345 = 12.77 V = 2.66 %.
    [Fact]
    public void VoltageDropFromTable9()
    {
        var r = VoltageDrop.Of(65m, 1000m, WireSpec.Single(ConductorSize.Parse("2/0")), 480m, Phases.Three,
            ConductorMaterial.Copper, RacewayType.Emt, 0.85m);
        Assert.Equal(12.77m, Math.Round(r.Value!.Value.Volts, 2));
        Assert.Equal(2.66m, Math.Round(r.Value.Value.Percent, 2));
    }

    // Starting drop. Hand calculation: 15 hp 480 V design B, Table 430.251(B) 116 A, 100 ft of 10 AWG Cu in EMT (R 1.2,
    // XL 0.063 ohm/1000 ft), starting PF 0.35 (common practice, no source; sin = 0.9367): Ze = 0.42 + 0.0590 = 0.4790;
    // 1.732 x 116 x 0.4790 x 0.1 = 9.62 V = 2.0 % of 480 V.
    [Fact]
    public void StartingVoltageDrop()
    {
        var r = VoltageDrop.Starting(116m, 100m, WireSpec.Single(ConductorSize.Parse("10")), 480m, Phases.Three, ConductorMaterial.Copper, RacewayType.Emt);
        Assert.Equal(9.62m, Math.Round(r.Value!.Value.Volts, 2));
        Assert.Equal(2.0m, Math.Round(r.Value.Value.Percent, 1));
        Assert.Contains(r.Steps, s => s.Label == "Starting voltage drop");
    }

    // Single-phase doubles the one-way length: hand calculation, 12 AWG Cu in PVC (R 2.0, XL 0.054), PF 1.0:
    // Ze = 2.0; 2 x 16 A x 2.0 x 100 ft / 1000 = 6.4 V = 2.67 % of 240 V.
    [Fact]
    public void SinglePhaseVoltageDrop()
    {
        var r = VoltageDrop.Of(16m, 100m, WireSpec.Single(ConductorSize.Parse("12")), 240m, Phases.Single,
            ConductorMaterial.Copper, RacewayType.Pvc, 1.0m);
        Assert.Equal(6.4m, Math.Round(r.Value!.Value.Volts, 2));
    }

    // Conduit fill. Hand calculation with Chapter 9 Tables 1, 4, 5: 3 x 3/0 THHN (0.2679) + 1 x 6 THHN (0.0507)
    // = 0.8544 in2; EMT at 40 %: 1-1/2 in holds 0.8144 (too small), 2 in holds 1.3424 -> 2 in.
    // 4 x 10 AWG THHN = 0.0844 in2 -> 1/2 in EMT (0.1216).
    [Fact]
    public void ConduitFillSmallestTradeSize()
    {
        var big = ConduitFill.SmallestTradeSize(new RacewayContents(3, ConductorSize.Parse("3/0"), ConductorSize.Parse("6")), RacewayType.Emt, "THHN");
        Assert.Equal("2", big.Value!.Value.Name);
        var small = ConduitFill.SmallestTradeSize(new RacewayContents(3, ConductorSize.Parse("10"), ConductorSize.Parse("10")), RacewayType.Emt, "THHN");
        Assert.Equal("1/2", small.Value!.Value.Name);
        Assert.False(ConduitFill.SmallestTradeSize(new RacewayContents(3, ConductorSize.Parse("10"), null), RacewayType.Emt, "XHHW-2").HasValue);
    }

    // Overloads, 430.32(A)(1) and (C). Hand calculation: nameplate 19.6 A with SF 1.15 -> 125 % = 24.5 A, max 140 % = 27.44 A;
    // SF 1.0 and no temperature rise -> 115 % = 22.54 A, max 130 % = 25.48 A; 40 C rise -> 125 %.
    [Fact]
    public void OverloadLimits()
    {
        Assert.Equal(24.5m, Overloads.Maximum(19.6m, 1.15m, null).Value);
        Assert.Equal(27.44m, Overloads.AbsoluteMaximum(19.6m, 1.15m, null).Value);
        Assert.Equal(22.54m, Overloads.Maximum(19.6m, 1.0m, null).Value);
        Assert.Equal(25.48m, Overloads.AbsoluteMaximum(19.6m, 1.0m, null).Value);
        Assert.Equal(24.5m, Overloads.Maximum(19.6m, null, 40m).Value);
        Assert.False(Overloads.Maximum(null, 1.15m, null).HasValue);
    }

    // Locked-rotor current from the code letter, Equation 430.110(C)(1)a. Hand calculation: 15 hp 460 V three-phase,
    // letter G (5.6-6.29 kVA/hp): 5.6 x 1000 x 15 / (460 x 1.7321) = 105.43 A; 6.29 -> 118.42 A.
    [Fact]
    public void LockedRotorFromCodeLetter()
    {
        var r = LockedRotor.FromCodeLetter(15m, 460m, Phases.Three, CodeLetter.G).Value!.Value;
        Assert.Equal(105.43m, Math.Round(r.Minimum, 2));
        Assert.Equal(118.42m, Math.Round(r.Maximum!.Value, 2));
        Assert.Null(LockedRotor.FromCodeLetter(15m, 460m, Phases.Three, CodeLetter.V).Value!.Value.Maximum);
    }

    // Table 430.251(B): 15 hp 480 V design B -> 116 A (460 V column by the system-voltage range); design A is not limited.
    [Fact]
    public void LockedRotorTableMaximum()
    {
        Assert.Equal(116m, LockedRotor.TableMaximum(15m, 480m, Phases.Three, DesignLetter.B).Value);
        Assert.False(LockedRotor.TableMaximum(15m, 480m, Phases.Three, DesignLetter.A).HasValue);
        Assert.Equal(300m, LockedRotor.TableMaximum(10m, 240m, Phases.Single, null).Value);
    }

    // 430.110(A): 115 % of FLC. Hand calculation: 21 A x 1.15 = 24.15 A, 15 hp.
    // 430.110(C)(1): two 10 hp 460 V motors: FLC 28 A -> 20 hp (27 A is short), LRC 162 A -> 25 hp (145 A short, 183 A ok).
    [Fact]
    public void Disconnects115PercentAndEquivalentHorsepower()
    {
        Assert.Equal(new DisconnectRating(24.15m, 15m), Disconnects.ForMotor(21m, 15m).Value);
        var group = Disconnects.ForGroup(28m, 162m, 460m, Phases.Three).Value!.Value;
        Assert.Equal(25m, group.MinimumHorsepower);
    }

    // Table 250.122 with 250.122(D)(1) and (B). Hand calculation: 35 A inverse-time breaker -> 10 AWG Cu (60 A row);
    // phase conductors upsized from 10 AWG (10 380 cmil) to 6 AWG (26 240 cmil) for voltage drop: ratio 2.528, so the
    // grounding conductor grows to at least 26 240 cmil -> 6 AWG.
    [Fact]
    public void GroundingConductor()
    {
        Assert.Equal(ConductorSize.Parse("10"), Grounding.Minimum(35m, ConductorMaterial.Copper).Value);
        var upsized = Grounding.Minimum(35m, ConductorMaterial.Copper, WireSpec.Single(ConductorSize.Parse("6")), WireSpec.Single(ConductorSize.Parse("10")));
        Assert.Equal(ConductorSize.Parse("6"), upsized.Value);
        Assert.Contains(upsized.Steps, s => s.Rule == "NEC 250.122(B)");
        // 250.122(A): never larger than the circuit conductors - 200 A device (6 AWG) on a 10 AWG circuit stays 10 AWG.
        Assert.Equal(ConductorSize.Parse("10"), Grounding.Minimum(200m, ConductorMaterial.Copper, WireSpec.Single(ConductorSize.Parse("10"))).Value);
    }

    // NEMA starter suggestion (as collected in nema-starters.csv, not checked against NEMA ICS 2 itself): size 1 is rated
    // 10 hp at 460-575 V, so a 10 hp 480 V motor gets size 1. A 380 V motor falls in none of the 200, 230 and 460-575 V columns,
    // and gets no suggestion rather than the 460 V column's.
    [Fact]
    public void NemaStarterOnlyForTheVoltagesItsColumnsAreFor()
    {
        Assert.Equal(2, Controllers.NemaSize(10m, 480m, out var size).Value); // third row: 00, 0, 1
        Assert.Equal("1", size);
        var other = Controllers.NemaSize(10m, 380m, out _);
        Assert.Null(other.Value);
        Assert.Contains("380 V", other.Unavailable);
    }

    // 250.122(B) with no size large enough. Table 250.122: 6000 A -> 800 kcmil Cu. Phase conductors 10 sets of 2000 kcmil
    // (20 000 000 cmil) where 2 sets of 1/0 (2 x 105 600 = 211 200 cmil) would do: ratio 94.7, so the grounding conductor
    // would need 800 000 x 94.7 = 75.8 million cmil, beyond 2000 kcmil: no size is given rather than the unincreased 800 kcmil.
    // A single 2000 kcmil set over a 1/0 minimum needs 15.2 million cmil too, but 250.122(A) caps it at the phase conductor.
    [Fact]
    public void GroundingConductorIncreaseBeyondTheLargestSizeIsNotGuessed()
    {
        var parallel = Grounding.Minimum(6000m, ConductorMaterial.Copper, new WireSpec(10, ConductorSize.Parse("2000")), new WireSpec(2, ConductorSize.Parse("1/0")));
        Assert.Null(parallel.Value);
        Assert.Contains("250.122(B)", parallel.Unavailable);
        var single = Grounding.Minimum(6000m, ConductorMaterial.Copper, WireSpec.Single(ConductorSize.Parse("2000")), WireSpec.Single(ConductorSize.Parse("1/0")));
        Assert.Equal(ConductorSize.Parse("2000"), single.Value);
    }

    // 250.122(D)(2): instantaneous-trip breaker -> size from the dual-element fuse 430.52 would allow.
    // Hand calculation: 14 A motor, 175 % = 24.5 A -> 25 A fuse -> 10 AWG Cu (60 A row).
    [Fact]
    public void GroundingConductorForInstantaneousTrip()
    {
        var p = new ProtectionInput(14m, ProtectiveDevice.InstantaneousTripBreaker, Phases.Three);
        Assert.Equal(ConductorSize.Parse("10"), Grounding.ForInstantaneousTrip(p, ConductorMaterial.Copper).Value);
    }

    // Feeder protection, 430.62(A). Hand calculation: 460 V motors of 10 hp (14 A, inverse-time max 35 A),
    // 15 hp (21 A, 52.5 -> 60 A) and 20 hp (27 A, 67.5 -> 70 A): 70 + 14 + 21 = 105 A -> round down to 100 A.
    // Two equal largest devices: two 20 hp -> 70 + 27 = 97 A -> 90 A (one counts as the largest).
    [Fact]
    public void FeederProtection()
    {
        var motors = new[] { new FeederMotor("A", 14m, 35m), new FeederMotor("B", 21m, 60m), new FeederMotor("C", 27m, 70m) };
        Assert.Equal(100m, Feeders.MaximumProtection(motors, [], fuse: false).Value);
        Assert.Equal(90m, Feeders.MaximumProtection([new FeederMotor("C", 27m, 70m, Quantity: 2)], [], fuse: false).Value);
    }

    // Feeder conductors with other loads, 430.24. Hand calculation: motors 27 A (largest) and 14 A; continuous
    // load 10 A, non-continuous 6 A: 1.25 x 27 + 14 + 6 + 1.25 x 10 = 66.25 A.
    [Fact]
    public void FeederConductorsWithOtherLoads()
    {
        var r = Feeders.RequiredAmpacity([new FeederMotor("A", 14m, 35m), new FeederMotor("C", 27m, 70m)],
            [new FeederLoad("L1", 10m, true), new FeederLoad("L2", 6m, false)]);
        Assert.Equal(66.25m, r.Value);
    }

    // Drive-fed motor, 430.122(A): 125 % of the drive's rated input current. Hand calculation: 62 A -> 77.5 A.
    [Fact]
    public void DriveInputCurrent()
    {
        Assert.Equal(77.5m, BranchConductors.RequiredAmpacity(new BranchInput(65m, Starting: StartingMethod.Drive, DriveInputAmps: 62m)).Value);
        Assert.False(BranchConductors.RequiredAmpacity(new BranchInput(65m, Starting: StartingMethod.Drive)).HasValue);
    }

    // Wye-delta, 430.22(C): conductors between controller and motor at 72 % of FLC; line side stays at 125 %.
    [Fact]
    public void WyeDeltaMotorConductors()
    {
        var r = BranchConductors.RequiredAmpacity(new BranchInput(100m, Starting: StartingMethod.WyeDelta));
        Assert.Equal(125m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC 430.22(C)" && s.Value == "72 A");
    }
}
