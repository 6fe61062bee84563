namespace MotorLang.Sizing.Rules;

/// <summary>A motor line in an interlock: the interlock's name, its set (motors of one set may run together), its full-load current and how many motors the line stands for.</summary>
public sealed record InterlockedMotor(string Tag, string Interlock, string Set, decimal FullLoadAmps, int Count);

/// <summary>
/// The motors' share of a feeder's 430.24 ampacity when some of them never run together
/// (430.24 Exception No. 3), and a 430.26 demand factor granted by the authority.
/// </summary>
public static class RunningSets
{
    /// <summary>
    /// 430.24 Exception No. 3: the sum of the currents of the motors that can run at once "that
    /// results in the highest total current", each combination counted as 430.24 counts motors
    /// (125 % of its largest running motor plus the others). Every motor not in an interlock runs;
    /// of each interlock one set runs. The highest total is found exactly without trying every
    /// combination: whichever motor is the largest running one, every other interlock is best served
    /// by its set with the largest sum, so the candidates are "the largest runs free" and "set a of
    /// interlock g holds the largest", one per set.
    /// </summary>
    /// <param name="freeAmps">Sum of the full-load currents of the motors in no interlock (each line times its count).</param>
    /// <param name="freeLargest">The largest full-load current among them (0 when there are none).</param>
    public static (decimal MotorAmps, IReadOnlyList<Step> Steps) MotorShare(decimal freeAmps, decimal freeLargest, IReadOnlyList<InterlockedMotor> interlocked)
    {
        var groups = interlocked
            .GroupBy(m => m.Interlock, StringComparer.OrdinalIgnoreCase)
            .Select(g => g.GroupBy(m => m.Set, StringComparer.OrdinalIgnoreCase)
                .Select(s => new RunningSet(g.Key, s.Key, s.ToList(), s.Sum(m => m.FullLoadAmps * m.Count), s.Max(m => m.FullLoadAmps)))
                .ToList())
            .ToList();
        var bestSum = groups.Sum(g => g.Max(s => s.Amps));
        var bestExtra = freeLargest * 0.25m;
        RunningSet? holder = null;
        foreach (var g in groups)
        {
            var gBest = g.Max(s => s.Amps);
            foreach (var s in g)
            {
                var extra = s.Amps - gBest + Math.Max(freeLargest, s.Largest) * 0.25m;
                if (extra > bestExtra)
                {
                    bestExtra = extra;
                    holder = s;
                }
            }
        }

        var steps = new List<Step>();
        decimal runningLargest = freeLargest;
        foreach (var g in groups)
        {
            var kept = holder is { } h && ReferenceEquals(g, groups.First(x => x.Contains(h))) ? h : g.MaxBy(s => s.Amps)!;
            runningLargest = Math.Max(runningLargest, kept.Largest);
            var left = g.Where(s => !ReferenceEquals(s, kept)).ToList();
            steps.Add(Step.Amps($"Interlock {kept.Interlock}", kept.Amps, "NEC 430.24 Exception No. 3",
                $"runs: {Names(kept)}; never at the same time: {(left.Count == 0 ? "nothing else" : string.Join("; ", left.Select(Names)))}"));
        }

        var total = freeAmps + bestSum + bestExtra;
        steps.Add(Step.Amps("Motors running together", total, "NEC 430.24 Exception No. 3",
            $"125 % × {Format.Amps(runningLargest)} (the largest running motor) plus the other running motors: the combination with the highest total"));
        return (total, steps);
    }

    private static string Names(RunningSet s) => string.Join(", ", s.Motors.Select(m => m.Count > 1 ? $"{m.Tag} ×{m.Count}" : m.Tag)) + $" ({Format.Amps(s.Amps)})";

    private sealed record RunningSet(string Interlock, string Set, List<InterlockedMotor> Motors, decimal Amps, decimal Largest);

    /// <summary>
    /// The 430.24 ampacity with the motors' share replaced by <paramref name="motorAmps"/> (the
    /// running combination) and multiplied by a 430.26 demand factor where one is written. The other
    /// loads keep their 430.24(3)/(4) share: 430.26 speaks of the motors, and Article 220 demand
    /// factors are not applied (the conservative reading).
    /// </summary>
    public static Result<decimal> Adjusted(Result<decimal> required, decimal motorAmpsAll, decimal motorAmps, IReadOnlyList<Step> runningSteps,
        decimal? demandPercent, string? permission)
    {
        if (required.Value is not { } total) return required;
        var loads = total - motorAmpsAll;
        var steps = required.Steps.Take(required.Steps.Length - 1).Concat(runningSteps).ToList();
        var motors = motorAmps;
        if (demandPercent is { } percent)
        {
            motors = motorAmps * percent / 100m;
            steps.Add(Step.Amps("Demand factor", motors, "NEC 430.26",
                $"{Format.Percent(percent)} × {Format.Amps(motorAmps)} of motors, by permission of the authority having jurisdiction: \"{permission}\"; that the conductors carry the maximum load of the motors' duties is not checked"));
        }

        var adjusted = loads + motors;
        steps.Add(Step.Amps("Required feeder ampacity", adjusted, demandPercent is null ? "NEC 430.24 Exception No. 3" : "NEC 430.24, 430.26",
            loads > 0 ? $"{Format.Amps(motors)} of motors plus {Format.Amps(loads)} of other loads" : "the motors' share above"));
        return new Result<decimal>(adjusted, [.. steps]);
    }
}
