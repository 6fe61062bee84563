using MotorLang.Analysis.Power;
using MotorLang.Sizing;

namespace MotorLang.Analysis.Editing;

/// <summary>The hover's feeder-tap section: the tap's ampacity, each item of 430.28 open to its length, and the verdict.</summary>
public static class TapSection
{
    public const string Heading = "Feeder tap (430.28)";

    public static BreakdownSection Of(TapResult tap)
    {
        var written = tap.Ampacity.Value is { } a
            ? Step.Amps("Tap conductors", a, "NFPA 70-2023 Table 310.16", $"{Format.Number(tap.LengthFeet)} ft of {tap.Wire}; they end in the motor's branch-circuit protective device")
            : new Step("Tap conductors", "not known", "NFPA 70-2023 Table 310.16", $"{tap.Wire}: {tap.Ampacity.Unavailable}");
        if (tap.Check is not { } check)
            return new BreakdownSection(Heading, [written, .. tap.Ampacity.Steps], $"not checked: {tap.Unchecked}");
        var verdict = check.Passes switch
        {
            true => $"✓ {Format.Amps(tap.Ampacity.Value!.Value)} ≥ {Format.Amps(decimal.Round(check.MinimumAmpacity.Value!.Value, 2))}",
            false => $"✗ {Format.Amps(tap.Ampacity.Value!.Value)} < {Format.Amps(decimal.Round(check.MinimumAmpacity.Value!.Value, 2))}",
            null => $"not checked: {check.MinimumAmpacity.Unavailable ?? tap.Ampacity.Unavailable}",
        };
        return new BreakdownSection(Heading, [written, .. check.MinimumAmpacity.Steps], verdict);
    }
}
