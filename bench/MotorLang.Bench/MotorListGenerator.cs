using System.Globalization;
using System.Text;

namespace MotorLang.Bench;

/// <summary>
/// Writes synthetic motor lists of any size: a project, feeders of 100 motors each, loads,
/// comments, and (when asked) a few deliberate errors. The sizes written are the ones the code
/// requires for 480 V design B motors at 30 °C, so the list is mostly clean like a real one and
/// the benchmarks measure checking, not reporting. Deterministic for a seed. Invented data.
/// </summary>
public static class MotorListGenerator
{
    // hp, Table 430.250 FLC at 460 V, and the sizes that go with it (125 % conductors at 75 °C, inverse-time breaker
    // at 250 % rounded up, Table 250.122 capped at the phase conductor).
    private static readonly (string Hp, decimal Flc, string Wire, string Ground, int Breaker)[] Ratings =
    [
        ("1/2hp", 1.1m, "14 AWG", "14 AWG", 10), ("1hp", 2.1m, "14 AWG", "14 AWG", 10), ("3hp", 4.8m, "14 AWG", "14 AWG", 15),
        ("5hp", 7.6m, "14 AWG", "14 AWG", 20), ("7-1/2hp", 11m, "14 AWG", "14 AWG", 30), ("10hp", 14m, "14 AWG", "14 AWG", 35),
        ("15hp", 21m, "10 AWG", "10 AWG", 60), ("20hp", 27m, "10 AWG", "10 AWG", 70), ("25hp", 34m, "8 AWG", "8 AWG", 90),
        ("40hp", 52m, "6 AWG", "6 AWG", 150), ("50hp", 65m, "4 AWG", "6 AWG", 175), ("75hp", 96m, "1 AWG", "4 AWG", 250),
        ("100hp", 124m, "2/0 AWG", "3 AWG", 350),
    ];

    public static string Generate(int motors, int motorsPerFeeder = 100, bool withErrors = true, int seed = 1)
    {
        var random = new Random(seed);
        var sb = new StringBuilder(motors * 110);
        sb.Append("# Synthetic motor list for benchmarks\n");
        sb.Append("project \"Synthetic plant\"\n  code NEC-2023\n  ambient 30C\n  conductor cu THHN 75C\n  raceway EMT\n\n");
        for (var first = 0; first < motors; first += motorsPerFeeder)
        {
            var feeder = first / motorsPerFeeder;
            var picks = Enumerable.Range(0, Math.Min(motorsPerFeeder, motors - first))
                .Select(_ => Math.Min(random.Next(Ratings.Length), random.Next(Ratings.Length))) // smaller motors are commoner
                .ToList();
            var flcs = picks.Select(p => Ratings[p].Flc).OrderDescending().ToList();
            var required = flcs[0] * 1.25m + flcs.Skip(1).Sum() + 12m * 1.25m;
            var sets = (int)Math.Ceiling(required / 380m); // 500 kcmil Cu at 75 °C
            sb.Append($"feeder MCC-{feeder} \"Motor control center {feeder}\" 480V 3ph\n");
            sb.Append($"  length 150ft\n  wire {(sets > 1 ? $"{sets}x " : "")}500 kcmil\n  protection inverse-time-breaker\n");
            sb.Append($"  load L-{feeder} \"Lighting transformer\" 12A continuous\n\n");
            for (var i = 0; i < picks.Count; i++)
            {
                var m = first + i;
                var r = Ratings[picks[i]];
                var nameplate = r.Flc * 0.9m;
                sb.Append($"  motor M-{m} \"Motor {m} ° pump\" {r.Hp}\n");
                sb.Append(CultureInfo.InvariantCulture, $"    nameplate {nameplate:0.0}A\n");
                sb.Append("    service-factor 1.15\n    design B\n");
                if (m % 10 == 0) sb.Append("    # checked on site\n");
                sb.Append($"    length {20 + random.Next(80)}ft\n");
                sb.Append($"    wire {r.Wire}\n    ground {r.Ground}\n");
                sb.Append($"    protection inverse-time-breaker {r.Breaker}A\n");
                sb.Append(CultureInfo.InvariantCulture, $"    overload {nameplate * 1.15m:0.0}A\n");
                if (withErrors && m % 997 == 0) sb.Append("    wire 13 AWG\n    servce-factor 1.0\n");
                sb.Append('\n');
            }
        }

        return sb.ToString();
    }
}
