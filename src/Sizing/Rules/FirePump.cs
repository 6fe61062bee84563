using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>One motor or load of a fire pump installation as its supply sees it.</summary>
public sealed record FirePumpPart(string Tag, FireServiceRole? Role, decimal FullLoadAmps, decimal? LockedRotorAmps, int Quantity = 1);

/// <summary>
/// Fire pumps, Article 695. A fire pump must run until it destroys itself rather than be switched
/// off by a device protecting it: its protective devices are sized to carry locked-rotor current
/// indefinitely (a minimum, never a maximum), it has no automatic overload protection, and its
/// supply is judged by the voltage left at the controller and motor.
/// </summary>
public static class FirePump
{
    /// <summary>695.7(A): the voltage at the controller's line terminals may drop at most 15 % while the motor starts.</summary>
    public const decimal StartingDropLimitPercent = 15m;

    /// <summary>695.7(B): at 115 % of full-load current the motor terminals may be at most 5 % below the motor's rating.</summary>
    public const decimal RunningDropLimitPercent = 5m;

    /// <summary>695.7(B): the running check is made with the motor at 115 % of its full-load current.</summary>
    public const decimal RunningCurrentFactor = 1.15m;

    /// <summary>
    /// The locked-rotor current a fire pump's devices must carry: the largest of the values known —
    /// the nameplate figure, the code letter's upper end at the motor's rated voltage, the Table
    /// 430.251(A)/(B) maximum. Taking the largest is the conservative reading for "carry indefinitely".
    /// </summary>
    public static Result<decimal> LockedRotorCurrent(decimal? nameplateAmps, Result<CurrentRange>? codeLetter, Result<decimal>? tableMaximum)
    {
        var steps = new List<Step>();
        var candidates = new List<decimal>();
        if (nameplateAmps is { } np)
        {
            candidates.Add(np);
            steps.Add(Step.Amps("Nameplate locked-rotor current", np, "NEC 430.7(A)(9)", "as written on the motor's 'locked-rotor' line"));
        }

        if (codeLetter?.Value is { } range)
        {
            // Letter V has no upper end: its lower end is only a floor, and the table or nameplate must bound it.
            var value = range.Maximum ?? range.Minimum;
            candidates.Add(value);
            steps.Add(Step.Amps("Code letter locked-rotor current", value, "NEC Table 430.7(B)",
                range.Maximum is null ? "letter V has no upper end: its lower end counts, and only as a floor" : "upper end of the code letter's range at the motor's rated voltage"));
        }

        if (tableMaximum?.Value is { } table)
        {
            candidates.Add(table);
            var rule = tableMaximum.Steps.Length > 0 ? tableMaximum.Steps[0].Rule : "NEC Table 430.251(B)";
            steps.Add(Step.Amps("Table locked-rotor current", table, rule, "the table maximum for the motor's horsepower and rated voltage"));
        }

        var onlyFloor = candidates.Count == 1 && nameplateAmps is null && tableMaximum?.Value is null && codeLetter?.Value is { Maximum: null };
        if (candidates.Count == 0 || onlyFloor)
            return Result<decimal>.Missing("the locked-rotor current is not known: write 'locked-rotor …A' from the nameplate (or a code letter other than V)", [.. steps]);
        var largest = candidates.Max();
        steps.Add(Step.Amps("Locked-rotor current used", largest, "NEC 695.4(B)(2)(a)(1)",
            "the largest value known, since the device must carry it indefinitely (conservative reading)"));
        return new Result<decimal>(largest, [.. steps]);
    }

