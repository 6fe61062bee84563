using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>The horsepower row and voltage column of a full-load current table that a motor falls in.</summary>
public sealed record TableLookup(decimal Horsepower, int Column, CsvTable Table, string TableName);

/// <summary>
/// Full-load current for sizing conductors, protection, disconnects and controllers: from the
/// code tables (430.6(A)(1)), or from the nameplate where 430.6(A) sends it there.
/// </summary>
public static class MotorCurrent
{
    /// <summary>Kilowatts per horsepower, for converting kW ratings (1 hp = 745.7 W; 0.746 as commonly used).</summary>
    public const decimal KilowattsPerHorsepower = 0.746m;

    /// <summary>
    /// A kW rating whose converted horsepower is at most this far above a table row is that row
    /// (7.5 kW = 10.05 hp is the metric equivalent of 10 hp). Common practice, no source: metric
    /// and horsepower series pair this way, and the conversion factor alone moves them 0.6 % apart.
    /// </summary>
    public const decimal KilowattTolerancePercent = 1m;

    /// <summary>The table row a converted kW rating is equivalent to, if it is within the tolerance above one.</summary>
    private static decimal? EquivalentRow(List<decimal> rows, decimal hp)
    {
        foreach (var r in rows)
        {
            if (r <= hp && hp <= r * (1 + KilowattTolerancePercent / 100m)) return r;
        }

        return null;
    }

    /// <summary>Whether a rating falls between two rows of its table (so the 430.52 maximum uses the smaller one).</summary>
    public static bool IsBetweenRows(MotorRating m) =>
        m.Basis == NameplateBasis.None && Lookup(m) is { } higher && Lookup(m with { LowerRow = true }) is { } lower && lower.Horsepower != higher.Horsepower;

    /// <summary>The current that conductors, short-circuit protection and disconnects are sized from.</summary>
    public static Result<decimal> DesignCurrent(MotorRating m)
    {
        var steps = new List<Step>();
        if (m.Basis != NameplateBasis.None)
        {
            var why = $"{Describe(m.Basis)}: 430.6(A)(2) uses the nameplate current, not the table";
            if (m.NameplateAmps is not { } np) return Result<decimal>.Missing($"needs the nameplate current ({why})");
            return Result<decimal>.Of(np, Step.Amps("Full-load current", np, "NEC 430.6(A)(2)", why));
        }

        var table = TableCurrent(m, steps);
        if (table.HasValue) return table;
        if (m.NameplateAmps is { } amps)
        {
            steps.Add(Step.Amps("Full-load current", amps, "NEC 430.6(A)(2)",
                "the tables have no value for this rating, so the nameplate current is used"));
            return new Result<decimal>(amps, [.. steps]);
        }

        return table;
    }

    /// <summary>The table full-load current alone, or a "needs nameplate current" result where the tables stop.</summary>
    public static Result<decimal> TableCurrent(MotorRating m) => TableCurrent(m, []);

    private static Result<decimal> TableCurrent(MotorRating m, List<Step> steps)
    {
        var lookup = Lookup(m, steps);
        if (lookup is null)
            return new Result<decimal>(null, [.. steps],
                $"the code tables give no full-load current for {Describe(m)}; give the nameplate current");
        var row = lookup.Table.Rows.First(r => Numbers.Parse(r[0]) == lookup.Horsepower);
        var flc = CsvTable.Number(row[lookup.Column]);
        if (flc is null)
            return new Result<decimal>(null, [.. steps],
                $"{lookup.TableName} has no value for {Numbers.Horsepower(lookup.Horsepower)} hp at {lookup.Table.Columns[lookup.Column]} V; give the nameplate current");
        steps.Add(Step.Amps("Full-load current", flc.Value, $"NEC 430.6(A)(1), {lookup.TableName}",
            $"{Numbers.Horsepower(lookup.Horsepower)} hp, {lookup.Table.Columns[lookup.Column]} V column"));
        if (m.Kind == MotorKind.Synchronous && m.PowerFactor != 1.0m)
        {
            // Table 430.250 note: for 90 and 80 percent power factor, multiply by 1.1 and 1.25.
            var factor = m.PowerFactor switch { 0.9m => 1.1m, 0.8m => 1.25m, _ => 0m };
            if (factor == 0m)
                return new Result<decimal>(null, [.. steps], $"Table 430.250 gives synchronous currents for 1.0, 0.9 and 0.8 power factor only; give the nameplate current");
            flc = flc.Value * factor;
            steps.Add(Step.Amps("Full-load current at rated power factor", flc.Value, "NEC Table 430.250, note",
                $"{Format.Number(m.PowerFactor)} power factor: × {Format.Number(factor)}"));
        }

        return new Result<decimal>(flc, [.. steps]);
    }

