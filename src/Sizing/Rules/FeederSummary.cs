namespace MotorLang.Sizing.Rules;

/// <summary>
/// A motor singled out by a feeder rule (the largest by full-load current, by branch device, the
/// largest continuous-duty one), with how deep below the feeder it is and the sum the rule adds
/// for every other motor. Depth decides ties the way a breadth-first list of everything the
/// feeder carries would: of equal motors the one nearer the feeder, then the one in the feeder
/// written first, counts.
/// </summary>
public readonly record struct FeederPick(FeederMotor Motor, int Depth, decimal Others);

/// <summary>
/// What the feeder rules (430.24, 430.62(A)) need of the motors and loads a feeder carries,
/// directly and through the feeders supplied from it, as running totals instead of the list. A
/// feeder's totals are its own motors' and loads' combined with those of each feeder supplied
/// from it, so a chain of n feeders is summed in n steps instead of n²/2.
/// </summary>
public sealed class FeederSummary
{
    /// <summary>How many motors (a line of several identical motors counts each).</summary>
    public int Units { get; private init; }

    /// <summary>Sum of the full-load currents (430.62(A) adds them for the motors other than the largest device).</summary>
    public decimal FullLoadAmps { get; private init; }

    /// <summary>Sum of each line's full-load current times its quantity as written: the motors' share of the running load.</summary>
    public decimal RunningAmps { get; private init; }

    /// <summary>Sum of the currents 430.24 adds: a duty-cycle motor at its 430.22(E) current (Exception No. 1).</summary>
    public decimal FeederAmps { get; private init; }

    /// <summary>The largest motor by full-load current (430.24(1), 430.17); Others is the 430.24(2) sum of the rest.</summary>
    public FeederPick? LargestMotor { get; private init; }

    /// <summary>The largest continuous-duty motor (430.24 Exception No. 1 compares a duty-cycle largest motor with it); Others is unused.</summary>
    public FeederPick? LargestContinuousMotor { get; private init; }

    /// <summary>The largest branch device, then the larger full-load current (430.62(A)); Others is the sum of the other full-load currents.</summary>
    public FeederPick? LargestDevice { get; private init; }

    /// <summary>A motor has no branch protection maximum, so 430.62(A) cannot be worked out.</summary>
    public bool DeviceUnknown { get; private init; }

    public decimal NonContinuousLoadAmps { get; private init; }

    public decimal ContinuousLoadAmps { get; private init; }

    /// <summary>Sum of the other loads as 430.63 adds them, each continuous one at 125 %.</summary>
    public decimal ProtectionLoadAmps { get; private init; }

    /// <summary>Sum of the other loads' currents, at 100 %.</summary>
    public decimal LoadAmps { get; private init; }

    /// <summary>
    /// Totals of one feeder's own motors and loads, in the order written. <paramref name="conductorOnly"/>
    /// are loads the conductors carry (430.24) that 430.62(A) leaves out: marked equipment's loads
    /// other than its compressor (440.33), where leaving them out gives the lower device limit.
    /// </summary>
    public static FeederSummary Of(IReadOnlyList<FeederMotor> motors, IReadOnlyList<FeederLoad> loads, IReadOnlyList<FeederLoad>? conductorOnly = null)
    {
        var units = 0;
        decimal full = 0m, feeder = 0m, running = 0m;
        var unknown = false;
        FeederMotor? largest = null, continuous = null, device = null;
        foreach (var m in motors)
        {
            var count = Count(m);
            units += count;
            full += m.FullLoadAmps * count;
            running += m.FullLoadAmps * m.Quantity;
            feeder += (m.DutyCycleAmps ?? m.FullLoadAmps) * count;

            // Of equal motors the first written counts (a line's copies come after it and never beat it).
            if (largest is null || m.FullLoadAmps > largest.FullLoadAmps) largest = m;
            if (m.DutyCycleAmps is null && (continuous is null || m.FullLoadAmps > continuous.FullLoadAmps)) continuous = m;
            if (m.BranchDeviceMaximum is null) unknown = true;
            else if (device is null || DeviceBeats(m, device)) device = m;
        }

        decimal nonContinuous = 0m, continuousLoads = 0m, protection = 0m, all = 0m;
        foreach (var l in loads)
        {
            if (l.Continuous) continuousLoads += l.Amps;
            else nonContinuous += l.Amps;
            protection += l.Continuous ? l.Amps * 1.25m : l.Amps;
            all += l.Amps;
        }

        foreach (var l in conductorOnly ?? [])
        {
            if (l.Continuous) continuousLoads += l.Amps;
            else nonContinuous += l.Amps;
            all += l.Amps;
        }

        return new FeederSummary
        {
            Units = units,
            FullLoadAmps = full,
            RunningAmps = running,
            FeederAmps = feeder,
            LargestMotor = largest is null ? null : new FeederPick(largest, 0, Without(motors, largest, static u => u.DutyCycleAmps ?? u.FullLoadAmps)),
            LargestContinuousMotor = continuous is null ? null : new FeederPick(continuous, 0, 0m),
            LargestDevice = device is null || unknown ? null : new FeederPick(device, 0, Without(motors, device, static u => u.FullLoadAmps)),
            DeviceUnknown = unknown,
            NonContinuousLoadAmps = nonContinuous,
            ContinuousLoadAmps = continuousLoads,
            ProtectionLoadAmps = protection,
            LoadAmps = all,
        };
    }

