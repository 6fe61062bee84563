using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>What 430.52 needs besides the full-load current.</summary>
public readonly record struct ProtectionInput(
    decimal FullLoadAmps,
    ProtectiveDevice Device,
    Phases Phases,
    MotorKind Kind = MotorKind.Induction,
    DesignLetter? Design = null,
    Efficiency Efficiency = Efficiency.Standard,
    bool HardStart = false,
    bool ClassCc = false);

/// <summary>
/// Motor branch-circuit short-circuit and ground-fault protection, 430.52. The limits are far
/// above the conductor ampacity on purpose: the overloads protect the conductors against
/// overload, and this device must ride through locked-rotor inrush. 240.4(D) does not apply.
/// </summary>
public static class ShortCircuitProtection
{
    /// <summary>The largest rating (or, for an instantaneous-trip breaker, setting) the code permits.</summary>
    public static Result<decimal> Maximum(ProtectionInput p)
    {
        if (!IsTableDevice(p.Device)) return DevicesInLieu.Maximum(p);
        var steps = new List<Step>();
        var (row, rowName) = Row(p);
        // Table 430.52(C)(1) note 1: the non-time-delay column applies to time-delay Class CC fuses.
        var classCc = p.ClassCc && p.Device == ProtectiveDevice.DualElementFuse;
        var percent = Percent(row, classCc ? ProtectiveDevice.NonTimeDelayFuse : p.Device);
        var fuse = IsFuse(p.Device);
        steps.Add(classCc
            ? new Step("Table percentage", Format.Percent(percent), "NEC Table 430.52(C)(1), note 1", $"{rowName}, time-delay Class CC fuse: the non-time-delay fuse column applies")
            : new Step("Table percentage", Format.Percent(percent), "NEC Table 430.52(C)(1)", $"{rowName}, {DeviceName(p.Device)}"));
        var raw = p.FullLoadAmps * percent / 100m;
        steps.Add(Step.Amps("Calculated limit", raw, "NEC 430.52(C)(1)", $"{Format.Amps(p.FullLoadAmps)} × {Format.Percent(percent)}"));

        if (p.Device == ProtectiveDevice.InstantaneousTripBreaker)
        {
            if (p.HardStart)
            {
                var hard = row == "design-b-premium" ? 1700m : 1300m;
                var hardLimit = p.FullLoadAmps * hard / 100m;
                steps.Add(Step.Amps("Maximum setting (not sufficient to start)", hardLimit, "NEC 430.52(C)(3)(b)(2)",
                    $"{Format.Percent(hard)} of full-load current where the table setting will not start the motor"));
                return new Result<decimal>(hardLimit, [.. steps]);
            }

            steps.Add(Step.Amps("Maximum setting", raw, "NEC 430.52(C)(3)", "an adjustable instantaneous-trip breaker is set, not rounded to a standard rating"));
            return new Result<decimal>(raw, [.. steps]);
        }

        var table = TableRating(raw, fuse, steps);
        if (!p.HardStart) return table;
        return HardStart(p, fuse, table, steps);
    }

    /// <summary>The table value, or the next higher standard rating where it falls between sizes (430.52(C)(1)(a)).</summary>
    private static Result<decimal> TableRating(decimal raw, bool fuse, List<Step> steps)
    {
        if (StandardRatings.IsStandard(raw, fuse))
        {
            steps.Add(Step.Amps("Maximum rating", raw, "NEC 430.52(C)(1)", "the calculated value is a standard rating"));
            return new Result<decimal>(raw, [.. steps]);
        }

        var next = StandardRatings.AtOrAbove(raw, fuse);
        if (next is null) return Result<decimal>.Missing($"no standard rating above {Format.Amps(raw)}", [.. steps]);
        steps.Add(Step.Amps("Maximum rating", next.Value, "NEC 430.52(C)(1)(a), 240.6(A)",
            "the next higher standard rating is permitted where the percentage falls between sizes"));
        return new Result<decimal>(next, [.. steps]);
    }

