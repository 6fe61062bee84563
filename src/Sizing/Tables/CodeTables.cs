using MotorLang.Domain;

namespace MotorLang.Sizing.Tables;

/// <summary>
/// Every code table, loaded once from the embedded CSV files and checked on load: keys in rising
/// order, every cell a number or "-". A table that fails its check stops the program at start-up
/// rather than giving a wrong size later.
/// </summary>
public static class CodeTables
{
    public static CsvTable ThreePhaseFlc { get; } = Ascending("flc-three-phase", "hp");
    public static CsvTable SynchronousFlc { get; } = Ascending("flc-three-phase-synchronous", "hp");
    public static CsvTable SinglePhaseFlc { get; } = Ascending("flc-single-phase", "hp");
    public static CsvTable DcFlc { get; } = Ascending("flc-dc", "hp");
    public static CsvTable SinglePhaseLockedRotor { get; } = Ascending("locked-rotor-single-phase", "hp");
    public static CsvTable PolyphaseLockedRotor { get; } = Ascending("locked-rotor-polyphase", "hp");
    public static CsvTable CodeLetters { get; } = CsvTable.Load("code-letters");
    public static CsvTable Ampacity { get; } = BySize("ampacity");
    public static CsvTable AmbientCorrection { get; } = Ascending("ambient-correction", "from");
    public static CsvTable CccAdjustment { get; } = Ascending("ccc-adjustment", "from");
    public static CsvTable ProtectionPercent { get; } = CsvTable.Load("protection-percent");
    public static CsvTable StandardRatings { get; } = Ascending("standard-ratings", "amperes");
    public static CsvTable GroundingConductors { get; } = Ascending("egc", "amperes");
    public static CsvTable DutyCycle { get; } = CsvTable.Load("duty-cycle");
    public static CsvTable ConduitArea { get; } = Ascending("conduit-area", "emt");
    public static CsvTable ConductorArea { get; } = BySize("conductor-area");
    public static CsvTable Impedance { get; } = BySize("impedance");
    public static CsvTable DcResistance { get; } = BySize("dc-resistance");
    public static CsvTable NemaStarters { get; } = Ascending("nema-starters", "amperes");
    public static CsvTable TransformerProtection { get; } = CsvTable.Load("transformer-protection");
    public static CsvTable ControlCircuitProtection { get; } = CsvTable.Load("control-circuit-protection");
    public static CsvTable OverloadUnits { get; } = CsvTable.Load("overload-units");

    public static IEnumerable<CsvTable> All =>
    [
        ThreePhaseFlc, SynchronousFlc, SinglePhaseFlc, DcFlc, SinglePhaseLockedRotor, PolyphaseLockedRotor, CodeLetters,
        Ampacity, AmbientCorrection, CccAdjustment, ProtectionPercent, StandardRatings, GroundingConductors, DutyCycle,
        ConduitArea, ConductorArea, Impedance, DcResistance, NemaStarters, TransformerProtection, ControlCircuitProtection,
        OverloadUnits,
    ];

    private static CsvTable Ascending(string name, string key)
    {
        var t = CsvTable.Load(name);
        t.RequireAscending(t.Column(key));
        foreach (var row in t.Rows)
        {
            foreach (var cell in row.Skip(1))
            {
                // Cells are numbers, "-", yes/no flags, or conductor sizes (Table 250.122).
                if (cell is "yes" or "no" || ConductorSize.All.Any(s => s.Number == cell)) continue;
                CsvTable.Number(cell);
            }
        }

        return t;
    }

    /// <summary>Tables keyed by conductor size must list sizes in the order of the AWG/kcmil series.</summary>
    private static CsvTable BySize(string name)
    {
        var t = CsvTable.Load(name);
        var previous = -1;
        foreach (var row in t.Rows)
        {
            var size = ConductorSize.Parse(row[0]);
            if (size.Index <= previous) throw new InvalidDataException($"{name}.csv: size {row[0]} is out of order");
            previous = size.Index;
            foreach (var cell in row.Skip(1)) CsvTable.Number(cell);
        }

        return t;
    }

    /// <summary>The row for a conductor size, or null when the table has none.</summary>
    public static string[]? RowFor(CsvTable table, ConductorSize size)
    {
        // Indexed, not foreach: Rows is an interface, and this runs twice per motor.
        var rows = table.Rows;
        for (var i = 0; i < rows.Count; i++)
        {
            if (rows[i][0] == size.Number) return rows[i];
        }

        return null;
    }
}
