using MotorLang.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Motor control circuits, NFPA 70-2023 430.72: Table 430.72(B) cell by cell, its notes, 430.72(B)
/// Exception No. 2 and the control transformer's primary protection (430.72(C), Table 450.3(B)).
/// The table's cells are from memory (not in the shared reference); the consistency checks below tie
/// Columns B and C to the table's own Notes 2 and 3, so a mistyped cell fails.
/// </summary>
public class ControlCircuitTests
{
    private static readonly ConductorMaterial Cu = ConductorMaterial.Copper;
    private static readonly ConductorMaterial Al = ConductorMaterial.Aluminum;

    private static WireSpec W(string size) => WireSpec.Single(ConductorSize.Parse(size));

    private static decimal? Cell(string size, ConductorMaterial m, ControlColumn c) => ControlCircuits.Maximum(W(size), m, c).Value;

    // NFPA 70-2023 Table 430.72(B) Column A (separate protection, 430.72(B)(1)), copper: 18 AWG 7 A, 16 AWG 10 A;
    // 14 AWG and larger Note 1, the conductor's ampacity: Table 310.16 60 °C, 14 → 15 A, 12 → 20 A, 10 → 30 A, 8 → 40 A.
    // Aluminum: 12 → 15 A, 10 → 25 A; no 18, 16 or 14 AWG aluminum values.
    [Theory]
    [InlineData("18", 7)]
    [InlineData("16", 10)]
    [InlineData("14", 15)]
    [InlineData("12", 20)]
    [InlineData("10", 30)]
    [InlineData("8", 40)]
    public void ColumnACopper(string size, int amps) => Assert.Equal(amps, Cell(size, Cu, ControlColumn.Separate));

    [Fact]
    public void ColumnAAluminum()
    {
        Assert.Equal(15m, Cell("12", Al, ControlColumn.Separate));
        Assert.Equal(25m, Cell("10", Al, ControlColumn.Separate));
        Assert.Null(Cell("14", Al, ControlColumn.Separate));
        Assert.Null(Cell("18", Al, ControlColumn.Separate));
    }

    // NFPA 70-2023 Table 430.72(B) Column B (branch device, conductors within the enclosure), copper 18/16/14/12/10 AWG:
    // 25, 40, 100, 120, 160 A; aluminum 12/10 AWG: 100, 140 A.
    [Theory]
    [InlineData("18", 25)]
    [InlineData("16", 40)]
    [InlineData("14", 100)]
    [InlineData("12", 120)]
    [InlineData("10", 160)]
    public void ColumnBCopper(string size, int amps) => Assert.Equal(amps, Cell(size, Cu, ControlColumn.BranchWithinEnclosure));

    // NFPA 70-2023 Table 430.72(B) Column C (branch device, conductors beyond the enclosure), copper 18/16/14/12/10 AWG:
    // 7, 10, 45, 60, 90 A; aluminum 12/10 AWG: 45, 75 A.
    [Theory]
    [InlineData("18", 7)]
    [InlineData("16", 10)]
    [InlineData("14", 45)]
    [InlineData("12", 60)]
    [InlineData("10", 90)]
    public void ColumnCCopper(string size, int amps) => Assert.Equal(amps, Cell(size, Cu, ControlColumn.BranchBeyondEnclosure));

    [Fact]
    public void ColumnsBAndCAluminum()
    {
        Assert.Equal(100m, Cell("12", Al, ControlColumn.BranchWithinEnclosure));
        Assert.Equal(140m, Cell("10", Al, ControlColumn.BranchWithinEnclosure));
        Assert.Equal(45m, Cell("12", Al, ControlColumn.BranchBeyondEnclosure));
        Assert.Equal(75m, Cell("10", Al, ControlColumn.BranchBeyondEnclosure));
    }