    /// <summary>
    /// 430.52(C)(1)(b): where the table rating will not carry the starting current it may be
    /// increased, never beyond the (b) limit (rounded down to a standard rating). The permission
    /// only ever increases: the maximum is the larger of the (b) value and the table rating with
    /// its (a) next size up, so a small motor whose (b) limit falls below the smallest standard
    /// rating keeps its table maximum.
    /// </summary>
    private static Result<decimal> HardStart(ProtectionInput p, bool fuse, Result<decimal> table, List<Step> steps)
    {
        var (limitPercent, rule, note) = HardStartPercent(p);
        var limit = p.FullLoadAmps * limitPercent / 100m;
        var rating = StandardRatings.AtOrBelow(limit, fuse);
        // A non-time-delay fuse of at most 600 A may reach 400 %; above 600 A only the 601-6000 A
        // class at 300 % is left, so a 600 A fuse stays permitted wherever 400 % is above 600 A.
        if (p.Device == ProtectiveDevice.NonTimeDelayFuse && p.FullLoadAmps * 4 > 600 && (rating is null || rating < 600))
        {
            rating = 600;
            note = "a non-time-delay fuse of 600 A or less may go to 400 % (430.52(C)(1)(b)(1)), and 600 A is below 400 % here";
        }

        if (rating is { } r)
            steps.Add(Step.Amps("Limit where the table rating will not start the motor", r, rule,
                $"{Format.Percent(limitPercent)} × {Format.Amps(p.FullLoadAmps)} = {Format.Amps(limit)}, rounded down to a standard rating; {note}"));
        else
            steps.Add(new Step("Limit where the table rating will not start the motor", "below the smallest standard rating", rule,
                $"{Format.Percent(limitPercent)} × {Format.Amps(p.FullLoadAmps)} = {Format.Amps(limit)}"));

        if (table.Value is not { } tableRating) return rating is { } only ? new Result<decimal>(only, [.. steps]) : table;
        if (rating is { } hard && hard > tableRating)
        {
            steps.Add(Step.Amps("Maximum rating (not sufficient to start)", hard, rule, "the larger of the (b) limit and the table rating"));
            return new Result<decimal>(hard, [.. steps]);
        }

        steps.Add(Step.Amps("Maximum rating (not sufficient to start)", tableRating, "NEC 430.52(C)(1)(a), (b)",
            "the (b) limit is not above the table rating with its next size up, which stays permitted"));
        return new Result<decimal>(tableRating, [.. steps]);
    }

    /// <summary>The Table 430.52(C)(1) row a motor falls in, with its description.</summary>
    public static (string Row, string Name) Row(ProtectionInput p) => p switch
    {
        { Phases: Phases.Dc } or { Kind: MotorKind.Dc } => ("dc", "dc (constant voltage) motor"),
        { Phases: Phases.Single } => ("single-phase", "single-phase motor"),
        { Kind: MotorKind.WoundRotor } => ("wound-rotor", "wound-rotor motor"),
        { Kind: MotorKind.Synchronous } => ("synchronous", "synchronous motor"),
        { Design: DesignLetter.B, Efficiency: Efficiency.Premium } => ("design-b-premium", "design B premium efficiency motor"),
        _ => ("squirrel-cage", "squirrel-cage motor other than design B premium efficiency"),
    };

    public static decimal Percent(string row, ProtectiveDevice device)
    {
        var t = CodeTables.ProtectionPercent;
        return CsvTable.Number(t.Rows.First(r => r[0] == row)[t.Column(ColumnName(device))])!.Value;
    }

