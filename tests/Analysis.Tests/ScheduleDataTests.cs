using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Analysis.Tests;

/// <summary>The typed schedule: numbers with units, line numbers, and findings on the row they belong to.</summary>
public class ScheduleDataTests
{
    private static string Example(string name)
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        return File.ReadAllText(Path.Combine(dir, "examples", name));
    }

    [Fact]
    public void TitleBlockIsTakenFromTheProjectBlockAsWritten()
    {
        var data = ScheduleDataBuilder.Of(Analyzer.Analyze(Example("dairy-bottling.motors")));
        Assert.Equal(new TitleBlock("Pinecrest Dairy Co-op - Bottling Hall", "PDC-2611", "B", "2026-12-03", "M. Halvorsen", "T. Adeyemi"), data.Title);

        // Unwritten lines stay null (the report prints nothing for them, never a placeholder).
        var bare = ScheduleDataBuilder.Of(Analyzer.Analyze("project \"Shed\"\n  revision \"0\"\nfeeder F-1 480V 3ph\n"));
        Assert.Equal(new TitleBlock("Shed", null, "0", null, null, null), bare.Title);
    }

    // The press flywheel motor's control circuit in the schedule (hand calculation in ExampleScheduleTests): Table 430.72(B)
    // Column A for 14 AWG copper 15 A; 430.72(C)(4) primary 500 % x 250 VA / 480 V = 2.6042 A; Table 430.37 three units.
    [Fact]
    public void PressLineRowCarriesTheControlCircuit()
    {
        var data = ScheduleDataBuilder.Of(Analyzer.Analyze(Example("press-line.motors")), "press-line.motors");
        var pr = data.Motors.Single(m => m.Tag == "PR-301");
        Assert.Equal(new Measure(15, "A"), pr.ControlConductorLimit);
        Assert.Equal(2.6042m, Assert.NotNull(pr.ControlPrimaryLimit).Value, 4);
        Assert.Equal(3, pr.OverloadUnitsRequired);
        var tc = data.Motors.Single(m => m.Tag == "TC-302");
        Assert.Equal((null, null, null), (tc.ControlConductorLimit, tc.ControlPrimaryLimit, tc.OverloadUnitsRequired));
    }

    // examples/laundry-plant.motors: the group circuit's permission and its 430.110(C) disconnect
    // (29.2 A -> 25 hp, 115 % = 33.58 A; see ExampleScheduleTests), the demand-free MCC, and a tap's
    // 430.53(D)(2) one third of the 8 AWG circuit (50 A at 75 C): 16.67 A.
    [Fact]
    public void GroupCircuitRowsSayWhatProtectsThem()
    {
        var data = ScheduleDataBuilder.Of(Analyzer.Analyze(Example("laundry-plant.motors")));
        var group = data.Feeders.Single(f => f.Tag == "CV-G");
        Assert.Equal(("listed-group", new Measure(25, "hp"), new Measure(33.58m, "A")), (group.BranchGroup, group.DisconnectMinimumPower, group.DisconnectMinimumCurrent));
        Assert.Null(data.Feeders.Single(f => f.Tag == "MCC-W").BranchGroup);
        var tap = data.Motors.Single(m => m.Tag == "CV-2");
        Assert.Equal("CV-G", tap.ProtectedBy);
        Assert.Equal(16.67m, decimal.Round(tap.TapRequiredAmpacity!.Value.Value, 2));
        Assert.Null(data.Motors.Single(m => m.Tag == "FD-1").ProtectedBy);
    }

    [Fact]
    public void DairyMotorRowHoldsNumbersWithUnits()
    {
        var data = ScheduleDataBuilder.Of(Analyzer.Analyze(Example("dairy-bottling.motors")), "dairy.motors");
        Assert.Equal(ScheduleData.CurrentFormatVersion, data.FormatVersion);
        Assert.Equal("Pinecrest Dairy Co-op - Bottling Hall", data.Title.Project);
        var p = data.Motors.Single(m => m.Tag == "P-101");
        Assert.Equal(("dairy.motors", 23, "MCC-B1"), (p.File, p.Line, p.Feeder));
        // P-101, 15 hp 480 V 3ph: NFPA 70-2023 Table 430.250 -> 21 A; 430.22: 1.25 x 21 = 26.25 A (hand calculation).
        Assert.Equal(new Measure(15, "hp"), p.Power);
        Assert.Equal(new Measure(21, "A"), p.FullLoadCurrent);
        Assert.Equal(new Measure(26.25m, "A"), p.RequiredAmpacity);
        // 430.52(C)(1): dual-element fuse 175 % x 21 = 36.75 A -> next standard rating 40 A (240.6(A)); as written 35 A.
        Assert.Equal(("dual-element-fuse", new Measure(40, "A"), new Measure(35, "A")), (p.ProtectionDevice, p.MaximumProtection, p.Protection));
        // 430.32(A)(1): SF 1.15 -> 125 % x 18.5 A nameplate = 23.125 A (hand calculation).
        Assert.Equal(new Measure(23.125m, "A"), p.OverloadLimit);
        // 430.110(A): 115 % x 21 = 24.15 A; 430.109: at least the motor's 15 hp.
        Assert.Equal((new Measure(24.15m, "A"), new Measure(15, "hp")), (p.DisconnectMinimumCurrent, p.DisconnectMinimumPower));
        Assert.Equal((new Measure(90, "ft"), "10 AWG", "ok"), (p.Length, p.Wire, p.Status));
        Assert.Empty(p.Findings);
        var feeder = data.Feeders.Single();
        // 430.24 for MCC-B1 (hand calculation in ExampleScheduleTests): 179.17 A required. The feeder header is line 17; five motor lines under it.
        Assert.Equal(179.1718m, Assert.NotNull(feeder.RequiredAmpacity).Value, 2);
        Assert.Equal((17, 5, "inverse-time-breaker"), (feeder.Line, feeder.MotorCount, feeder.ProtectionDevice));
    }

    [Fact]
    public void EveryFindingCodeSitsOnItsRow()
    {
        var analysis = Analyzer.Analyze(Example("cabinet-shop.motors"));
        var data = ScheduleDataBuilder.Of(analysis);
        // Line 18 writes SAW-1's 14 AWG (15 A at 60 C) for 1.25 x 16.7 = 20.88 A: M101 on SAW-1's row, not the feeder's.
        var saw = data.Motors.Single(m => m.Tag == "SAW-1");
        Assert.Contains(saw.Findings, f => f.Code == "M101" && f.Line == 18 && f.Severity == "error");
        Assert.Equal("errors", saw.Status);
        // Every finding of the file lands on exactly one row, or on no row when it is outside every motor and feeder's own lines.
        var onRows = data.Motors.SelectMany(m => m.Findings).Concat(data.Feeders.SelectMany(f => f.Findings)).ToList();
        Assert.Equal(onRows.Count, onRows.Distinct().Count());
        Assert.All(onRows, f => Assert.Contains(analysis.Findings, a => a.Code == f.Code && a.Range.Start.Line + 1 == f.Line));
    }

    [Fact]
    public void WhatCannotBeComputedIsNullWithItsReason()
    {
        // A 2 hp motor at 600 V three-phase: Table 430.250 has 575 V; nothing is read from a wrong column.
        var data = ScheduleDataBuilder.Of(Analyzer.Analyze("feeder F 415V 3ph\n  motor M 2hp\n"));
        var m = data.Motors.Single();
        Assert.Null(m.FullLoadCurrent);
        Assert.Contains(m.NotComputed, n => n.Field == "fullLoadCurrent" && n.Reason.Length > 0);
    }

    [Fact]
    public void MeasuresDropTrailingZerosAndKeepFourDecimals()
    {
        Assert.Equal("21.5", Measure.Of(21.50m, "A").Value.ToString(System.Globalization.CultureInfo.InvariantCulture));
        Assert.Equal(1.3668m, Measure.Of(1.366849m, "%").Value);
    }
}
