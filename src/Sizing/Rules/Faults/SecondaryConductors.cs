namespace MotorLang.Sizing.Rules.Faults;

/// <summary>What 240.21(C) asks of a transformer's secondary conductors, by their length.</summary>
/// <param name="Subsection">The subsection checked, e.g. "240.21(C)(2)"; null when none could be.</param>
/// <param name="MinimumAmpacity">The least ampacity the subsection asks; missing when the length is not known or over 25 ft.</param>
/// <param name="TooLong">Over 25 ft: only outside conductors (240.21(C)(4)) may be that long, which the list cannot tell.</param>
/// <param name="NeedsDevice">The subsection asks that the conductors end in one overcurrent device, and none is written.</param>
public sealed record SecondaryCheck(string? Subsection, Result<decimal> MinimumAmpacity, bool TooLong, bool NeedsDevice);

/// <summary>
/// 240.21(C): secondary conductors without protection at the transformer. The 10 ft rule
/// (240.21(C)(2)) and the 25 ft rule (240.21(C)(6)) are checked; (C)(1) (protection by the
/// primary device, only for some connections), (C)(3) (industrial installations) and (C)(4)
/// (outside conductors) depend on facts the list does not hold. Subsection lettering from memory.
/// </summary>
public static class SecondaryConductors
{
    public static SecondaryCheck Check(decimal? lengthFeet, decimal? secondaryDevice, decimal primaryDevice, decimal primaryVolts, decimal secondaryVolts)
    {
        if (lengthFeet is not { } length)
            return new SecondaryCheck(null, Result<decimal>.Missing("no 'length' is written for the secondary conductors, so 240.21(C) cannot say which rule applies"), false, false);
        var ratio = primaryVolts / secondaryVolts;
        if (length <= 10)
            // (C)(2)(1)(d): conductors that leave the enclosure need 1/10 of the primary device, referred to
            // the secondary. Applied whether or not they leave it, since the list does not say.
            return Rule("240.21(C)(2)", secondaryDevice, primaryDevice * ratio / 10m,
                tenth => Step.Amps("10 ft rule: one tenth of the primary device", tenth, "240.21(C)(2)(1)(d) (lettering from memory)",
                    $"{Format.Amps(primaryDevice)} × {Format.Number(primaryVolts)} V ÷ {Format.Number(secondaryVolts)} V ÷ 10; applied in case the conductors leave the enclosure (the conservative reading)"),
                device => Step.Amps("10 ft rule: the device at their end", device, "240.21(C)(2)(1)(b) (lettering from memory)",
                    "ampacity not less than the overcurrent device the secondary conductors end in; 240.4(B)'s next size up does not apply"));

        if (length <= 25)
            return Rule("240.21(C)(6)", secondaryDevice, primaryDevice * ratio / 3m,
                third => Step.Amps("25 ft rule: one third of the primary device", third, "240.21(C)(6)(1) (lettering from memory)",
                    $"secondary ampacity × {Format.Number(secondaryVolts)} V ÷ {Format.Number(primaryVolts)} V ≥ one third of {Format.Amps(primaryDevice)}"),
                device => Step.Amps("25 ft rule: the single device at their end", device, "240.21(C)(6)(2) (lettering from memory)",
                    "the conductors end in a single breaker or set of fuses that limits the load to their ampacity; no next size up"));

        return new SecondaryCheck(null, Result<decimal>.Missing($"{Format.Number(length)} ft of secondary conductors: over the 25 ft of 240.21(C)(6); only outside conductors (240.21(C)(4)) may be longer, and the list does not say where they run"), true, false);
    }

    /// <summary>
    /// A length rule of 240.21(C): the fraction of the primary device, and, where the secondary
    /// conductors end in a device, at least that device; the check is left open without one.
    /// </summary>
    private static SecondaryCheck Rule(string subsection, decimal? secondaryDevice, decimal fraction, Func<decimal, Step> fractionStep, Func<decimal, Step> deviceStep)
    {
        var steps = new List<Step> { fractionStep(fraction) };
        var minimum = fraction;
        if (secondaryDevice is { } device)
        {
            steps.Add(deviceStep(device));
            minimum = Math.Max(minimum, device);
        }

        return new SecondaryCheck(subsection, new Result<decimal>(minimum, [.. steps]), false, secondaryDevice is null);
    }
}
