using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>A motor on a branch circuit that supplies several (430.53), as the group rules see it.</summary>
/// <param name="FullLoadAmps">The 430.6(A)(1) table current (430.17 ranks motors by it).</param>
/// <param name="NameplateAmps">The nameplate current where written: 430.53(A)(1) is checked against the larger.</param>
/// <param name="BranchDeviceMaximum">The largest device 430.52 permits for this motor alone, where known.</param>
public sealed record GroupMotor(string Tag, decimal Horsepower, decimal FullLoadAmps, decimal? NameplateAmps, decimal? BranchDeviceMaximum, int Quantity = 1);

/// <summary>What the group maximum was found to be, and whether a rule of 430.53 is broken outright.</summary>
public readonly record struct GroupLimit(decimal Maximum, string? Broken);

/// <summary>
/// Several motors on one branch circuit, NFPA 70-2023 430.53 (A)-(D). The lettering and the
/// figures are those of the 2017-2023 texts as recalled (from memory; not in the shared
/// reference): (A) 1 hp and 6 A per motor, 20 A at 120 V nominal or 15 A up to 1000 V; (B) the
/// 430.52 maximum of the smallest motor; (C)(4) the 430.52 maximum of the highest-rated motor plus
/// the others' full-load currents and the other loads, raised to 240.4(B) where that is below the
/// conductors' ampacity; (D) taps to a single motor.
/// </summary>
public static class GroupCircuits
{
    /// <summary>430.53, opening sentence: the branch device is fuses or an inverse-time breaker.</summary>
    public static bool DevicePermitted(ProtectiveDevice device) =>
        device is ProtectiveDevice.InverseTimeBreaker or ProtectiveDevice.DualElementFuse or ProtectiveDevice.NonTimeDelayFuse;

    /// <summary>The largest branch device the 430.53 permission written allows, with its steps.</summary>
    public static Result<GroupLimit> MaximumProtection(BranchGroupKind kind, IReadOnlyList<GroupMotor> motors, IReadOnlyList<FeederLoad> loads,
        decimal volts, decimal? conductorAmpacity, bool fuse) => kind switch
    {
        BranchGroupKind.SmallMotors => SmallMotors(motors, volts),
        BranchGroupKind.SmallestProtected => SmallestProtected(motors),
        _ => ListedGroup(motors, loads, conductorAmpacity, fuse),
    };

    /// <summary>
    /// 430.53(A): each motor 1 hp or less and 6 A or less (the larger of table and nameplate
    /// current, the conservative reading of "full-load rating"); the device at most 20 A on a
    /// circuit of 120 V nominal or less, at most 15 A on any other circuit of 1000 V or less.
    /// </summary>
    private static Result<GroupLimit> SmallMotors(IReadOnlyList<GroupMotor> motors, decimal volts)
    {
        var steps = new List<Step>();
        string? broken = null;
        foreach (var m in motors)
        {
            var rating = Math.Max(m.FullLoadAmps, m.NameplateAmps ?? 0m);
            if (m.Horsepower > 1m)
                broken ??= $"{m.Tag} is rated {Numbers.Horsepower(m.Horsepower)} hp: 430.53(A) permits only motors of 1 hp or less";
            else if (rating > 6m)
                broken ??= $"{m.Tag}'s full-load rating is {Format.Amps(rating)}: 430.53(A)(1) permits 6 A at most";
            steps.Add(Step.Amps($"{m.Tag}", rating, "NEC 430.53(A)(1)",
                $"{Numbers.Horsepower(m.Horsepower)} hp; the larger of the table and nameplate current; at most 1 hp and 6 A"));
        }

        var max = volts <= 120m ? 20m : 15m;
        steps.Add(Step.Amps("Maximum branch device", max, "NEC 430.53(A)",
            volts <= 120m ? "a branch circuit of 120 V nominal protected at not over 20 A" : "a branch circuit of 1000 V or less protected at not over 15 A"));
        return Result<GroupLimit>.Of(new GroupLimit(max, broken), [.. steps]);
    }

    /// <summary>430.53(B): no larger than 430.52 allows for the motor of the smallest rating (taken as the smallest 430.52 maximum: the conservative reading).</summary>
    private static Result<GroupLimit> SmallestProtected(IReadOnlyList<GroupMotor> motors)
    {
        if (motors.Any(m => m.BranchDeviceMaximum is null))
            return Result<GroupLimit>.Missing("a motor on the circuit has no 430.52 maximum, so the smallest cannot be found");
        var smallest = motors.MinBy(m => m.BranchDeviceMaximum!.Value)!;
        return Result<GroupLimit>.Of(new GroupLimit(smallest.BranchDeviceMaximum!.Value, null),
            Step.Amps("Smallest motor's 430.52 maximum", smallest.BranchDeviceMaximum.Value, "NEC 430.53(B), 430.52",
                $"{smallest.Tag} ({Format.Amps(smallest.FullLoadAmps)}); the smallest 430.52 maximum of the motors on the circuit"),
            Step.Amps("Maximum branch device", smallest.BranchDeviceMaximum.Value, "NEC 430.53(B)", "not larger than 430.52 allows for the smallest motor"));
    }

