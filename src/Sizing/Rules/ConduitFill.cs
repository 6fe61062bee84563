using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>The conductors in one raceway: how many of each size.</summary>
public readonly record struct RacewayContents(int PhaseConductors, ConductorSize PhaseSize, ConductorSize? GroundSize);

/// <summary>A raceway trade size as Table 4 prints it ("3/4", "1-1/4").</summary>
public readonly record struct TradeSize(string Name)
{
    public override string ToString() => Name;
}

/// <summary>Conduit fill, Chapter 9 Tables 1, 4 and 5 (THHN/THWN/THWN-2 areas).</summary>
public static class ConduitFill
{
    /// <summary>Whether Chapter 9 Table 5 areas are carried for this insulation (only THHN, THWN and THWN-2 are).</summary>
    public static bool CarriesInsulation(string insulation) => insulation is "THHN" or "THWN" or "THWN-2";

    /// <summary>Chapter 9 Table 1: 53 % for one conductor, 31 % for two, 40 % for more.</summary>
    public static decimal PermittedPercent(RacewayContents contents) =>
        (contents.PhaseConductors + (contents.GroundSize is null ? 0 : 1)) switch { 1 => 53m, 2 => 31m, _ => 40m };

    /// <summary>Whether Table 5 has an area for every conductor in the raceway (it has none below 14 AWG).</summary>
    public static bool CarriesSizes(RacewayContents contents) =>
        Area(contents.PhaseSize) is not null && (contents.GroundSize is not { } g || Area(g) is not null);

    /// <summary>Whether Table 4 has this trade size.</summary>
    public static bool IsTradeSize(string tradeSize) => CodeTables.ConduitArea.Rows.Any(r => r[0] == tradeSize);

    /// <summary>The smallest trade size of the raceway whose permitted fill (Table 1) holds the conductors.</summary>
    public static Result<TradeSize> SmallestTradeSize(RacewayContents contents, RacewayType raceway, string insulation)
    {
        if (insulation is not ("THHN" or "THWN" or "THWN-2"))
            return Result<TradeSize>.Missing($"conductor areas are carried for THHN, THWN and THWN-2 only, not {insulation} (Chapter 9 Table 5)");
        var phaseArea = Area(contents.PhaseSize);
        var groundArea = contents.GroundSize is { } g ? Area(g) : 0m;
        if (phaseArea is null || groundArea is null)
            return Result<TradeSize>.Missing("Chapter 9 Table 5 has no area for one of these sizes");
        var count = contents.PhaseConductors + (contents.GroundSize is null ? 0 : 1);
        var total = phaseArea.Value * contents.PhaseConductors + groundArea.Value;
        var percent = count switch { 1 => 53m, 2 => 31m, _ => 40m };
        var t = CodeTables.ConduitArea;
        var column = t.Column(raceway switch { RacewayType.Emt => "emt", RacewayType.Rmc => "rmc", _ => "pvc" });
        var row = t.Rows.FirstOrDefault(r => CsvTable.Number(r[column])!.Value * percent / 100m >= total);
        var steps = new List<Step>
        {
            new("Conductor area", $"{total:0.####} in²", "NEC Chapter 9 Table 5",
                $"{contents.PhaseConductors} × {contents.PhaseSize} ({phaseArea:0.####} in²){(contents.GroundSize is { } gs ? $" + {gs} ({groundArea:0.####} in²)" : "")}"),
        };
        if (row is null) return Result<TradeSize>.Missing($"more than a 4 in {raceway.ToString().ToUpperInvariant()} can hold at {Format.Percent(percent)} fill", [.. steps]);
        steps.Add(new Step("Raceway", $"{row[0]} in {raceway.ToString().ToUpperInvariant()}", "NEC Chapter 9 Tables 1 and 4",
            $"{Format.Percent(percent)} of {row[column]} in² = {CsvTable.Number(row[column])!.Value * percent / 100m:0.###} in² ≥ {total:0.####} in²"));
        return new Result<TradeSize>(new TradeSize(row[0]), [.. steps]);
    }

    /// <summary>The fill of a given trade size, in percent of its total area; null when the size is not in Table 4.</summary>
    public static decimal? FillPercent(RacewayContents contents, RacewayType raceway, string tradeSize)
    {
        var t = CodeTables.ConduitArea;
        var row = t.Rows.FirstOrDefault(r => r[0] == tradeSize);
        var phase = Area(contents.PhaseSize);
        var ground = contents.GroundSize is { } g ? Area(g) : 0m;
        if (row is null || phase is null || ground is null) return null;
        var area = CsvTable.Number(row[t.Column(raceway switch { RacewayType.Emt => "emt", RacewayType.Rmc => "rmc", _ => "pvc" })])!.Value;
        return (phase.Value * contents.PhaseConductors + ground.Value) / area * 100m;
    }

    private static decimal? Area(ConductorSize size) =>
        CodeTables.RowFor(CodeTables.ConductorArea, size) is { } row ? CsvTable.Number(row[1]) : null;
}
