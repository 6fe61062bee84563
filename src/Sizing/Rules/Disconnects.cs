using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>A disconnecting means requirement: ampere rating and horsepower rating.</summary>
public readonly record struct DisconnectRating(decimal MinimumAmps, decimal MinimumHorsepower);

/// <summary>Disconnecting means, 430.110.</summary>
public static class Disconnects
{
    /// <summary>430.110(A): an ampere rating of at least 115 % of FLC, and horsepower-rated at least the motor's rating.</summary>
    public static Result<DisconnectRating> ForMotor(decimal fullLoadAmps, decimal horsepower)
    {
        var amps = fullLoadAmps * 1.15m;
        return Result<DisconnectRating>.Of(new DisconnectRating(amps, horsepower),
            Step.Amps("Disconnect ampere rating", amps, "NEC 430.110(A)", $"115 % × {Format.Amps(fullLoadAmps)}"),
            new Step("Disconnect horsepower rating", $"{Numbers.Horsepower(horsepower)} hp", "NEC 430.109(A)", "horsepower-rated at least the motor's rating"));
    }

    /// <summary>
    /// 430.110(C)(1): several motors (and other loads) on one disconnect. The summed full-load and
    /// locked-rotor currents are each converted to an equivalent horsepower with Tables 430.250 and
    /// 430.251(B) (430.248 and 430.251(A) for single-phase); the larger governs.
    /// </summary>
    public static Result<DisconnectRating> ForGroup(decimal summedFullLoadAmps, decimal summedLockedRotorAmps, decimal volts, Phases phases)
    {
        var flcTable = phases == Phases.Single ? CodeTables.SinglePhaseFlc : CodeTables.ThreePhaseFlc;
        var lrcTable = phases == Phases.Single ? CodeTables.SinglePhaseLockedRotor : CodeTables.PolyphaseLockedRotor;
        var byFlc = SmallestHorsepower(flcTable, volts, phases, summedFullLoadAmps);
        var byLrc = SmallestHorsepower(lrcTable, volts, phases, summedLockedRotorAmps);
        if (byFlc is null || byLrc is null)
            return Result<DisconnectRating>.Missing("the combined load is beyond the tables; size the disconnect from the manufacturer's data");
        var hp = Math.Max(byFlc.Value, byLrc.Value);
        var amps = summedFullLoadAmps * 1.15m;
        return Result<DisconnectRating>.Of(new DisconnectRating(amps, hp),
            new Step("Equivalent hp from full-load current", $"{Numbers.Horsepower(byFlc.Value)} hp", $"NEC 430.110(C)(1), Table {(phases == Phases.Single ? "430.248" : "430.250")}",
                $"summed {Format.Amps(summedFullLoadAmps)}: the smallest row carrying at least that"),
            new Step("Equivalent hp from locked-rotor current", $"{Numbers.Horsepower(byLrc.Value)} hp", $"NEC 430.110(C)(1), Table {(phases == Phases.Single ? "430.251(A)" : "430.251(B)")}",
                $"summed {Format.Amps(summedLockedRotorAmps)}: the smallest row at or above it"),
            new Step("Disconnect horsepower rating", $"{Numbers.Horsepower(hp)} hp", "NEC 430.110(C)(1)", "the larger of the two: the combined load taken as one motor"),
            Step.Amps("Disconnect ampere rating", amps, "NEC 430.110(C)(2)", $"115 % × summed {Format.Amps(summedFullLoadAmps)}"));
    }

    internal static decimal? SmallestHorsepower(CsvTable table, decimal volts, Phases phases, decimal amps)
    {
        if (MotorCurrent.Column(table, volts, phases) is not { } column) return null;
        return table.Rows.Where(r => CsvTable.Number(r[column]) >= amps).Select(r => Numbers.Parse(r[0])).FirstOrDefault();
    }
}
