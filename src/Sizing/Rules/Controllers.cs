using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Motor controllers, 430.83, with a NEMA starter size suggestion.</summary>
public static class Controllers
{
    public static Result<decimal> MinimumHorsepower(decimal horsepower) =>
        Result<decimal>.Of(horsepower, new Step("Controller rating", $"{Numbers.Horsepower(horsepower)} hp", "NEC 430.83(A)(1)",
            "horsepower rating not lower than the motor's"));

    /// <summary>The smallest NEMA full-voltage polyphase starter for the motor (a suggestion; not a code rule).</summary>
    public static Result<int> NemaSize(decimal horsepower, decimal volts, out string sizeName)
    {
        sizeName = "";
        var t = CodeTables.NemaStarters;
        // Only the voltages the columns are for: a 380 V or 690 V motor is not rated by either neighbour's column.
        string? column = volts switch { >= 200 and <= 210 => "hp200", >= 220 and <= 240 => "hp230", >= 440 and <= 600 => "hp460", _ => null };
        if (column is null) return Result<int>.Missing($"the NEMA sizes carried are for 200, 230 and 460–575 V, not {Format.Number(volts)} V");
        var row = t.Rows.FirstOrDefault(r => CsvTable.Number(r[t.Column(column)]) >= horsepower);
        if (row is null) return Result<int>.Missing("larger than NEMA size 7; use the manufacturer's rating");
        sizeName = row[0];
        return Result<int>.Of(t.Rows.ToList().IndexOf(row),
            new Step("NEMA starter size", $"size {row[0]}", "NEMA ICS 2 (as collected, not checked against the standard)",
                $"rated {row[t.Column(column)]} hp at {column[2..]} V{(column == "hp460" ? "–575" : "")}"));
    }
}
