using System.Diagnostics;

namespace MotorLang.Bench;

/// <summary>Percentiles of a set of timings, and a line that reports them.</summary>
public sealed class Timings
{
    private readonly List<double> _ms = [];

    public void Add(TimeSpan elapsed) => _ms.Add(elapsed.TotalMilliseconds);

    /// <summary>Times one run of <paramref name="work"/> and keeps it.</summary>
    public T Time<T>(Func<T> work)
    {
        var sw = Stopwatch.StartNew();
        var result = work();
        Add(sw.Elapsed);
        return result;
    }

    /// <summary>The nearest-rank percentile (q in 0..1).</summary>
    public double Percentile(double q)
    {
        var sorted = _ms.Order().ToList();
        return sorted[(int)Math.Clamp(Math.Ceiling(q * sorted.Count) - 1, 0, sorted.Count - 1)];
    }

    public override string ToString() =>
        $"min {Percentile(0):0.0} ms, p50 {Percentile(0.5):0.0} ms, p95 {Percentile(0.95):0.0} ms, max {Percentile(1):0.0} ms ({_ms.Count} runs)";
}
