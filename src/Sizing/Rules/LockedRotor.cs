using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>A locked-rotor current range; <see cref="Maximum"/> is null for code letter V, which has no upper end.</summary>
public readonly record struct CurrentRange(decimal Minimum, decimal? Maximum);

/// <summary>Locked-rotor current from the code letter (Table 430.7(B)) and the design-letter maximums (Tables 430.251(A)/(B)).</summary>
public static class LockedRotor
{
    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    /// <summary>
    /// Locked-rotor amperes at both ends of the code letter's kVA/hp range:
    /// I = kVA/hp × 1000 × hp / (V × √3) for three-phase, / V for single-phase (Equation 430.110(C)(1)a).
    /// </summary>
    public static Result<CurrentRange> FromCodeLetter(decimal horsepower, decimal volts, Phases phases, CodeLetter letter)
    {
        var row = CodeTables.CodeLetters.Rows.First(r => r[0] == letter.ToString());
        var min = CsvTable.Number(row[1])!.Value;
        var max = CsvTable.Number(row[2]);
        var divisor = phases == Phases.Three ? volts * Sqrt3 : volts;
        var range = new CurrentRange(min * 1000 * horsepower / divisor, max * 1000 * horsepower / divisor);
        var text = range.Maximum is { } hi ? $"{Format.Amps(range.Minimum)} to {Format.Amps(hi)}" : $"{Format.Amps(range.Minimum)} and up";
        return Result<CurrentRange>.Of(range,
            new Step("Code letter", $"{letter}: {Format.Number(min)}–{(max is { } m ? Format.Number(m) : "")} kVA/hp", "NEC Table 430.7(B)", "locked-rotor kVA per horsepower"),
            new Step("Locked-rotor current", text, "NEC 430.7(B), Equation 430.110(C)(1)a",
                $"kVA/hp × 1000 × {Format.Number(horsepower)} hp ÷ ({Format.Number(volts)} V{(phases == Phases.Three ? " × √3" : "")})"));
    }

    /// <summary>The table maximum locked-rotor current: Table 430.251(A) for single-phase, 430.251(B) for design B, C and D polyphase motors.</summary>
    public static Result<decimal> TableMaximum(decimal horsepower, decimal volts, Phases phases, DesignLetter? design)
    {
        if (phases == Phases.Dc) return Result<decimal>.Missing("locked-rotor tables cover ac motors only");
        if (phases == Phases.Three && design == DesignLetter.A)
            return Result<decimal>.Missing("design A motors are not limited to a maximum locked-rotor current (Table 430.251(B) note); use the nameplate or code letter");
        var (table, name) = phases == Phases.Single
            ? (CodeTables.SinglePhaseLockedRotor, "Table 430.251(A)")
            : (CodeTables.PolyphaseLockedRotor, "Table 430.251(B)");
        var row = table.Rows.FirstOrDefault(r => Numbers.Parse(r[0]) >= horsepower);
        var column = MotorCurrent.Column(table, volts, phases);
        var value = row is not null && column is { } c ? CsvTable.Number(row[c]) : null;
        if (value is null)
            return Result<decimal>.Missing($"{name} has no value for {Format.Number(horsepower)} hp at {Format.Number(volts)} V");
        return Result<decimal>.Of(value.Value, Step.Amps("Locked-rotor current (table maximum)", value.Value, $"NEC {name}",
            $"{row![0]} hp, {table.Columns[column!.Value]} V{(phases == Phases.Three ? $", design {design?.ToString() ?? "B"}" : "")}"));
    }
}
