using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// What the nameplate of a hermetic refrigerant motor-compressor, or of equipment that holds one,
/// is marked with: rated-load current (RLA), branch-circuit selection current, locked-rotor current,
/// and for multimotor or combination-load equipment the minimum circuit ampacity and the maximum
/// short-circuit and ground-fault device (440.4(B)). Null where not marked.
/// </summary>
public readonly record struct CompressorMarking(decimal? RatedLoad, decimal? SelectionCurrent, decimal? LockedRotor,
    decimal? MinimumAmpacity, decimal? MaximumProtection)
{
    /// <summary>Marked with a minimum circuit ampacity: multimotor or combination-load equipment (440.4(B)).</summary>
    public bool MarkedEquipment => MinimumAmpacity is not null;
}

/// <summary>Article 440 (NFPA 70-2023) for motor-compressors and the equipment marked with them.</summary>
public static class MotorCompressors
{
    /// <summary>
    /// 440.6(A) and its Exception No. 1: the current that sizes conductors, disconnect and
    /// protection is the rated-load current, or the branch-circuit selection current where it is
    /// marked (it is never less than the RLA, 440.2; the larger is taken in any case).
    /// </summary>
    public static Result<decimal> DesignCurrent(CompressorMarking m)
    {
        if (m.RatedLoad is null && m.SelectionCurrent is null)
            return Result<decimal>.Missing("no rated-load current (RLA) or branch-circuit selection current is written: write 'rated-load …A' from the nameplate (440.6(A))");
        if (m.SelectionCurrent is { } bcsc && (m.RatedLoad is not { } rla || bcsc >= rla))
            return Result<decimal>.Of(bcsc, Step.Amps("Branch-circuit selection current", bcsc, "NEC 440.6(A) Exception No. 1, 440.4(C)",
                m.RatedLoad is { } r ? $"marked, and not less than the rated-load current {Format.Amps(r)}: used instead of it" : "as marked"));
        var load = m.RatedLoad!.Value;
        return Result<decimal>.Of(load, Step.Amps("Rated-load current", load, "NEC 440.6(A)",
            m.SelectionCurrent is { } lower ? $"as marked (the selection current {Format.Amps(lower)} is smaller, so the larger is used)" : "as marked on the nameplate"));
    }

    /// <summary>
    /// Branch conductors: 125 % of the RLA or selection current (440.32), or for marked equipment the
    /// marked minimum circuit ampacity (440.35, 440.4(B)). Where both are known the larger is taken,
    /// so a marking below 125 % of the compressor's current never lowers the conductors (docs/checks.md).
    /// </summary>
    public static Result<decimal> RequiredAmpacity(CompressorMarking m, decimal? design)
    {
        var steps = new List<Step>();
        decimal? fromCurrent = design is { } d ? d * 1.25m : null;
        if (fromCurrent is { } c)
            steps.Add(Step.Amps("125 % of the motor-compressor current", c, "NEC 440.32", $"125 % × {Format.Amps(design!.Value)}"));
        if (m.MinimumAmpacity is { } mca)
            steps.Add(Step.Amps("Marked minimum circuit ampacity", mca, "NEC 440.35, 440.4(B)", "the equipment's conductors carry at least the marked ampacity"));
        if (fromCurrent is null && m.MinimumAmpacity is null)
            return Result<decimal>.Missing("neither a rated-load current nor a minimum circuit ampacity is written (440.32, 440.35)");
        var required = Math.Max(fromCurrent ?? 0, m.MinimumAmpacity ?? 0);
        if (fromCurrent is { } f && m.MinimumAmpacity is { } marked && f > marked)
            steps.Add(Step.Amps("Required ampacity", required, "NEC 440.32", $"the marking {Format.Amps(marked)} is below 125 % of the compressor's current; the larger is used"));
        else
            steps.Add(Step.Amps("Required ampacity", required, fromCurrent is null || m.MinimumAmpacity is not null ? "NEC 440.35" : "NEC 440.32", "the conductors' ampacity must be at least this"));
        return new Result<decimal>(required, [.. steps]);
    }

