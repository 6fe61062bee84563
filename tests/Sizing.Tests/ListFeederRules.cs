using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// The feeder rules as they were written before running totals: each takes the whole list of
/// motors and loads a feeder carries. Kept unchanged as the reference the totals must match.
/// </summary>
internal static class ListFeederRules
{
    /// <summary>
    /// 430.24: 125 % of the largest motor's full-load current, plus the others' full-load currents,
    /// plus 100 % of non-continuous and 125 % of continuous other loads. A duty-cycle motor counts
    /// at its 430.22(E) current (Exception No. 1).
    /// </summary>
    public static Result<decimal> RequiredAmpacity(IReadOnlyList<FeederMotor> motors, IReadOnlyList<FeederLoad> loads)
    {
        var steps = new List<Step>();
        var units = Expand(motors);
        var total = 0m;
        var largest = units.OrderByDescending(m => m.FullLoadAmps).FirstOrDefault();
        if (largest is not null)
        {
            var (largestAmps, how) = LargestMotorAmps(largest, units);
            total += largestAmps;
            steps.Add(Step.Amps("Largest motor", largestAmps, largest.DutyCycleAmps is null ? "NEC 430.24(1), 430.17" : "NEC 430.24 Exception No. 1, 430.17", how));
            var others = units.Where(u => !ReferenceEquals(u, largest)).Sum(u => u.DutyCycleAmps ?? u.FullLoadAmps);
            if (others > 0)
            {
                total += others;
                steps.Add(Step.Amps("Other motors", others, "NEC 430.24(2)", $"sum of the full-load currents of {units.Count - 1} other motor(s)"));
            }
        }

        var nonContinuous = loads.Where(l => !l.Continuous).Sum(l => l.Amps);
        var continuous = loads.Where(l => l.Continuous).Sum(l => l.Amps);
        if (nonContinuous > 0)
        {
            total += nonContinuous;
            steps.Add(Step.Amps("Non-continuous loads", nonContinuous, "NEC 430.24(3)", "100 %"));
        }

        if (continuous > 0)
        {
            total += continuous * 1.25m;
            steps.Add(Step.Amps("Continuous loads", continuous * 1.25m, "NEC 430.24(4)", $"125 % × {Format.Amps(continuous)}"));
        }

        steps.Add(Step.Amps("Required feeder ampacity", total, "NEC 430.24", "sum of the above"));
        return new Result<decimal>(total, [.. steps]);
    }

    /// <summary>
    /// The largest motor's share: 125 % of its full-load current; for a duty-cycle motor (430.24
    /// Exception No. 1) the greater of its 430.22(E) current and 125 % of the largest
    /// continuous-duty motor's full-load current.
    /// </summary>
    private static (decimal Amps, string How) LargestMotorAmps(FeederMotor largest, List<FeederMotor> units)
    {
        if (largest.DutyCycleAmps is not { } duty) return (largest.FullLoadAmps * 1.25m, $"125 % × {Format.Amps(largest.FullLoadAmps)} ({largest.Tag})");
        var continuous = units.Where(u => u.DutyCycleAmps is null).OrderByDescending(u => u.FullLoadAmps).FirstOrDefault();
        if (continuous is null || continuous.FullLoadAmps * 1.25m <= duty) return (duty, $"{largest.Tag} at its 430.22(E) duty-cycle current");
        return (continuous.FullLoadAmps * 1.25m,
            $"125 % × {Format.Amps(continuous.FullLoadAmps)} ({continuous.Tag}, the largest continuous-duty motor), greater than {largest.Tag}'s 430.22(E) current {Format.Amps(duty)}");
    }

    /// <summary>
    /// 430.62(A): not greater than the largest branch device (at its 430.52 maximum for the device type)
    /// plus the other motors' full-load currents, plus the other loads (430.63); rounded down to a
    /// standard rating, since the rule sets a ceiling and the next-size-up permission is for branch circuits only.
    /// Of several equal largest devices, one counts as the largest.
    /// </summary>
    public static Result<decimal> MaximumProtection(IReadOnlyList<FeederMotor> motors, IReadOnlyList<FeederLoad> loads, bool fuse)
    {
        var units = Expand(motors);
        if (units.Any(u => u.BranchDeviceMaximum is null))
            return Result<decimal>.Missing("a motor on the feeder has no branch protection maximum, so the feeder limit cannot be worked out");
        var largest = units.OrderByDescending(u => u.BranchDeviceMaximum).ThenByDescending(u => u.FullLoadAmps).FirstOrDefault();
        var steps = new List<Step>();
        var total = 0m;
        if (largest is not null)
        {
            total += largest.BranchDeviceMaximum!.Value;
            steps.Add(largest.BranchDeviceBasis is { } basis
                ? Step.Amps("Largest branch device", largest.BranchDeviceMaximum.Value, "NEC 430.62(A) Exception No. 1", $"{largest.Tag}, {basis}")
                : Step.Amps("Largest branch device", largest.BranchDeviceMaximum.Value, "NEC 430.62(A)", $"{largest.Tag}, at its 430.52 maximum"));
            var others = units.Where(u => !ReferenceEquals(u, largest)).Sum(u => u.FullLoadAmps);
            if (others > 0)
            {
                total += others;
                steps.Add(Step.Amps("Other motors", others, "NEC 430.62(A)", "sum of the other full-load currents"));
            }
        }

        var otherLoads = loads.Sum(l => l.Continuous ? l.Amps * 1.25m : l.Amps);
        if (otherLoads > 0)
        {
            total += otherLoads;
            steps.Add(Step.Amps("Other loads", otherLoads, "NEC 430.63", "continuous loads at 125 %"));
        }

        var rating = StandardRatings.AtOrBelow(total, fuse);
        if (rating is null) return Result<decimal>.Missing($"no standard rating at or below {Format.Amps(total)}", [.. steps]);
        steps.Add(Step.Amps("Maximum feeder protection", rating.Value, "NEC 430.62(A), 240.6(A)",
            $"{Format.Amps(total)} rounded down to a standard rating"));
        return new Result<decimal>(rating, [.. steps]);
    }

    /// <summary>One unit per motor: a line of several identical motors counts each (as distinct objects, so one can be "the largest").</summary>
    private static List<FeederMotor> Expand(IReadOnlyList<FeederMotor> motors)
    {
        var units = new List<FeederMotor>(motors.Count);
        foreach (var m in motors)
        {
            units.Add(m);
            for (var i = 1; i < m.Quantity; i++) units.Add(m with { });
        }

        return units;
    }
}
