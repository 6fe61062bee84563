using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>What the conduit-fill check (Chapter 9 Tables 1, 4, 5) found for one circuit's stated raceway.</summary>
internal readonly record struct ConduitOutcome(decimal? FillPercent, decimal PermittedPercent, TradeSize? Smallest, string? NotChecked);

/// <summary>
/// One conduit-fill check for motor branches and feeders alike. Where the tables do not carry
/// what the raceway holds, it says so in words instead of passing the raceway silently.
/// </summary>
internal static class ConduitCheck
{
    public static ConduitOutcome Check(WireSpec wire, ConductorSize? ground, int phaseConductors, RacewayType raceway, string insulation,
        string tradeSize, Result<TradeSize>? smallest)
    {
        var contents = new RacewayContents(phaseConductors, wire.Size, ground);
        var permitted = ConduitFill.PermittedPercent(contents);
        if (!ConduitFill.CarriesInsulation(insulation))
            return new(null, permitted, null,
                $"conduit fill is not checked: Chapter 9 Table 5 areas are carried for THHN, THWN and THWN-2 only, not {insulation}");
        if (wire.Sets > 1)
            return new(null, permitted, null,
                "conduit fill is not checked for parallel sets: the list does not say how the sets are divided among raceways (310.10(G)(4))");
        if (!ConduitFill.CarriesSizes(contents))
            return new(null, permitted, null, "conduit fill is not checked: Chapter 9 Table 5 areas are carried for 14 AWG through 1000 kcmil only");
        if (!ConduitFill.IsTradeSize(tradeSize))
            return new(null, permitted, null, $"conduit fill is not checked: {tradeSize} in is not a trade size of Chapter 9 Table 4 (1/2 in to 4 in)");
        var fill = ConduitFill.FillPercent(contents, raceway, tradeSize);
        return new(fill, permitted, smallest?.Value, null);
    }
}
