using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Table 430.37: how many overload units a motor's overload device must have, by the kind of motor.</summary>
public static class OverloadUnits
{
    private const string Rule = "NEC 430.37, Table 430.37";

    private static readonly (string Motor, string Supply, int Units, string Location)[] Rows =
        CodeTables.OverloadUnits.Rows.Select(r => (r[0], r[1], (int)CsvTable.Number(r[2])!.Value, r[3])).ToArray();

    /// <summary>
    /// The fewest units the table allows for the motor: every row for a single-phase or dc motor asks
    /// for one (in an ungrounded conductor), a three-phase motor for three, one in each phase.
    /// </summary>
    public static Result<int> Required(Phases phases)
    {
        var motor = phases == Phases.Three ? "three-phase" : "single-or-dc";
        var rows = Rows.Where(r => r.Motor == motor).ToArray();
        var fewest = rows.Min(r => r.Units);
        var name = phases switch { Phases.Three => "three-phase ac motor", Phases.Single => "single-phase ac motor", _ => "dc motor" };
        var location = rows.Length == 1 ? rows[0].Location : "an ungrounded conductor (which one depends on the supply system)";
        return Result<int>.Of(fewest,
            new Step("Overload units required", fewest.ToString(System.Globalization.CultureInfo.InvariantCulture), Rule,
                $"{name}: {fewest} unit{(fewest == 1 ? "" : "s")}, {location}" +
                (phases == Phases.Three ? " (fewer only where overload protection is provided by other approved means, the table's note)" : "")));
    }
}