    /// <summary>Finds the table, the horsepower row and the voltage column for a motor; null when none fits.</summary>
    public static TableLookup? Lookup(MotorRating m, List<Step>? steps = null)
    {
        var (table, name) = TableFor(m);
        if (table is null) return null;
        var hp = m.Power;
        if (m.Kilowatts)
        {
            hp = m.Power / KilowattsPerHorsepower;
            steps?.Add(new Step("Rating in hp", $"{Format.Number(hp)} hp", "common practice, no source",
                $"{Format.Number(m.Power)} kW ÷ {KilowattsPerHorsepower} kW/hp"));
        }

        var rows = table.Rows.Select(r => Numbers.Parse(r[0])!.Value).ToList();
        // The synchronous columns start at 25 hp: smaller synchronous motors are not in the table at all.
        if (ReferenceEquals(table, CodeTables.SynchronousFlc) && hp < rows[0]) return null;
        var higher = rows.FirstOrDefault(r => r >= hp);
        if (higher == 0) return null;
        var tableHp = higher;
        if (m.Kilowatts && EquivalentRow(rows, hp) is { } equivalent)
        {
            tableHp = equivalent;
            if (tableHp != hp)
                steps?.Add(new Step("Table rating", $"{Numbers.Horsepower(tableHp)} hp", "common practice, no source",
                    $"{Format.Number(m.Power)} kW is the metric equivalent of {Numbers.Horsepower(tableHp)} hp ({Format.Number(hp)} hp is within {Format.Percent(KilowattTolerancePercent)} of that row)"));
        }
        else if (tableHp != hp)
        {
            var lower = rows.LastOrDefault(r => r <= hp);
            if (m.LowerRow && lower != 0)
            {
                tableHp = lower;
                steps?.Add(new Step("Table rating", $"{Numbers.Horsepower(tableHp)} hp", "common practice, no source",
                    $"{Format.Number(hp)} hp is between table rows; the 430.52 maximum is worked out from the next smaller row, so it is never larger than the motor allows"));
            }
            else
            {
                steps?.Add(new Step("Table rating", $"{Numbers.Horsepower(tableHp)} hp", "common practice, no source",
                    $"{Format.Number(hp)} hp is not a table rating; the next larger one is used (conductors, disconnect, controller and feeder)"));
            }
        }

        var column = Column(table, m.Volts, m.Phases);
        if (column is null) return null;
        if (table.Columns[column.Value] != Format.Number(m.Volts))
        {
            steps?.Add(new Step("Table column", $"{table.Columns[column.Value]} V", $"{name} headnote",
                $"{Format.Number(m.Volts)} V falls in the voltage range of the {table.Columns[column.Value]} V column"));
        }

        return new TableLookup(tableHp, column.Value, table, name);
    }

    private static (CsvTable? Table, string Name) TableFor(MotorRating m) => (m.Phases, m.Kind) switch
    {
        (Phases.Dc, _) or (_, MotorKind.Dc) => (CodeTables.DcFlc, "Table 430.247"),
        (Phases.Single, _) => (CodeTables.SinglePhaseFlc, "Table 430.248"),
        (Phases.Three, MotorKind.Synchronous) => (CodeTables.SynchronousFlc, "Table 430.250 (synchronous, unity PF)"),
        (Phases.Three, _) => (CodeTables.ThreePhaseFlc, "Table 430.250"),
        _ => (null, ""),
    };

    /// <summary>
    /// The column for a voltage: an exact column, or the column whose headnote range holds it
    /// (110–120 → 115, 220–240 → 230, 440–480 → 460, 550–600 → 575). DC columns match exactly.
    /// </summary>
    public static int? Column(CsvTable table, decimal volts, Phases phases)
    {
        for (var i = 1; i < table.Columns.Count; i++)
        {
            if (decimal.Parse(table.Columns[i]) == volts) return i;
        }

        if (phases == Phases.Dc) return null;
        var mapped = volts switch
        {
            >= 110 and <= 120 => "115",
            >= 220 and <= 240 => "230",
            >= 440 and <= 480 => "460",
            >= 550 and <= 600 => "575",
            _ => null,
        };
        return mapped is not null && table.HasColumn(mapped) ? table.Column(mapped) : null;
    }

    private static string Describe(MotorRating m) =>
        $"{Format.Number(m.Power)} {(m.Kilowatts ? "kW" : "hp")} at {Format.Number(m.Volts)} V {(m.Phases == Phases.Dc ? "dc" : m.Phases == Phases.Single ? "single-phase" : "three-phase")}"
        + (m.Kind == MotorKind.Synchronous ? " synchronous" : "");

    private static string Describe(NameplateBasis b) => b switch
    {
        NameplateBasis.LowSpeed => "a low-speed motor",
        NameplateBasis.HighTorque => "a high-torque motor",
        NameplateBasis.Multispeed => "a multispeed motor",
        NameplateBasis.CannedPump => "a canned pump",
        NameplateBasis.ShadedPoleFan => "a shaded-pole fan motor (430.6(A)(1) Exception No. 2)",
        NameplateBasis.PscFan => "a permanent-split-capacitor fan motor (430.6(A)(1) Exception No. 2)",
        _ => "this motor",
    };
}
