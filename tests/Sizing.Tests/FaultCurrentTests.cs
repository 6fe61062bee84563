using CsCheck;
using MotorLang.Domain;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Sizing.Tests;

/// <summary>The ohmic (R + jX) fault-current method against hand calculations and published values.</summary>
public class FaultCurrentTests
{
    private static decimal Bolted(decimal volts, Impedance z) => FaultCurrent.Bolted("the bus", volts, z).Value!.Value;

    [Fact]
    public void InfiniteBusTransformerSecondaryMatchesTheTextbookFormula()
    {
        // Infinite-bus secondary fault of a 1000 kVA, 480 V, 5.75 %Z transformer; the textbook formula
        // I = kVA × 1000 ÷ (√3 × V × %Z/100) (point-to-point method, from memory):
        // 1,000,000 ÷ (1.7320508 × 480 × 0.0575) = 1,000,000 ÷ 47.80460 = 20,918.5 A.
        var z = FaultCurrent.Transformer(1000m, 5.75m, 5.7m, 480m).Value!.Value;
        Assert.Equal(20918.5m, decimal.Round(Bolted(480m, z), 1));
        // The X/R splits the impedance but never changes its magnitude.
        var other = FaultCurrent.Transformer(1000m, 5.75m, 1m, 480m).Value!.Value;
        Assert.Equal(decimal.Round(z.Magnitude, 8), decimal.Round(other.Magnitude, 8));
    }

    [Fact]
    public void UtilityThroughAFeederHandWorked()
    {
        // Hand calculation, ohmic method:
        // utility 35 kA, X/R 6 at 480 V: |Zs| = 480 ÷ (√3 × 35,000) = 0.0079179 Ω;
        //   Rs = 0.0079179 ÷ √37 = 0.0013017 Ω, Xs = 6 × Rs = 0.0078102 Ω.
        // 150 ft of 3/0 AWG copper in steel conduit (NFPA 70 Chapter 9 Table 9: R 0.079, X 0.052 Ω/1000 ft):
        //   Rc = 0.01185 Ω, Xc = 0.0078 Ω.
        // Z = 0.0131517 + j0.0156102 Ω, |Z| = 0.0204119 Ω; I = 480 ÷ (√3 × 0.0204119) = 13,577 A; X/R = 1.187.
        var source = FaultCurrent.Utility(35m, 6m, 480m).Value!.Value;
        Assert.Equal(0.0013017m, decimal.Round(source.R, 7));
        Assert.Equal(0.0078102m, decimal.Round(source.X, 7));
        var run = FaultCurrent.Conductor(new WireSpec(1, ConductorSize.Parse("3/0")), 150m, ConductorMaterial.Copper, RacewayType.Rmc).Value!.Value;
        var total = source + run;
        Assert.Equal(13577m, decimal.Round(Bolted(480m, total)));
        Assert.Equal(1.187m, decimal.Round(total.XOverR!.Value, 3));
        // The utility's own point gives back its stated current.
        Assert.Equal(35000m, decimal.Round(Bolted(480m, source)));
    }

    [Fact]
    public void TransformerFedFromAUtilityHandWorked()
    {
        // Hand calculation: utility 35 kA X/R 6 at 480 V referred to 208 V: × (208/480)² = 0.187778:
        //   R 0.00024443, X 0.00146658 Ω. 75 kVA, 5 %Z, X/R 4 at 208 V: |Zt| = 0.05 × 208² ÷ 75,000 = 0.0288427 Ω,
        //   Rt = 0.0069954, Xt = 0.0279815 Ω. 8 ft of 250 kcmil Cu in steel (Table 9: R 0.054, X 0.052):
        //   0.000432 + j0.000416 Ω. Total 0.0076718 + j0.0298641 Ω, |Z| 0.0308337 Ω; I = 208 ÷ (√3 × |Z|) = 3,894.7 A.
        var z = FaultCurrent.Utility(35m, 6m, 480m).Value!.Value.Referred(480m, 208m)
                + FaultCurrent.Transformer(75m, 5m, 4m, 208m).Value!.Value
                + FaultCurrent.Conductor(new WireSpec(1, ConductorSize.Parse("250")), 8m, ConductorMaterial.Copper, RacewayType.Rmc).Value!.Value;
        Assert.Equal(3894.7m, decimal.Round(Bolted(208m, z), 1));
        // Below the infinite-bus value of the same transformer: 75,000 ÷ (√3 × 208 × 0.05) = 4,163.6 A.
        Assert.Equal(4163.6m, decimal.Round(Bolted(208m, FaultCurrent.Transformer(75m, 5m, 4m, 208m).Value!.Value), 1));
    }

    [Fact]
    public void GeneratorSubtransientHandWorked()
    {
        // 500 kVA, 480 V, X"d 15 %, pure reactance: X = 0.15 × 480² ÷ 500,000 = 0.06912 Ω;
        // I = 480 ÷ (√3 × 0.06912) = 4,009.4 A, which is the rated current 601.4 A ÷ 0.15.
        var z = FaultCurrent.Generator(500m, 15m, null, 480m).Value!.Value;
        Assert.Equal(0m, z.R);
        Assert.Equal(0.06912m, decimal.Round(z.X, 5));
        Assert.Equal(4009.4m, decimal.Round(Bolted(480m, z), 1));
        Assert.Null(z.XOverR);
    }