    /// <summary>
    /// 430.53(C)(4): the 430.52 maximum of the highest-rated motor (430.17: the largest table
    /// current; of equal ones the smaller maximum, the conservative reading) plus the sum of the other
    /// motors' full-load currents and the other loads; where that is below the conductors' ampacity,
    /// up to the 240.4(B) next standard rating above it.
    /// </summary>
    private static Result<GroupLimit> ListedGroup(IReadOnlyList<GroupMotor> motors, IReadOnlyList<FeederLoad> loads, decimal? conductorAmpacity, bool fuse)
    {
        if (motors.Count == 0) return Result<GroupLimit>.Missing("the circuit supplies no motor");
        GroupMotor? largest = null;
        foreach (var m in motors)
        {
            if (largest is null || m.FullLoadAmps > largest.FullLoadAmps
                || (m.FullLoadAmps == largest.FullLoadAmps && (m.BranchDeviceMaximum ?? 0) < (largest.BranchDeviceMaximum ?? 0)))
                largest = m;
        }

        if (largest!.BranchDeviceMaximum is not { } largestMax)
            return Result<GroupLimit>.Missing($"{largest.Tag} has no 430.52 maximum, so the group limit cannot be worked out");
        var others = motors.Sum(m => m.FullLoadAmps * Math.Max(1, m.Quantity)) - largest.FullLoadAmps;
        var otherLoads = loads.Sum(l => l.Amps);
        var total = largestMax + others + otherLoads;
        var steps = new List<Step>
        {
            Step.Amps("Highest-rated motor's 430.52 maximum", largestMax, "NEC 430.53(C)(4), 430.17", $"{largest.Tag} ({Format.Amps(largest.FullLoadAmps)})"),
        };
        if (others > 0) steps.Add(Step.Amps("Other motors", others, "NEC 430.53(C)(4)", "sum of the other motors' full-load currents"));
        if (otherLoads > 0) steps.Add(Step.Amps("Other loads", otherLoads, "NEC 430.53(C)(4)", "the ratings of the other loads on the circuit"));
        var rating = StandardRatings.AtOrBelow(total, fuse);
        if (rating is null) return Result<GroupLimit>.Missing($"no standard rating at or below {Format.Amps(total)}", [.. steps]);
        var max = rating.Value;
        steps.Add(Step.Amps("Group limit", max, "NEC 430.53(C)(4), 240.6(A)", $"{Format.Amps(total)}, not exceeded: rounded down to a standard rating"));
        if (conductorAmpacity is { } ampacity && total < ampacity && StandardRatings.AtOrAbove(ampacity, fuse) is { } raised && raised > max && raised <= 800m)
        {
            // 240.4(B): the next standard rating at or above the ampacity, for devices up to 800 A.
            max = raised;
            steps.Add(Step.Amps("Raised to the conductors", max, "NEC 430.53(C)(4), 240.4(B)",
                $"{Format.Amps(total)} is below the conductors' {Format.Amps(ampacity)}: up to the next standard rating, 800 A at most"));
        }

        steps.Add(Step.Amps("Maximum branch device", max, "NEC 430.53(C)(4)", "the device may be this size or smaller"));
        return new Result<GroupLimit>(new GroupLimit(max, null), [.. steps]);
    }

    /// <summary>
    /// 430.53(D): a tap to a single motor needs no device of its own when its conductors carry at
    /// least the branch circuit conductors' ampacity ((D)(1)), or at least one third of it where the
    /// tap is 25 ft or less ((D)(2), which also asks for protection from physical damage, not
    /// checked). (D)(3) (a listed manual controller marked for tap conductor protection) is not
    /// applied: the list cannot show the marking. Each tap also meets 430.22, checked on its own.
    /// </summary>
    public static Result<decimal> TapAmpacity(decimal branchAmpacity, decimal? tapFeet)
    {
        var third = branchAmpacity / 3m;
        var shortTap = tapFeet is { } feet && feet <= 25m;
        return shortTap
            ? Result<decimal>.Of(third,
                Step.Amps("Branch circuit conductors", branchAmpacity, "NEC 430.53(D)", "the ampacity of the circuit's conductors"),
                Step.Amps("Tap conductors", third, "NEC 430.53(D)(2)", $"one third of it, for a tap of {Format.Number(tapFeet!.Value)} ft (25 ft at most; protection from physical damage not checked)"))
            : Result<decimal>.Of(branchAmpacity,
                Step.Amps("Branch circuit conductors", branchAmpacity, "NEC 430.53(D)", "the ampacity of the circuit's conductors"),
                Step.Amps("Tap conductors", branchAmpacity, "NEC 430.53(D)(1)",
                    tapFeet is null ? "no tap length written, so (D)(2)'s one third for 25 ft or less is not assumed" : $"the tap is {Format.Number(tapFeet.Value)} ft, over the 25 ft of (D)(2)"));
    }
}
