namespace MotorLang.Sizing.Rules;

/// <summary>Separate overload device for a continuous-duty motor over 1 hp, 430.32(A)(1), from the nameplate current.</summary>
public static class Overloads
{
    /// <summary>The rating limit: 125 % of nameplate current for a service factor of 1.15 or more or a temperature rise of 40 °C or less, 115 % otherwise.</summary>
    public static Result<decimal> Maximum(decimal? nameplateAmps, decimal? serviceFactor, decimal? temperatureRiseC) =>
        Limit(nameplateAmps, serviceFactor, temperatureRiseC, 125m, 115m, "NEC 430.32(A)(1)", "Overload limit");

    /// <summary>
    /// 430.32(C): where the 430.32(A)(1) device will not carry the starting current, the next higher size
    /// or setting is permitted up to 140 % (service factor ≥ 1.15 or rise ≤ 40 °C) or 130 % (others).
    /// </summary>
    public static Result<decimal> AbsoluteMaximum(decimal? nameplateAmps, decimal? serviceFactor, decimal? temperatureRiseC) =>
        Limit(nameplateAmps, serviceFactor, temperatureRiseC, 140m, 130m, "NEC 430.32(C)", "Overload maximum when it trips on starting");

    /// <summary>
    /// The 430.32(A)(1) or (C) limit from a current other than the nameplate (460.9: the improved-power-factor
    /// current with a capacitor on the load side of the overload), the basis's own steps first.
    /// </summary>
    public static Result<decimal> FromBasis(Result<decimal> basis, decimal? serviceFactor, decimal? temperatureRiseC, bool absolute)
    {
        if (basis.Value is not { } amps) return basis;
        var limit = absolute ? AbsoluteMaximum(amps, serviceFactor, temperatureRiseC) : Maximum(amps, serviceFactor, temperatureRiseC);
        return new Result<decimal>(limit.Value, [.. basis.Steps, .. limit.Steps.Skip(1)], limit.Unavailable);
    }

    private static Result<decimal> Limit(decimal? nameplateAmps, decimal? sf, decimal? rise, decimal high, decimal low, string rule, string label)
    {
        if (nameplateAmps is not { } np)
            return Result<decimal>.Missing("needs the nameplate current: overloads are sized from it, not from the tables (430.6(A)(2))");
        var (percent, why) = sf >= 1.15m
            ? (high, $"service factor {Format.Number(sf.Value)} ≥ 1.15")
            : rise <= 40m
                ? (high, $"temperature rise {Format.Number(rise.Value)} °C ≤ 40 °C")
                : (low, sf is null && rise is null ? "no service factor or temperature rise marked" : "other motors");
        var limit = np * percent / 100m;
        return Result<decimal>.Of(limit,
            Step.Amps("Nameplate current", np, "NEC 430.6(A)(2)", "overloads use the nameplate, not the table"),
            Step.Amps(label, limit, rule, $"{Format.Percent(percent)} × {Format.Amps(np)}: {why}"));
    }
}