    [Theory]
    // NFPA 70 Chapter 9 Table 9 (shared reference section 13d), uncoated copper, ohms to neutral per 1000 ft.
    [InlineData("3/0", RacewayType.Rmc, 0.079, 0.052)]
    [InlineData("250", RacewayType.Rmc, 0.054, 0.052)]
    [InlineData("250", RacewayType.Pvc, 0.052, 0.041)]
    [InlineData("12", RacewayType.Pvc, 2.0, 0.054)]
    [InlineData("500", RacewayType.Rmc, 0.029, 0.048)]
    // EMT takes the PVC column for fault current (the lowest impedance; docs/checks.md).
    [InlineData("4/0", RacewayType.Emt, 0.062, 0.041)]
    public void ConductorImpedanceIsTable9PerThousandFeet(string size, RacewayType raceway, double r, double x)
    {
        var z = FaultCurrent.Conductor(new WireSpec(1, ConductorSize.Parse(size)), 1000m, ConductorMaterial.Copper, raceway).Value!.Value;
        Assert.Equal((decimal)r, z.R);
        Assert.Equal((decimal)x, z.X);
        var two = FaultCurrent.Conductor(new WireSpec(2, ConductorSize.Parse(size)), 1000m, ConductorMaterial.Copper, raceway).Value!.Value;
        Assert.Equal((decimal)r / 2, two.R);
    }

    [Fact]
    public void ASizeTable9LacksIsReportedNotGuessed()
    {
        // Table 9 has no 700 kcmil row.
        var r = FaultCurrent.Conductor(new WireSpec(1, ConductorSize.Parse("700")), 100m, ConductorMaterial.Copper, RacewayType.Rmc);
        Assert.False(r.HasValue);
        Assert.Contains("Table 9", r.Unavailable);
    }

    [Fact]
    public void AnInfiniteBusWithNothingBetweenHasNoFiniteCurrent() =>
        Assert.False(FaultCurrent.Bolted("the service", 480m, Impedance.Zero).HasValue);

    [Fact]
    public void MotorContributionIsFourTimesFullLoadCurrentAndShownApart()
    {
        var r = FaultCurrent.MotorContribution(100m, 10000m);
        Assert.Equal(10400m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "common practice, no source");
    }

    private static readonly string[] Table9Sizes =
        ["14", "12", "10", "8", "6", "4", "2", "1/0", "2/0", "3/0", "4/0", "250", "350", "500", "750", "1000"];

    private static readonly Gen<(ConductorSize Size, int Sets, decimal Feet, RacewayType Raceway)> Run =
        Gen.Select(Gen.Int[0, Table9Sizes.Length - 1], Gen.Int[1, 4], Gen.Int[1, 2000], Gen.OneOfConst(RacewayType.Emt, RacewayType.Rmc, RacewayType.Pvc))
            .Select((i, sets, feet, raceway) => (ConductorSize.Parse(Table9Sizes[i]), sets, (decimal)feet, raceway));

    [Fact]
    public void FaultCurrentNeverIncreasesDownstream() =>
        Gen.Select(Gen.Int[5, 200], Gen.Int[2, 20], Run.Array[1, 6]).Sample((ka, xr, runs) =>
        {
            var z = FaultCurrent.Utility(ka, xr, 480m).Value!.Value;
            var before = Bolted(480m, z);
            foreach (var run in runs)
            {
                z += FaultCurrent.Conductor(new WireSpec(run.Sets, run.Size), run.Feet, ConductorMaterial.Copper, run.Raceway).Value!.Value;
                var after = Bolted(480m, z);
                Assert.True(after < before, $"{after} A after a {run.Feet} ft run is not below {before} A");
                before = after;
            }
        }, iter: 500);

    [Fact]
    public void AddingConductorLengthNeverRaisesTheFaultCurrent() =>
        Gen.Select(Run, Gen.Int[1, 500]).Sample((run, more) =>
        {
            var source = FaultCurrent.Utility(42m, 8m, 480m).Value!.Value;
            var wire = new WireSpec(run.Sets, run.Size);
            var shorter = Bolted(480m, source + FaultCurrent.Conductor(wire, run.Feet, ConductorMaterial.Copper, run.Raceway).Value!.Value);
            var longer = Bolted(480m, source + FaultCurrent.Conductor(wire, run.Feet + more, ConductorMaterial.Copper, run.Raceway).Value!.Value);
            Assert.True(longer <= shorter);
        }, iter: 1000);

    [Fact]
    public void FaultCurrentRisesWithTransformerKvaAndFallsWithImpedance() =>
        Gen.Select(Gen.Int[15, 2500], Gen.Int[1, 500], Gen.Int[150, 800], Gen.Int[1, 300]).Sample((kva, moreKva, tenthsZ, moreZ) =>
        {
            var upstream = FaultCurrent.Utility(50m, 10m, 480m).Value!.Value.Referred(480m, 208m);
            decimal At(decimal k, decimal pz) => Bolted(208m, upstream + FaultCurrent.Transformer(k, pz, 5m, 208m).Value!.Value);
            var pctZ = tenthsZ / 100m;
            Assert.True(At(kva + moreKva, pctZ) > At(kva, pctZ));
            Assert.True(At(kva, pctZ + moreZ / 100m) < At(kva, pctZ));
        }, iter: 1000);
}
