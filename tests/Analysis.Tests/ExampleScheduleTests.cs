using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Reports;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// The example files against schedules checked by hand with the code tables. Each row's hand
/// calculation is written beside it (source: hand calculation; tables as named).
/// </summary>
public class ExampleScheduleTests
{
    private static AnalysisResult Example(string name)
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        return Analyzer.Analyze(File.ReadAllText(Path.Combine(dir, "examples", name)));
    }

    private static ScheduleRow Row(AnalysisResult a, string tag) => Schedule.Of(a).Rows.Single(r => r.Tag == tag);

    [Fact]
    public void PressLine()
    {
        var a = Example("press-line.motors");
        Assert.Empty(a.Findings);

        // PR-301, 100 hp 460 V wye-delta: Table 430.250 124 A. Line side 125 % = 155 A -> 2/0 AWG (175 A at 75 C).
        // Leads 72 % x 124 = 89.28 A (430.22(C)) -> 3 AWG (100 A). Overload in the delta leads: 125 % x 118 / sqrt 3 = 85.16 A.
        var pr = a.Motors.Values.Single(m => m.Tag == "PR-301");
        Assert.Equal(89.28m, pr.LeadAmpacity!.Value);
        Assert.Equal("3 AWG", pr.MinimumLeads!.Value.ToString());
        Assert.Equal(85.16m, decimal.Round(pr.OverloadLimit!.Value!.Value, 2));
        Assert.Equal(("2/0 AWG; leads 3 AWG", "2/0 AWG; leads 3 AWG"), (Row(a, "PR-301").MinimumWire, Row(a, "PR-301").Wire));
        // Its control transformer (430.72(C)): 250 VA / 480 V = 0.5208 A primary; 250 / 120 = 2.083 A secondary, whose 3 A
        // fuse is within 167 % (3.48 A, Table 450.3(B)), so the primary may be 250 % = 1.30 A, or under 2 A 500 % = 2.60 A
        // (430.72(C)(4)): 2.60 A. The 3 A secondary fuse protects 14 AWG copper (Column A, 15 A, Table 430.72(B)).
        Assert.Equal(2.6m, decimal.Round(pr.ControlPrimaryLimit!.Value!.Value, 2));
        Assert.Equal(15m, pr.ControlConductorLimit!.Value);
        Assert.Equal(3, pr.OverloadUnitsRequired!.Value);

        // TC-302, 30 hp 460 V (40 A) on a 36 A drive with a bypass: 430.122(C) max(45, 50) = 50 A -> 8 AWG (50 A).
        // Output conductors 430.122(B) 125 % x 40 = 50 A: the branch 8 AWG. Breaker: 430.52 250 % x 40 = 100 A, marked 60 A.
        var tc = a.Motors.Values.Single(m => m.Tag == "TC-302");
        Assert.Equal(50m, tc.RequiredAmpacity!.Value);
        Assert.Equal(60m, tc.MaximumProtection!.Value);

        // HP-303: capacitor 7.5 kvar at 480 V: 7500 / (1.7320508 x 480) = 9.02 A; 135 % = 12.18 A; one third of 8 AWG THHN
        // at 90 C (55 A) = 18.33 A governs (460.8(A)). Overload from the 26.5 A improved current: 125 % = 33.13 A (460.9).
        var hp = a.Motors.Values.Single(m => m.Tag == "HP-303");
        Assert.Equal(9.02m, decimal.Round(hp.CapacitorRatedCurrent!.Value!.Value, 2));
        Assert.Equal(18.33m, decimal.Round(hp.CapacitorRequiredAmpacity!.Value!.Value, 2));
        Assert.Equal(33.125m, hp.OverloadLimit!.Value);

        // Feeder: 430.24: 125 % x 124 + 40 + 34 = 229 A -> 4/0 AWG (230 A). 430.62(A): 350 + 40 + 34 = 424 -> 400 A.
        var f = a.Feeders.Values.Single();
        Assert.Equal(229m, f.RequiredAmpacity!.Value);
        Assert.Equal(400m, f.MaximumProtection!.Value);
    }

    [Fact]
    public void LaundryPlant()
    {
        var a = Example("laundry-plant.motors");
        Assert.Empty(a.Findings);

        // MCC-W, 430.24 Exception No. 3: HP-1A and HP-1B (30 hp, 40 A each, Table 430.250 460 V) never run together.
        // Running: 125 % x 40 + FD-1 4.8 + CV-G's 14 + 7.6 + 7.6 = 84 A; all of them would be 124 A.
        var mcc = a.Feeders.Values.Single(f => f.Tag == "MCC-W");
        Assert.Equal(84m, mcc.RequiredAmpacity!.Value);
        // 430.62(A) counts every motor: 100 A (HP-1A, 250 % x 40) + 40 + 4.8 + 29.2 = 174 -> 150 A.
        Assert.Equal(150m, mcc.MaximumProtection!.Value);

        // CV-G, 430.53(C)(4): 35 A (CV-1: 250 % x 14) + 7.6 + 7.6 = 50.2 A -> 50 A; 8 AWG at 75 C (50 A) is not above the sum.
        // 430.110(C): 29.2 A -> 25 hp (34 A); locked-rotor 81 + 46 + 46 = 173 A -> 25 hp (183 A, Table 430.251(B)); 115 % = 33.58 A.
        var group = a.Feeders.Values.Single(f => f.Tag == "CV-G");
        Assert.Equal(50m, group.MaximumProtection!.Value);
        Assert.Equal(25m, group.Disconnect!.Value!.Value.MinimumHorsepower);
        Assert.Equal(33.58m, group.Disconnect.Value.Value.MinimumAmps);
        // CV-2's 20 ft tap: one third of 50 A (430.53(D)(2)).
        Assert.Equal(50m / 3m, a.Motors.Values.Single(m => m.Tag == "CV-2").TapAmpacity!.Value);
        // Its own 430.52 maximum is no limit on a device it does not have: the schedule names the circuit's instead.
        Assert.Equal("by CV-G", Row(a, "CV-2").MaximumProtection);

        // BC-12, 430.53(A): 20 A at 120 V; 430.24: 125 % x 5.8 + 5.8 = 13.05 A (Table 430.248, 115 V column).
        var fans = a.Feeders.Values.Single(f => f.Tag == "BC-12");
        Assert.Equal(20m, fans.MaximumProtection!.Value);
        Assert.Equal(13.05m, fans.RequiredAmpacity!.Value);
    }

    [Fact]
    public void DairyBottlingHall()
    {
        var a = Example("dairy-bottling.motors");
        Assert.Empty(a.Findings);

        // P-101, 15 hp 480 V: Table 430.250 -> 21 A. 430.22: 26.25 A. THHN at 40 C: x 0.91 (Table 310.15(B)(1)(1));
        // design B -> 75 C terminations (110.14(C)(1)(a)(4)): 12 AWG = min(30 x 0.91, 25) = 25 A short; 10 AWG = min(36.4, 35) = 35 A.
        // Dual-element fuse 175 % x 21 = 36.75 -> 40 A (430.52(C)(1)(a)). Overload 125 % x 18.5 = 23.13 A (SF 1.15).
        // Disconnect 115 % x 21 = 24.15 A. Ground: 35 A fuse -> 10 AWG (Table 250.122).
        // Drop: Ze = 1.2 x 0.85 + 0.063 x 0.527 = 1.0532 ohm/kft; 1.732 x 21 x 1.0532 x 0.09 = 3.45 V = 0.72 % (Chapter 9 Table 9).
        Assert.Equal(
            new ScheduleRow("MCC-B1", "P-101", "Raw milk transfer pump", "15hp", "480 V", "21 A", "10 AWG", "10 AWG", "40 A DE fuse", "35 A DE fuse",
                "23.13 A", "23 A", "24.15 A, 15 hp", "10 AWG", "10 AWG", "0.72 % (1.37 % total)", "ok").Cells,
            Row(a, "P-101").Cells);

        // H-201 on a drive: 430.122(A) 125 % x 62 A input = 77.5 A -> 4 AWG (95 x 0.91 = 86.45, 75 C limit 85 A).
        // Ground: 150 A breaker -> 200 A row -> 6 AWG (Table 250.122).
        var h = Row(a, "H-201");
        Assert.Equal(("65 A", "4 AWG", "6 AWG"), (h.Flc, h.MinimumWire, h.MinimumGround));

        // Feeder MCC-B1, 430.24: 1.25 x 65 + (21 + 14 + 14 + 4 x 4.8) + 125 % x 18 A + 6 kVA / (1.732 x 480) = 179.17 A
        // -> 3/0 AWG (225 x 0.91 = 204.75, 75 C limit 200 A; 2/0 gives 177.45 A). 430.62(A): 175 A (H-201, 250 % x 65 = 162.5 -> 175)
        // + 68.2 A + 29.72 A of other loads = 272.9 A -> 250 A.
        var feeder = Schedule.Of(a).Feeders.Single();
        Assert.Equal(("158.42 A", "179.17 A", "3/0 AWG", "250 A"), (feeder.CalculatedLoad, feeder.RequiredAmpacity, feeder.MinimumWire, feeder.MaximumProtection));
    }

    [Fact]
    public void KesslerRidgeBoosterStation()
    {
        var a = Example("booster-station.motors");
        Assert.Empty(a.Findings.Where(f => f.Severity != Parser.Diagnostics.Severity.Information));

        // P-1, 60 hp 480 V design B premium: 77 A (Table 430.250). 430.22: 96.25 A -> 3 AWG Cu 75 C (100 A).
        // Inverse-time 250 % = 192.5 -> 200 A. Overload 125 % x 70 = 87.5 A. Ground for the 175 A breaker: 200 A row -> 6 AWG.
        var p1 = Row(a, "P-1");
        Assert.Equal(("77 A", "3 AWG", "200 A ITB", "87.5 A", "6 AWG"), (p1.Flc, p1.MinimumWire, p1.MaximumProtection, p1.OverloadLimit, p1.MinimumGround));

        // VP-1, 1 hp short-time duty, 5-min rated: 430.22(E) 110 % x 1.9 A = 2.09 A; dual-element 175 % x 2.1 = 3.68 -> 6 A (a standard fuse rating).
        var vp = Row(a, "VP-1");
        Assert.Equal(("2.1 A", "6 A DE fuse", ""), (vp.Flc, vp.MaximumProtection, vp.Overload));

        // SWBD-1 carries MCC-1 ('from'): 1.25 x 77 + 77 + 2.1 + 1.25 x 15 kVA / (1.732 x 480) = 197.89 A -> 3/0 AWG (200 A at 75 C).
        var swbd = Schedule.Of(a).Feeders.Single(f => f.Tag == "SWBD-1");
        Assert.Equal(("197.89 A", "3/0 AWG", "300 A"), (swbd.RequiredAmpacity, swbd.MinimumWire, swbd.MaximumProtection));
    }

    [Fact]
    public void CabinetShopReportsEachPlantedMistake()
    {
        var a = Example("cabinet-shop.motors");
        var codes = a.Findings.Where(f => f.Severity != Parser.Diagnostics.Severity.Information)
            .Select(f => $"{f.Range.Start.Line + 1} {f.Code}").ToList();
        // Line 11: feeder wire 2 AWG (95 A at 60 C) for 430.24's 1.25 x 50 + 16.7 + 24.2 + 10.6 = 114 A.
        // Line 12: 125 A feeder breaker needs 6 AWG (Table 250.122, 200 A row).
        // Line 18: SAW-1 14 AWG (15 A at 60 C) for 1.25 x 16.7 = 20.88 A.  Line 19: 60 A breaker over 250 % x 16.7 = 41.75 -> 45 A.
        // Line 25: DC-1 10 AWG (30 A at 60 C) for 1.25 x 24.2 = 30.25 A.   Line 27: overload 27.5 A over 115 % x 22 = 25.3 A.
        // Line 29: CMP-1 has no overload, and is a 230 V motor on 208 V.   Line 31: 6 AWG (55 A) for 1.25 x 50 = 62.5 A.
        // Line 34: PL-1 has no overload.  Line 37: 40 A breaker over 250 % x 10.6 = 26.5 -> 30 A.
        Assert.Equal(
            ["11 M107", "12 M106", "18 M101", "19 M102", "25 M101", "27 M205", "29 M203", "29 M110", "31 M101", "34 M203", "37 M102"],
            codes);
        Assert.All(a.Findings.Where(f => f.Code is FindingCodes.WireUndersized or FindingCodes.ProtectionTooLarge or FindingCodes.FeederWireUndersized),
            f => Assert.NotNull(f.Fix));
    }
}
