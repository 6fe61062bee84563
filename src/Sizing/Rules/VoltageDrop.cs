using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>A voltage drop in volts and as a percentage of the system voltage.</summary>
public readonly record struct Drop(decimal Volts, decimal Percent);

/// <summary>
/// Voltage drop from Chapter 9 Table 9 (ac) or Table 8 (dc). The 3 % branch and 5 % total figures
/// are informational notes (210.19 IN No. 4, 215.2 IN No. 2), so callers warn rather than fail.
/// </summary>
public static class VoltageDrop
{
    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    /// <summary>
    /// Effective impedance Ze = R × PF + X × sin(arccos PF) (Table 9 note 2); drop = √3 × I × Ze × L / 1000
    /// for three-phase (line to line), 2 × I × Ze × L / 1000 for single-phase; Table 8 resistance for dc.
    /// </summary>
    public static Result<Drop> Of(decimal amps, decimal lengthFeet, WireSpec wire, decimal volts, Phases phases,
        ConductorMaterial material, RacewayType raceway, decimal powerFactor)
    {
        decimal ze, r = 0, x = 0, sin = 0;
        if (phases == Phases.Dc)
        {
            var row8 = CodeTables.RowFor(CodeTables.DcResistance, wire.Size)!;
            ze = CsvTable.Number(row8[CodeTables.DcResistance.Column(material == ConductorMaterial.Copper ? "r_cu" : "r_al")])!.Value;
        }
        else
        {
            var t = CodeTables.Impedance;
            var row = CodeTables.RowFor(t, wire.Size);
            var pvc = raceway == RacewayType.Pvc;
            var column = material == ConductorMaterial.Copper ? (pvc ? "r_cu_pvc" : "r_cu_steel") : (pvc ? "r_al_pvc" : "r_al_steel");
            var resistance = row is null ? null : CsvTable.Number(row[t.Column(column)]);
            var reactance = row is null ? null : CsvTable.Number(row[t.Column(pvc ? "xl_pvc" : "xl_steel")]);
            if (resistance is null || reactance is null)
                return Result<Drop>.Missing($"Chapter 9 Table 9 has no {wire.Size} row for this conductor");
            (r, x) = (resistance.Value, reactance.Value);
            sin = (decimal)Math.Sqrt(1 - (double)(powerFactor * powerFactor));
            ze = r * powerFactor + x * sin;
        }

        var factor = phases == Phases.Three ? Sqrt3 : 2m;
        var dropVolts = factor * amps * ze * lengthFeet / 1000m / wire.Sets;
        var drop = new Drop(dropVolts, dropVolts / volts * 100m);
        // Every motor gets a drop; only a hover reads how it was found, so the text waits until then.
        return Result<Drop>.Deferred(drop, () =>
        {
            var rule = phases == Phases.Dc ? "NEC Chapter 9 Table 8" : "NEC Chapter 9 Table 9, note 2";
            var how = phases == Phases.Dc
                ? $"dc resistance {ze:0.#####} Ω/1000 ft"
                : $"R {r:0.####} × {Format.Number(powerFactor)} + X {x:0.####} × {sin:0.###} = {ze:0.####} Ω/1000 ft";
            return
            [
                new Step("Effective impedance", $"{ze:0.####} Ω/1000 ft", rule, how),
                new Step("Voltage drop", $"{Format.Number(drop.Volts)} V ({drop.Percent:0.##} %)", rule,
                    $"{(phases == Phases.Three ? "√3" : "2")} × {Format.Amps(amps)} × Ze × {Format.Number(lengthFeet)} ft ÷ 1000{(wire.Sets > 1 ? $" ÷ {wire.Sets} sets" : "")}"),
            ];
        });
    }

    /// <summary>Power factor assumed at locked rotor for starting drop: common practice, no source.</summary>
    public const decimal StartingPowerFactor = 0.35m;

    /// <summary>
    /// The drop while the motor starts: the same calculation at locked-rotor current and the low
    /// power factor of a stalled motor. Informational, like the running drop.
    /// </summary>
    public static Result<Drop> Starting(decimal lockedRotorAmps, decimal lengthFeet, WireSpec wire, decimal volts, Phases phases,
        ConductorMaterial material, RacewayType raceway)
    {
        var r = Of(lockedRotorAmps, lengthFeet, wire, volts, phases, material, raceway, StartingPowerFactor);
        if (r.Value is not { } drop) return r;
        return Result<Drop>.Deferred(drop, () =>
        [
            new Step("Starting power factor", Format.Number(StartingPowerFactor), "common practice, no source", "a motor at locked rotor draws mostly reactive current"),
            r.Steps[0],
            r.Steps[1] with { Label = "Starting voltage drop" },
        ]);
    }
}
