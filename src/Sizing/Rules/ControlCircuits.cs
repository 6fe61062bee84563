using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Which column of Table 430.72(B) protects a motor control circuit's conductors.</summary>
public enum ControlColumn
{
    /// <summary>Column A: a separate overcurrent device in the control circuit (430.72(B)(1)).</summary>
    Separate,
    /// <summary>Column B: the motor branch device alone, conductors that stay within the control equipment enclosure (430.72(B)(2)).</summary>
    BranchWithinEnclosure,
    /// <summary>Column C: the motor branch device alone, conductors that leave the enclosure (430.72(B)(2)).</summary>
    BranchBeyondEnclosure,
}

/// <summary>
/// Motor control circuits tapped from the load side of the motor branch device (430.72): the
/// largest device Table 430.72(B) permits on their conductors, and the primary protection of a
/// control circuit transformer (430.72(C)).
/// </summary>
public static class ControlCircuits
{
    private const string TableRule = "NEC 430.72(B), Table 430.72(B)";

    private static readonly CsvTable Table = Checked(CodeTables.ControlCircuitProtection);

    /// <summary>The largest size the table lists by value; larger ones follow its Notes 1–3.</summary>
    private static readonly ConductorSize LargestListed = ConductorSize.Parse("10");

    public static string Name(ControlColumn column) => column switch
    {
        ControlColumn.Separate => "Column A (separate protection)",
        ControlColumn.BranchWithinEnclosure => "Column B (branch device, conductors within the enclosure)",
        _ => "Column C (branch device, conductors beyond the enclosure)",
    };

    private static string Rule(ControlColumn column) => column == ControlColumn.Separate
        ? "NEC 430.72(B)(1), Table 430.72(B) Column A"
        : $"NEC 430.72(B)(2), Table 430.72(B) Column {(column == ControlColumn.BranchWithinEnclosure ? "B" : "C")}";

    /// <summary>
    /// The largest overcurrent device rating permitted on control conductors of this size and
    /// material under the column. Note 1's "value specified in 310.15" is taken as the Table 310.16
    /// 60 °C ampacity, uncorrected (the smallest column; the list does not say where control wiring
    /// runs); Note 2 needs Table 310.17, which MotorLang does not carry, so it gives no value.
    /// </summary>
    public static Result<decimal> Maximum(WireSpec wire, ConductorMaterial material, ControlColumn column)
    {
        if (wire.Sets != 1)
            return Result<decimal>.Missing("Table 430.72(B) is for single control conductors; parallel sets are not looked up");
        var metal = material == ConductorMaterial.Copper ? "cu" : "al";
        var metalName = material == ConductorMaterial.Copper ? "copper" : "aluminum";
        var letter = column switch { ControlColumn.Separate => "a", ControlColumn.BranchWithinEnclosure => "b", _ => "c" };
        var rule = Rule(column);
        var cell = wire.Size > LargestListed ? (column switch { ControlColumn.Separate => "note1", ControlColumn.BranchWithinEnclosure => "note2", _ => "note3" })
            : CodeTables.RowFor(Table, wire.Size)?[Table.Column($"{letter}_{metal}")];
        switch (cell)
        {
            case null or "-":
                return Result<decimal>.Missing($"Table 430.72(B) {Name(column)} gives no value for {wire.Size} {metalName}");
            case "note1":
            {
                var ampacity = SixtyDegreeAmpacity(wire.Size, metal);
                if (ampacity is null) return Result<decimal>.Missing($"Table 310.16 has no 60 °C {metalName} ampacity for {wire.Size}");
                return Result<decimal>.Of(ampacity.Value,
                    Step.Amps("Control conductor limit", ampacity.Value, $"{rule} Note 1, Table 310.16",
                        $"{wire.Size} {metalName}: the conductor's ampacity (310.15), taken at the 60 °C column without corrections (conservative reading)"));
            }
            case "note2":
                return Result<decimal>.Missing($"Table 430.72(B) Note 2 sets {wire.Size} at 400 % of its Table 310.17 ampacity, a table MotorLang does not carry");
            case "note3":
            {
                var ampacity = SixtyDegreeAmpacity(wire.Size, metal);
                if (ampacity is null) return Result<decimal>.Missing($"Table 310.16 has no 60 °C {metalName} ampacity for {wire.Size}");
                var limit = ampacity.Value * 3m;
                return Result<decimal>.Of(limit,
                    Step.Amps("Control conductor limit", limit, $"{rule} Note 3, Table 310.16",
                        $"300 % × {Format.Amps(ampacity.Value)}, the 60 °C ampacity of {wire.Size} {metalName}"));
            }
            default:
            {
                var value = CsvTable.Number(cell)!.Value;
                return Result<decimal>.Of(value,
                    Step.Amps("Control conductor limit", value, rule, $"{wire.Size} {metalName}, {Name(column)} (table values from memory)"));
            }
        }
    }