    /// <summary>430.52(C)(1)(b): the maximums where the table rating will not carry the starting current.</summary>
    /// <remarks>
    /// A time-delay Class CC fuse may go to 400 % with the non-time-delay fuses ((b)(1)) where the
    /// list says `class-cc`; any other time-delay fuse gets 225 % ((b)(2)).
    /// </remarks>
    private static (decimal Percent, string Rule, string Note) HardStartPercent(ProtectionInput p) => p.Device switch
    {
        ProtectiveDevice.DualElementFuse when p.ClassCc => (400m, "NEC 430.52(C)(1)(b)(1)", "time-delay Class CC fuse"),
        ProtectiveDevice.NonTimeDelayFuse when p.FullLoadAmps * 4 > 600 =>
            (300m, "NEC 430.52(C)(1)(b)(4)", "above 600 A only fuses of the 601-6000 A class may be used, at 300 %"),
        ProtectiveDevice.NonTimeDelayFuse => (400m, "NEC 430.52(C)(1)(b)(1)", "non-time-delay fuse not exceeding 600 A"),
        ProtectiveDevice.DualElementFuse => (225m, "NEC 430.52(C)(1)(b)(2)",
            "time-delay fuse other than Class CC (write 'class-cc' for a Class CC fuse, which may go to 400 %)"),
        _ when p.FullLoadAmps <= 100 => (400m, "NEC 430.52(C)(1)(b)(3)", "inverse-time breaker, full-load current of 100 A or less"),
        _ => (300m, "NEC 430.52(C)(1)(b)(3)", "inverse-time breaker, full-load current above 100 A"),
    };

    /// <summary>The devices that are columns of Table 430.52(C)(1); the others are permitted in lieu of them (430.52(C)(5)-(7)).</summary>
    public static bool IsTableDevice(ProtectiveDevice d) =>
        d is ProtectiveDevice.NonTimeDelayFuse or ProtectiveDevice.DualElementFuse or ProtectiveDevice.InstantaneousTripBreaker or ProtectiveDevice.InverseTimeBreaker;

    /// <summary>Fuses take the fuse-only standard ratings of 240.6(A) (1, 3, 6 and 601 A).</summary>
    public static bool IsFuse(ProtectiveDevice d) =>
        d is ProtectiveDevice.NonTimeDelayFuse or ProtectiveDevice.DualElementFuse or ProtectiveDevice.SemiconductorFuse;

    /// <summary>Devices whose value is an adjustable instantaneous setting, not a standard rating.</summary>
    public static bool IsSetting(ProtectiveDevice d) =>
        d is ProtectiveDevice.InstantaneousTripBreaker or ProtectiveDevice.MotorShortCircuitProtector or ProtectiveDevice.SelfProtectedController;

    // Never a silent default: a device that is not a column of the table has no percentage there.
    private static string ColumnName(ProtectiveDevice d) => d switch
    {
        ProtectiveDevice.NonTimeDelayFuse => "non-time-delay-fuse",
        ProtectiveDevice.DualElementFuse => "dual-element-fuse",
        ProtectiveDevice.InstantaneousTripBreaker => "instantaneous-trip-breaker",
        ProtectiveDevice.InverseTimeBreaker => "inverse-time-breaker",
        _ => throw new ArgumentOutOfRangeException(nameof(d), d, "not a column of Table 430.52(C)(1)"),
    };

    public static string DeviceName(ProtectiveDevice d) => d switch
    {
        ProtectiveDevice.NonTimeDelayFuse => "non-time-delay fuse",
        ProtectiveDevice.DualElementFuse => "dual-element (time-delay) fuse",
        ProtectiveDevice.InstantaneousTripBreaker => "instantaneous-trip breaker",
        ProtectiveDevice.InverseTimeBreaker => "inverse-time breaker",
        ProtectiveDevice.MotorShortCircuitProtector => "motor short-circuit protector",
        ProtectiveDevice.SelfProtectedController => "self-protected combination controller",
        ProtectiveDevice.SemiconductorFuse => "semiconductor fuse",
        _ => d.ToString(),
    };
}