    /// <summary>
    /// 695.4(B)(2)(a)(1): the device must carry indefinitely the locked-rotor currents of the fire pump
    /// and pressure maintenance motors plus the full-load current of the accessory equipment; where
    /// that is not a standard rating, the next standard rating (240.6(A)). Anything else on the supply
    /// is added at its full-load current (conservative reading: the device carries it too).
    /// </summary>
    public static Result<decimal> MinimumDevice(IReadOnlyList<FirePumpPart> parts, bool fuse)
    {
        var steps = new List<Step>();
        if (parts.FirstOrDefault(p => p.Role is FireServiceRole.FirePump or FireServiceRole.PressureMaintenance && p.LockedRotorAmps is null) is { } unknown)
            return Result<decimal>.Missing($"the locked-rotor current of {unknown.Tag} is not known, so the NEC 695.4(B)(2)(a)(1) minimum cannot be worked out");
        var total = 0m;
        foreach (var p in parts)
        {
            var (amps, what, rule) = p.Role switch
            {
                FireServiceRole.FirePump => (p.LockedRotorAmps!.Value, "fire pump, locked-rotor current", "NEC 695.4(B)(2)(a)(1)"),
                FireServiceRole.PressureMaintenance => (p.LockedRotorAmps!.Value, "pressure maintenance pump, locked-rotor current", "NEC 695.4(B)(2)(a)(1)"),
                FireServiceRole.Accessory => (p.FullLoadAmps, "accessory equipment, full-load current", "NEC 695.4(B)(2)(a)(1)"),
                _ => (p.FullLoadAmps, "other load on the same supply, full-load current (conservative reading: the device carries it too)", "NEC 695.4(B)(2)(a)(1)"),
            };
            total += amps * p.Quantity;
            steps.Add(Step.Amps(p.Tag, amps * p.Quantity, rule, p.Quantity > 1 ? $"{what} × {p.Quantity}" : what));
        }

        steps.Add(Step.Amps("Sum to carry indefinitely", total, "NEC 695.4(B)(2)(a)(1)", "locked-rotor currents plus full-load currents"));
        var rating = StandardRatings.AtOrAbove(total, fuse);
        if (rating is null) return Result<decimal>.Missing($"no standard rating at or above {Format.Amps(total)}", [.. steps]);
        steps.Add(Step.Amps("Minimum device rating", rating.Value, "NEC 695.4(B)(2)(a)(1), 240.6(A)",
            rating == total ? "the sum is a standard rating" : "the next standard rating above the sum; a larger device is permitted"));
        return new Result<decimal>(rating, [.. steps]);
    }

    /// <summary>
    /// 695.6(C): conductors supplying fire pump and pressure maintenance motors and accessory equipment
    /// carry at least 125 % of the sum of the fire pump and pressure maintenance full-load currents
    /// plus 100 % of the accessory loads. Null when nothing on the supply is part of a fire pump installation.
    /// </summary>
    public static Result<decimal>? ConductorAmpacity(IReadOnlyList<FirePumpPart> parts)
    {
        if (!parts.Any(p => p.Role == FireServiceRole.FirePump)) return null;
        var motors = parts.Where(p => p.Role is FireServiceRole.FirePump or FireServiceRole.PressureMaintenance).Sum(p => p.FullLoadAmps * p.Quantity);
        var accessories = parts.Where(p => p.Role == FireServiceRole.Accessory).Sum(p => p.FullLoadAmps * p.Quantity);
        // Anything else on a fire pump supply is counted at 125 %, as 430.24 would count a continuous load (conservative reading).
        var others = parts.Where(p => p.Role is null).Sum(p => p.FullLoadAmps * p.Quantity);
        var total = motors * 1.25m + accessories + others * 1.25m;
        var steps = new List<Step>
        {
            Step.Amps("Fire pump and pressure maintenance motors", motors * 1.25m, "NEC 695.6(C)", $"125 % × {Format.Amps(motors)} (sum of their full-load currents)"),
        };
        if (accessories > 0) steps.Add(Step.Amps("Accessory equipment", accessories, "NEC 695.6(C)", "100 %"));
        if (others > 0) steps.Add(Step.Amps("Other loads on the supply", others * 1.25m, "NEC 695.6(C), 430.24", $"125 % × {Format.Amps(others)}, as 430.24 counts a continuous load (conservative reading)"));
        steps.Add(Step.Amps("Required ampacity (fire pump supply)", total, "NEC 695.6(C)", "sum of the above"));
        return new Result<decimal>(total, [.. steps]);
    }
}