    // Table 430.72(B) Note 3: above 10 AWG, Column C is 300 % of the Table 310.16 60 °C ampacity. Hand calculation:
    // 8 AWG copper 40 A × 3 = 120 A; 6 AWG copper 55 A × 3 = 165 A; 8 AWG aluminum 35 A × 3 = 105 A (Table 310.16, shared reference §9).
    [Fact]
    public void NoteThreeAboveTenAwg()
    {
        Assert.Equal(120m, Cell("8", Cu, ControlColumn.BranchBeyondEnclosure));
        Assert.Equal(165m, Cell("6", Cu, ControlColumn.BranchBeyondEnclosure));
        Assert.Equal(105m, Cell("8", Al, ControlColumn.BranchBeyondEnclosure));
        Assert.Contains(ControlCircuits.Maximum(W("8"), Cu, ControlColumn.BranchBeyondEnclosure).Steps, s => s.Rule.Contains("Note 3"));
    }

    // Note 2 (Column B above 10 AWG) is 400 % of Table 310.17, which MotorLang does not carry: no value, and it says why.
    [Fact]
    public void NoteTwoIsNotComputed()
    {
        var r = ControlCircuits.Maximum(W("8"), Cu, ControlColumn.BranchWithinEnclosure);
        Assert.Null(r.Value);
        Assert.Contains("310.17", r.Unavailable);
    }

    // The table's own notes, applied to its listed rows: Column C = 300 % of the Table 310.16 60 °C ampacity for 14–10 AWG
    // (the rows where the 60 °C column has a value). A mistyped Column C cell breaks this.
    [Theory]
    [InlineData("14", "cu")]
    [InlineData("12", "cu")]
    [InlineData("10", "cu")]
    [InlineData("12", "al")]
    [InlineData("10", "al")]
    public void ColumnCIsThreeTimesTheSixtyDegreeAmpacity(string size, string metal)
    {
        var row = CodeTables.RowFor(CodeTables.Ampacity, ConductorSize.Parse(size))!;
        var sixty = CsvTable.Number(row[CodeTables.Ampacity.Column($"{metal}60")])!.Value;
        Assert.Equal(3m * sixty, Cell(size, metal == "cu" ? Cu : Al, ControlColumn.BranchBeyondEnclosure));
        // Column A (Note 1) is the ampacity itself.
        Assert.Equal(sixty, Cell(size, metal == "cu" ? Cu : Al, ControlColumn.Separate));
    }

    // Note 2 applied to the listed rows: Column B = 400 % of the Table 310.17 60 °C (free air) ampacity, recalled as
    // 14 Cu 25 A, 12 Cu 30 A, 10 Cu 40 A, 12 Al 25 A, 10 Al 35 A (from memory). 4 × 25 = 100, 4 × 30 = 120, 4 × 40 = 160,
    // 4 × 25 = 100, 4 × 35 = 140.
    [Fact]
    public void ColumnBIsFourTimesTheFreeAirAmpacity()
    {
        (string Size, ConductorMaterial M, decimal FreeAir)[] rows = [("14", Cu, 25), ("12", Cu, 30), ("10", Cu, 40), ("12", Al, 25), ("10", Al, 35)];
        Assert.All(rows, r => Assert.Equal(4m * r.FreeAir, Cell(r.Size, r.M, ControlColumn.BranchWithinEnclosure)));
    }

    // Trap: the general small-conductor rule (240.4(D)(3): 14 AWG copper at 15 A) would flag 14 AWG control wiring inside
    // a starter on a 100 A branch breaker; 430.72(B)(2) Column B permits 100 A (240.4(G) sends motor control circuits to 430).
    [Fact]
    public void FourteenAwgInsideTheEnclosureOnAHundredAmpBreakerIsAllowed()
    {
        Assert.True(100m <= Cell("14", Cu, ControlColumn.BranchWithinEnclosure));
        Assert.False(100m <= Cell("14", Cu, ControlColumn.BranchBeyondEnclosure));
    }

    [Fact]
    public void ParallelControlConductorsAreNotLookedUp() =>
        Assert.Null(ControlCircuits.Maximum(new WireSpec(2, ConductorSize.Parse("14")), Cu, ControlColumn.Separate).Value);

