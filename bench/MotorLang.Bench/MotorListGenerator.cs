using System.Text;

namespace MotorLang.Bench;

/// <summary>
/// Writes synthetic motor lists of any size: a project, feeders of 100 motors each, loads,
/// comments, and (when asked) a few deliberate errors. Deterministic for a given seed, so
/// benchmark runs compare like with like. Invented data, for measurement only.
/// </summary>
public static class MotorListGenerator
{
    private static readonly string[] Powers = ["1/2hp", "1hp", "3hp", "5hp", "7-1/2hp", "10hp", "15hp", "20hp", "25hp", "40hp", "50hp", "75hp", "100hp"];
    private static readonly string[] Wires = ["14 AWG", "12 AWG", "10 AWG", "8 AWG", "6 AWG", "4 AWG", "2 AWG", "1/0 AWG", "3/0 AWG"];
    private static readonly string[] Devices = ["inverse-time-breaker", "dual-element-fuse", "instantaneous-trip-breaker"];

    public static string Generate(int motors, int motorsPerFeeder = 100, bool withErrors = true, int seed = 1)
    {
        var random = new Random(seed);
        var sb = new StringBuilder(motors * 110);
        sb.Append("# Synthetic motor list for benchmarks\n");
        sb.Append("project \"Synthetic plant\"\n  code NEC-2023\n  ambient 40C\n  conductor cu THHN 75C\n  raceway EMT\n\n");
        var feeder = -1;
        for (var m = 0; m < motors; m++)
        {
            if (m % motorsPerFeeder == 0)
            {
                feeder++;
                sb.Append($"feeder MCC-{feeder} \"Motor control center {feeder}\" 480V 3ph\n");
                sb.Append("  length 150ft\n  wire 3/0 AWG\n  ground 6 AWG\n  protection inverse-time-breaker 200A\n");
                sb.Append($"  load L-{feeder} \"Lighting transformer\" 12A continuous\n\n");
            }

            var p = random.Next(Powers.Length);
            sb.Append($"  motor M-{m} \"Motor {m} ° pump\" {Powers[p]}\n");
            sb.Append($"    nameplate {1 + p * 7.3:0.0}A\n");
            sb.Append("    service-factor 1.15\n    design B\n");
            if (m % 10 == 0) sb.Append("    # checked on site\n");
            sb.Append($"    length {20 + random.Next(200)}ft\n");
            sb.Append($"    wire {Wires[Math.Min(p, Wires.Length - 1)]}\n");
            sb.Append($"    protection {Devices[random.Next(Devices.Length)]} {15 + 5 * p}A\n");
            sb.Append($"    overload {1.25 * (1 + p * 7.3):0.0}A\n");
            if (withErrors && m % 997 == 0) sb.Append("    wire 13 AWG\n    servce-factor 1.0\n");
            sb.Append('\n');
        }

        return sb.ToString();
    }
}
