using MotorLang.Analysis.Power;
using MotorLang.Sizing;

namespace MotorLang.Analysis.Editing;

/// <summary>The hover's starting-dip section: the starting current, the impedances, the dip at the bus and at the motor, against the limits.</summary>
public static class DipSection
{
    public const string Heading = "Starting dip";

    public static BreakdownSection Of(StartingDipResult r)
    {
        if (r.Dip.Value is not { } dip)
            return new BreakdownSection(Heading, [.. r.Current, .. r.Dip.Steps], $"not worked out: {r.Dip.Unavailable}");
        var steps = r.Gap is null
            ? [.. r.Current, .. r.Dip.Steps]
            : new List<Step>([.. r.Current, .. r.Dip.Steps, new Step("A lower bound", $"{r.Gap}", "conservative reading",
                "an element taken as no impedance can only lower the dip: the values are at least those shown")]);
        var least = r.Gap is null ? "" : "at least ";
        string Verdict(decimal value, decimal limit, string where) =>
            value > limit ? $"✗ {least}{value:0.#} % at {where} > {Format.Percent(limit)}"
            : r.Gap is null ? $"✓ {value:0.#} % at {where} ≤ {Format.Percent(limit)}"
            : $"{least}{value:0.#} % at {where}: not checked against {Format.Percent(limit)} ({r.Gap})";
        return new BreakdownSection(Heading, steps, $"{Verdict(dip.MotorPercent, r.MotorLimit, "the motor")}; {Verdict(dip.BusPercent, r.BusLimit, "the bus")}");
    }
}
