using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// One motor as the feeder sees it: its table full-load current (430.17 compares motors by it),
/// the largest branch device 430.52 permits for it, and how many identical motors it stands for.
/// <paramref name="BranchDeviceBasis"/> says how that device figure was found when it is not the
/// 430.52 maximum itself (an instantaneous-trip breaker counts at an assumed rating, 430.62(A) Exception No. 1).
/// </summary>
public sealed record FeederMotor(string Tag, decimal FullLoadAmps, decimal? BranchDeviceMaximum, int Quantity = 1,
    decimal? DutyCycleAmps = null, string? BranchDeviceBasis = null);

/// <summary>A non-motor load on a feeder.</summary>
public sealed record FeederLoad(string Tag, decimal Amps, bool Continuous);

/// <summary>Feeder conductors (430.24) and feeder short-circuit protection (430.62(A)) for motors and other loads.</summary>
public static class Feeders
{
    /// <summary>
    /// 430.24: 125 % of the largest motor's full-load current, plus the others' full-load currents,
    /// plus 100 % of non-continuous and 125 % of continuous other loads. A duty-cycle motor counts
    /// at its 430.22(E) current (Exception No. 1).
    /// </summary>
    public static Result<decimal> RequiredAmpacity(IReadOnlyList<FeederMotor> motors, IReadOnlyList<FeederLoad> loads) =>
        RequiredAmpacity(FeederSummary.Of(motors, loads));

    /// <inheritdoc cref="RequiredAmpacity(IReadOnlyList{FeederMotor}, IReadOnlyList{FeederLoad})"/>
    public static Result<decimal> RequiredAmpacity(FeederSummary carried)
    {
        var steps = new List<Step>();
        var total = 0m;
        if (carried.LargestMotor is { } pick)
        {
            var largest = pick.Motor;
            var (largestAmps, how) = LargestMotorAmps(largest, carried.LargestContinuousMotor?.Motor);
            total += largestAmps;
            steps.Add(Step.Amps("Largest motor", largestAmps, largest.DutyCycleAmps is null ? "NEC 430.24(1), 430.17" : "NEC 430.24 Exception No. 1, 430.17", how));
            var others = pick.Others;
            if (others > 0)
            {
                total += others;
                steps.Add(Step.Amps("Other motors", others, "NEC 430.24(2)", $"sum of the full-load currents of {carried.Units - 1} other motor(s)"));
            }
        }

        var nonContinuous = carried.NonContinuousLoadAmps;
        var continuous = carried.ContinuousLoadAmps;
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
    private static (decimal Amps, string How) LargestMotorAmps(FeederMotor largest, FeederMotor? continuous)
    {
        if (largest.DutyCycleAmps is not { } duty) return (largest.FullLoadAmps * 1.25m, $"125 % × {Format.Amps(largest.FullLoadAmps)} ({largest.Tag})");
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
    public static Result<decimal> MaximumProtection(IReadOnlyList<FeederMotor> motors, IReadOnlyList<FeederLoad> loads, bool fuse) =>
        MaximumProtection(FeederSummary.Of(motors, loads), fuse);

    /// <inheritdoc cref="MaximumProtection(IReadOnlyList{FeederMotor}, IReadOnlyList{FeederLoad}, bool)"/>
    public static Result<decimal> MaximumProtection(FeederSummary carried, bool fuse)
    {
        if (carried.DeviceUnknown)
            return Result<decimal>.Missing("a motor on the feeder has no branch protection maximum, so the feeder limit cannot be worked out");
        var steps = new List<Step>();
        var total = 0m;
        if (carried.LargestDevice is { } pick)
        {
            var largest = pick.Motor;
            total += largest.BranchDeviceMaximum!.Value;
            steps.Add(largest.BranchDeviceBasis is { } basis
                ? Step.Amps("Largest branch device", largest.BranchDeviceMaximum.Value, "NEC 430.62(A) Exception No. 1", $"{largest.Tag}, {basis}")
                : Step.Amps("Largest branch device", largest.BranchDeviceMaximum.Value, "NEC 430.62(A)", $"{largest.Tag}, at its 430.52 maximum"));
            var others = pick.Others;
            if (others > 0)
            {
                total += others;
                steps.Add(Step.Amps("Other motors", others, "NEC 430.62(A)", "sum of the other full-load currents"));
            }
        }

        var otherLoads = carried.ProtectionLoadAmps;
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

    /// <summary>
    /// 430.62(A) Exception No. 1: for the feeder calculation an instantaneous-trip branch breaker is assumed
    /// to be rated no more than the Table 430.52(C)(1) percentage for the type of feeder device employed.
    /// "Not exceeding" that percentage: the product itself, with no next-size-up (the conservative reading).
    /// </summary>
    public static (decimal Amps, string Basis) AssumedInstantaneousTrip(ProtectionInput branch, ProtectiveDevice feederDevice)
    {
        var (row, _) = ShortCircuitProtection.Row(branch);
        var percent = ShortCircuitProtection.Percent(row, feederDevice);
        var amps = branch.FullLoadAmps * percent / 100m;
        return (amps, $"{ShortCircuitProtection.DeviceName(branch.Device)} assumed at {Format.Percent(percent)} × {Format.Amps(branch.FullLoadAmps)} (Table 430.52(C)(1), {ShortCircuitProtection.DeviceName(feederDevice)} column)");
    }
}