    // NFPA 70-2023 430.72(B) Exception No. 2: 2-wire secondary protected by the primary device at most the secondary
    // conductors' value × secondary/primary volts. Hand calculation: 14 AWG copper (Column A 15 A), 480 V to 120 V:
    // 15 × 120 / 480 = 3.75 A. 16 AWG (10 A), 240 V to 120 V: 10 × 0.5 = 5 A.
    [Fact]
    public void PrimaryProtectingTheSecondaryConductors()
    {
        var r = ControlCircuits.PrimaryProtectingSecondary(W("14"), Cu, 480m, 120m);
        Assert.Equal(3.75m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC 430.72(B) Exception No. 2");
        Assert.Equal(5m, ControlCircuits.PrimaryProtectingSecondary(W("16"), Cu, 240m, 120m).Value);
    }

    // NFPA 70-2023 430.72(C)(4) and Table 450.3(B). 150 VA at 480 V: 150 / 480 = 0.3125 A rated primary current.
    // Primary only (no secondary device): 300 % → 0.9375 A; 430.72(C)(4), under 2 A: 500 % → 1.5625 A. The larger is permitted.
    // Trap: 450.3(B) alone would refuse a 1.5 A primary fuse that 430.72(C)(4) permits.
    [Fact]
    public void SmallControlTransformerPrimaryUnderTwoAmps()
    {
        var r = ControlCircuits.PrimaryMaximum(150m, 480m, secondaryProtected: false);
        Assert.Equal(1.5625m, r.Value);
        Assert.Contains(r.Steps, s => s.Rule == "NEC 430.72(C)(4)");
        Assert.Contains(r.Steps, s => s.Value == "0.94 A" && s.Rule == "NEC 430.72(C)(2), Table 450.3(B)");
        Assert.True(1.5m <= r.Value);
    }

    // 2000 VA at 480 V: 4.1667 A (2 A or more, so not 430.72(C)(4)). Primary only, under 9 A: 167 % → 6.96 A.
    // With a secondary device within its limit: 250 % → 10.42 A.
    [Fact]
    public void LargerControlTransformerFollowsTable4503B()
    {
        Assert.Equal(6.96m, decimal.Round(ControlCircuits.PrimaryMaximum(2000m, 480m, secondaryProtected: false).Value!.Value, 2));
        Assert.Equal(10.42m, decimal.Round(ControlCircuits.PrimaryMaximum(2000m, 480m, secondaryProtected: true).Value!.Value, 2));
        Assert.DoesNotContain(ControlCircuits.PrimaryMaximum(2000m, 480m, false).Steps, s => s.Rule.Contains("(C)(4)"));
    }

    // 5000 VA at 480 V: 10.4167 A (9 A or more): 125 % → 13.02 A, not a standard rating, so Table 450.3(B) Note 1 permits
    // the next higher standard rating, 15 A (240.6(A)).
    [Fact]
    public void NoteOneNextStandardRatingOnTheHundredTwentyFivePercentCell() =>
        Assert.Equal(15m, ControlCircuits.PrimaryMaximum(5000m, 480m, secondaryProtected: false).Value);

    // Secondary device with primary-and-secondary protection: 150 VA at 120 V = 1.25 A (under 9 A): 167 % → 2.0875 A.
    [Fact]
    public void SecondaryLimit() =>
        Assert.Equal(2.0875m, ControlCircuits.SecondaryMaximum(150m, 120m).Value);

    // NFPA 70-2023 Table 430.37: three-phase ac motor, three units (one in each phase); single-phase ac or dc motor, one unit.
    [Fact]
    public void OverloadUnitsByKindOfMotor()
    {
        Assert.Equal(3, OverloadUnits.Required(Phases.Three).Value);
        Assert.Equal(1, OverloadUnits.Required(Phases.Single).Value);
        Assert.Equal(1, OverloadUnits.Required(Phases.Dc).Value);
        Assert.Equal("NEC 430.37, Table 430.37", OverloadUnits.Required(Phases.Three).Steps.Single().Rule);
    }

    [Fact]
    public void TablesNameTheirSource()
    {
        Assert.Contains("Table 430.72(B)", CodeTables.ControlCircuitProtection.Source);
        Assert.Contains("from memory", CodeTables.ControlCircuitProtection.Source);
        Assert.Contains("Table 430.37", CodeTables.OverloadUnits.Source);
    }
}