    /// <summary>
    /// A feeder's totals from its own (<paramref name="own"/>) and those of the feeders supplied
    /// from it, in the order they are written: what <see cref="Of"/> gives for the breadth-first
    /// list of everything the feeder carries.
    /// </summary>
    public static FeederSummary Combine(FeederSummary own, IReadOnlyList<FeederSummary> supplied)
    {
        if (supplied.Count == 0) return own;
        var units = own.Units;
        decimal full = own.FullLoadAmps, feeder = own.FeederAmps, running = own.RunningAmps;
        var unknown = own.DeviceUnknown;
        decimal nonContinuous = own.NonContinuousLoadAmps, continuousLoads = own.ContinuousLoadAmps, protection = own.ProtectionLoadAmps, all = own.LoadAmps;
        FeederPick? largest = own.LargestMotor, continuous = own.LargestContinuousMotor, device = own.LargestDevice;
        int largestFrom = -1, deviceFrom = -1;
        for (var i = 0; i < supplied.Count; i++)
        {
            var s = supplied[i];
            units += s.Units;
            full += s.FullLoadAmps;
            running += s.RunningAmps;
            feeder += s.FeederAmps;
            unknown |= s.DeviceUnknown;
            nonContinuous += s.NonContinuousLoadAmps;
            continuousLoads += s.ContinuousLoadAmps;
            protection += s.ProtectionLoadAmps;
            all += s.LoadAmps;
            // A pick from a feeder further down counts one level deeper; of equal ones the shallower, then the earlier feeder's, stays.
            if (Deeper(s.LargestMotor) is { } l && (largest is not { } a || l.Motor.FullLoadAmps > a.Motor.FullLoadAmps
                                                    || (l.Motor.FullLoadAmps == a.Motor.FullLoadAmps && l.Depth < a.Depth)))
            {
                largest = l;
                largestFrom = i;
            }

            if (Deeper(s.LargestContinuousMotor) is { } c && (continuous is not { } b || c.Motor.FullLoadAmps > b.Motor.FullLoadAmps
                                                             || (c.Motor.FullLoadAmps == b.Motor.FullLoadAmps && c.Depth < b.Depth)))
                continuous = c;

            if (Deeper(s.LargestDevice) is { } d && (device is not { } e || DeviceBeats(d.Motor, e.Motor)
                                                    || (!DeviceBeats(e.Motor, d.Motor) && d.Depth < e.Depth)))
            {
                device = d;
                deviceFrom = i;
            }
        }

        return new FeederSummary
        {
            Units = units,
            FullLoadAmps = full,
            RunningAmps = running,
            FeederAmps = feeder,
            LargestMotor = largest is { } lm ? lm with { Others = OthersThan(own, supplied, largestFrom, lm.Others, static s => s.FeederAmps) } : null,
            LargestContinuousMotor = continuous,
            LargestDevice = unknown || device is not { } dm ? null : dm with { Others = OthersThan(own, supplied, deviceFrom, dm.Others, static s => s.FullLoadAmps) },
            DeviceUnknown = unknown,
            NonContinuousLoadAmps = nonContinuous,
            ContinuousLoadAmps = continuousLoads,
            ProtectionLoadAmps = protection,
            LoadAmps = all,
        };
    }

    /// <summary>A line stands for its quantity of motors, and for one at least.</summary>
    private static int Count(FeederMotor m) => Math.Max(1, m.Quantity);

    private static FeederPick? Deeper(FeederPick? pick) => pick is { } p ? p with { Depth = p.Depth + 1 } : null;

    /// <summary>430.62(A) ordering: the larger branch device, then the larger full-load current.</summary>
    private static bool DeviceBeats(FeederMotor a, FeederMotor b) =>
        a.BranchDeviceMaximum > b.BranchDeviceMaximum || (a.BranchDeviceMaximum == b.BranchDeviceMaximum && a.FullLoadAmps > b.FullLoadAmps);

    /// <summary>The sum over every motor but the picked one: the picked part's own "others" plus every other part's total.</summary>
    private static decimal OthersThan(FeederSummary own, IReadOnlyList<FeederSummary> supplied, int pickedFrom, decimal pickedOthers, Func<FeederSummary, decimal> total)
    {
        var sum = pickedFrom == -1 ? pickedOthers : total(own);
        for (var i = 0; i < supplied.Count; i++) sum += i == pickedFrom ? pickedOthers : total(supplied[i]);
        return sum;
    }

    /// <summary>The sum over every motor unit but one unit of <paramref name="picked"/> (its copies on the same line count).</summary>
    private static decimal Without(IReadOnlyList<FeederMotor> motors, FeederMotor picked, Func<FeederMotor, decimal> amps)
    {
        var sum = 0m;
        foreach (var m in motors)
        {
            var copies = ReferenceEquals(m, picked) ? Count(m) - 1 : Count(m);
            if (copies > 0) sum += amps(m) * copies;
        }

        return sum;
    }
}