    /// <summary>
    /// 430.72(B) Exception No. 2: a single-phase transformer's 2-wire secondary conductors may be
    /// protected by the primary device alone, rated at most the secondary conductors' Table 430.72(B)
    /// value × the secondary-to-primary voltage ratio. The "appropriate" value is taken from Column A
    /// (the conductors are not protected by the motor branch device; the stricter reading).
    /// </summary>
    public static Result<decimal> PrimaryProtectingSecondary(WireSpec secondaryWire, ConductorMaterial material, decimal primaryVolts, decimal secondaryVolts)
    {
        var column = Maximum(secondaryWire, material, ControlColumn.Separate);
        if (column.Value is not { } amps) return column;
        var limit = amps * secondaryVolts / primaryVolts;
        return new Result<decimal>(limit,
        [
            .. column.Steps,
            Step.Amps("Primary device protecting the secondary conductors", limit, "NEC 430.72(B) Exception No. 2",
                $"{Format.Amps(amps)} × {Format.Number(secondaryVolts)} V / {Format.Number(primaryVolts)} V (single-phase, 2-wire secondary)"),
        ]);
    }

    /// <summary>
    /// The largest primary device 430.72(C) permits on a control circuit transformer: by 450.3(B)
    /// (430.72(C)(2): 250 % with a secondary device within its own limit, else primary-only 125 %,
    /// 167 %, 300 %), or, for a rated primary current under 2 A, 500 % (430.72(C)(4)); the larger
    /// of the two, since either is permitted. The rated current is VA ÷ primary volts (a
    /// single-phase control transformer).
    /// </summary>
    public static Result<decimal> PrimaryMaximum(decimal voltAmperes, decimal primaryVolts, bool secondaryProtected)
    {
        var rated = voltAmperes / primaryVolts;
        var steps = new List<Step>
        {
            Step.Amps("Transformer rated primary current", rated, "NEC 430.72(C)", $"{Format.Number(voltAmperes)} VA / {Format.Number(primaryVolts)} V"),
        };
        var method = secondaryProtected ? Faults.TransformerProtectionMethod.PrimaryAndSecondary : Faults.TransformerProtectionMethod.PrimaryOnly;
        var byTable = Faults.TransformerProtection.Maximum(method, primary: true, rated, fuse: false);
        steps.AddRange(byTable.Steps.Select(s => s with { Rule = $"NEC 430.72(C)(2), {s.Rule.Replace("NFPA 70-2023 ", "", StringComparison.Ordinal)}" }));
        var limit = byTable.Value!.Value;
        if (rated < 2m)
        {
            var small = rated * 5m;
            steps.Add(Step.Amps("Primary under 2 A", small, "NEC 430.72(C)(4)", $"500 % × {Format.Amps(rated)}"));
            if (small > limit)
            {
                limit = small;
                steps.Add(Step.Amps("Primary maximum", limit, "NEC 430.72(C)(4)", "the larger of the permitted values"));
            }
            else
                steps.Add(Step.Amps("Primary maximum", limit, "NEC 430.72(C)(2)", "the larger of the permitted values"));
        }

        return new Result<decimal>(limit, [.. steps]);
    }

    /// <summary>The largest secondary device Table 450.3(B) allows with primary-and-secondary protection (167 % under 9 A, else 125 %, Note 1).</summary>
    public static Result<decimal> SecondaryMaximum(decimal voltAmperes, decimal secondaryVolts)
    {
        var rated = voltAmperes / secondaryVolts;
        var byTable = Faults.TransformerProtection.Maximum(Faults.TransformerProtectionMethod.PrimaryAndSecondary, primary: false, rated, fuse: false);
        return new Result<decimal>(byTable.Value,
        [
            Step.Amps("Transformer rated secondary current", rated, "NEC 430.72(C)", $"{Format.Number(voltAmperes)} VA / {Format.Number(secondaryVolts)} V"),
            .. byTable.Steps.Select(s => s with { Rule = $"NEC 430.72(C)(2), {s.Rule.Replace("NFPA 70-2023 ", "", StringComparison.Ordinal)}" }),
        ], byTable.Unavailable);
    }

    private static decimal? SixtyDegreeAmpacity(ConductorSize size, string metal) =>
        CodeTables.RowFor(CodeTables.Ampacity, size) is { } row ? CsvTable.Number(row[CodeTables.Ampacity.Column($"{metal}60")]) : null;

    /// <summary>Every cell is a number, "-" or one of the table's note markers; a bad cell stops the program at start-up.</summary>
    private static CsvTable Checked(CsvTable t)
    {
        foreach (var row in t.Rows)
        {
            ConductorSize.Parse(row[0]);
            foreach (var cell in row.Skip(1))
            {
                if (cell is "note1") continue;
                CsvTable.Number(cell);
            }
        }

        return t;
    }
}
