namespace MotorLang.Sizing.Rules;

/// <summary>What 430.28 asks of a motor's feeder tap, for its length.</summary>
/// <param name="Rule">The item the tap's length leaves open: "430.28(1)" (not over 10 ft, then (2) also applies), "430.28(2)" or "430.28(3)".</param>
/// <param name="MinimumAmpacity">The least ampacity that meets Part II and one of the items open to it; missing when a value it needs is not known.</param>
/// <param name="Passes">The tap's ampacity meets it (null when it could not be worked out).</param>
public sealed record TapCheck(string Rule, Result<decimal> MinimumAmpacity, bool? Passes);

/// <summary>
/// 430.28 Feeder taps: tap conductors from a feeder to a motor's branch-circuit protective device.
/// Their ampacity is at least what Part II asks for the motor, and in addition one of:
/// (1) not over 10 ft, enclosed by an enclosed controller or a raceway, and for field
/// installation the feeder's device on their line side rated not over 1000 % of their ampacity;
/// (2) not over 25 ft, protected from physical damage or in a raceway, with an ampacity of at
/// least one third of the feeder conductors'; (3) an ampacity not less than the feeder
/// conductors'. The Exception for high-bay manufacturing buildings is not applied. Wording
/// checked against public reproductions of 430.28; the 1000 % figure of (1) is from memory for
/// the 2023 edition.
/// </summary>
public static class FeederTaps
{
    private const string Rule = "NFPA 70-2023 430.28";

    /// <param name="lengthFeet">The tap conductors' length.</param>
    /// <param name="partTwo">The ampacity Part II asks for the motor (430.22 and those after it).</param>
    /// <param name="tapAmpacity">The tap conductors' ampacity; null when unknown.</param>
    /// <param name="feederAmpacity">The tapped feeder conductors' ampacity; null when the feeder writes no wire.</param>
    /// <param name="feederDevice">The rating of the feeder's device on the tap's line side; null when none is written.</param>
    public static TapCheck Check(decimal lengthFeet, decimal partTwo, decimal? tapAmpacity, decimal? feederAmpacity, decimal? feederDevice)
    {
        var steps = new List<Step>
        {
            Step.Amps("Part II ampacity", partTwo, $"{Rule} (Part II: 430.22)", "the ampacity the motor's branch conductors need; tap conductors need at least as much"),
        };
        // Each item open to a tap of this length, with the ampacity it asks (null: a value it needs is unknown).
        var items = new List<(string Item, decimal? Threshold, string Why)>();
        if (lengthFeet <= 10)
            items.Add(("430.28(1)", feederDevice / 10m, feederDevice is { } d
                ? $"not over 10 ft: the feeder's {Format.Amps(d)} device is at most 1000 % of the tap's ampacity, so at least {Format.Amps(d)} ÷ 10 (applied as for a field installation; enclosed in the list's raceway)"
                : "not over 10 ft: needs the feeder's 'protection' rating (at most 1000 % of the tap's ampacity), which is not written"));
        if (lengthFeet <= 25)
            items.Add(("430.28(2)", feederAmpacity / 3m, feederAmpacity is { } a
                ? $"not over 25 ft: at least one third of the feeder conductors' {Format.Amps(a)} (in the list's raceway)"
                : "not over 25 ft: needs the feeder conductors' ampacity (one third of it), and the feeder writes no 'wire'"));
        items.Add(("430.28(3)", feederAmpacity, feederAmpacity is { } f
            ? $"any length: not less than the feeder conductors' {Format.Amps(f)}"
            : "any length: needs the feeder conductors' ampacity, and the feeder writes no 'wire'"));

        var rule = items[0].Item;
        foreach (var (item, threshold, why) in items)
            steps.Add(threshold is { } t ? Step.Amps($"{item} asks", t, Rule, why) : new Step($"{item} asks", "not known", Rule, why));

        // The least of the known items; an unknown item could only lower it, so it is not a limit to hold a tap to.
        var known = items.Where(i => i.Threshold is not null).Select(i => i.Threshold!.Value).ToList();
        var anyUnknown = items.Any(i => i.Threshold is null);
        if (known.Count == 0)
            return new TapCheck(rule, new Result<decimal>(null, [.. steps], items[0].Why), null);

        var least = known.Min();
        var minimum = Math.Max(partTwo, least);
        steps.Add(Step.Amps("Least tap ampacity", minimum, Rule,
            $"the larger of Part II's {Format.Amps(partTwo)} and the least item open to {Format.Number(lengthFeet)} ft ({Format.Amps(least)})"
            + (anyUnknown ? "; an item whose value is not known could ask less" : "")));
        if (tapAmpacity is not { } have) return new TapCheck(rule, new Result<decimal>(minimum, [.. steps]), null);
        if (have >= minimum) return new TapCheck(rule, new Result<decimal>(minimum, [.. steps]), true);
        // Short of a known item, an unknown one might still pass it (unless Part II alone fails it).
        if (anyUnknown && have >= partTwo)
            return new TapCheck(rule, new Result<decimal>(null, [.. steps], items.First(i => i.Threshold is null).Why), null);
        return new TapCheck(rule, new Result<decimal>(minimum, [.. steps]), false);
    }
}