    /// <summary>
    /// The largest branch short-circuit and ground-fault device. Marked equipment (a minimum circuit
    /// ampacity is marked): the marked maximum, which the manufacturer worked out for all its loads
    /// (440.4(B), 440.22(B)). A motor-compressor: 175 % of its current, 225 % where it will not
    /// start (440.22(A)), taken down to a standard rating since the rule says "not exceeding", and
    /// never required below 15 A; a marked maximum is a ceiling on that (440.22(C), 110.3(B)).
    /// </summary>
    public static Result<decimal> MaximumProtection(CompressorMarking m, decimal? design, bool hardStart, bool fuse)
    {
        var steps = new List<Step>();
        if (m.MaximumProtection is { } mop && (m.MarkedEquipment || design is null))
        {
            steps.Add(Step.Amps("Marked maximum protection", mop, "NEC 440.4(B), 110.3(B)",
                m.MarkedEquipment
                    ? "multimotor or combination-load equipment: the marked maximum governs and is never exceeded"
                    : "no rated-load current is written, so only the marked maximum is known"));
            return new Result<decimal>(mop, [.. steps]);
        }

        if (design is not { } current)
            return Result<decimal>.Missing("neither a rated-load current nor a marked maximum protection is written (440.22(A), 440.4(B))");
        var percent = hardStart ? 225m : 175m;
        var raw = current * percent / 100m;
        steps.Add(Step.Amps(hardStart ? "225 % of the motor-compressor current" : "175 % of the motor-compressor current", raw,
            "NEC 440.22(A)", $"{Format.Number(percent)} % × {Format.Amps(current)}" + (hardStart ? " (hard-start: 175 % will not start it)" : "")));
        var standard = StandardRatings.AtOrBelow(raw, fuse);
        decimal max;
        if (raw <= 15m || standard is null or < 15m)
        {
            max = 15m;
            steps.Add(Step.Amps("Not required below", 15m, "NEC 440.22(A)", "the device is not required to be rated under 15 A"));
        }
        else
        {
            max = standard.Value;
            if (max != raw)
                steps.Add(Step.Amps("Standard rating not exceeding it", max, "NEC 440.22(A), 240.6(A)", "the rule says \"not exceeding\": no rounding up"));
        }

        if (m.MaximumProtection is { } ceiling && ceiling < max)
        {
            max = ceiling;
            steps.Add(Step.Amps("Marked maximum protection", ceiling, "NEC 440.22(C), 110.3(B)", "the marking is lower, and is never exceeded"));
        }
        else if (m.MaximumProtection is { } above)
        {
            steps.Add(Step.Amps("Marked maximum protection", above, "NEC 440.22(C), 110.3(B)", "not lower than the 440.22(A) value, which governs"));
        }

        steps.Add(Step.Amps("Maximum rating", max, "NEC 440.22", "the device may be this size or smaller"));
        return new Result<decimal>(max, [.. steps]);
    }

    /// <summary>
    /// 440.12(A): an ampere rating of at least 115 % of the RLA or selection current, and a
    /// horsepower rating at least the equivalent horsepower: the larger of the horsepower whose
    /// Table 430.248/430.250 current and whose Table 430.251(A)/(B) locked-rotor current are at
    /// least the marked ones (the next larger row where they fall between).
    /// </summary>
    public static Result<DisconnectRating> Disconnect(decimal design, decimal? lockedRotor, decimal volts, Phases phases)
    {
        if (phases == Phases.Dc)
            return Result<DisconnectRating>.Missing("a dc motor-compressor has no equivalent horsepower tables (440.12(A))");
        if (lockedRotor is not { } lra)
            return Result<DisconnectRating>.Missing("no locked-rotor current is written: 440.12(A)(2) needs it for the disconnect's equivalent horsepower (write 'locked-rotor …A' from the nameplate)");
        var single = phases == Phases.Single;
        var flcTable = single ? CodeTables.SinglePhaseFlc : CodeTables.ThreePhaseFlc;
        var lrcTable = single ? CodeTables.SinglePhaseLockedRotor : CodeTables.PolyphaseLockedRotor;
        var byCurrent = Disconnects.SmallestHorsepower(flcTable, volts, phases, design);
        var byLockedRotor = Disconnects.SmallestHorsepower(lrcTable, volts, phases, lra);
        if (byCurrent is null || byLockedRotor is null)
            return Result<DisconnectRating>.Missing($"the marked currents are beyond Tables {(single ? "430.248 and 430.251(A)" : "430.250 and 430.251(B)")} at {Format.Number(volts)} V: size the disconnect from the manufacturer's data (440.12(A))");
        var hp = Math.Max(byCurrent.Value, byLockedRotor.Value);
        var amps = design * 1.15m;
        return Result<DisconnectRating>.Of(new DisconnectRating(amps, hp),
            Step.Amps("Disconnect ampere rating", amps, "NEC 440.12(A)(1)", $"115 % × {Format.Amps(design)}"),
            new Step("Equivalent hp from rated-load current", $"{Numbers.Horsepower(byCurrent.Value)} hp", $"NEC 440.12(A)(2), Table {(single ? "430.248" : "430.250")}",
                $"smallest row carrying at least {Format.Amps(design)}"),
            new Step("Equivalent hp from locked-rotor current", $"{Numbers.Horsepower(byLockedRotor.Value)} hp", $"NEC 440.12(A)(2), Table {(single ? "430.251(A)" : "430.251(B)")}",
                $"smallest row at or above {Format.Amps(lra)}"),
            new Step("Disconnect horsepower rating", $"{Numbers.Horsepower(hp)} hp", "NEC 440.12(A)(2)", "the larger of the two"));
    }
}
