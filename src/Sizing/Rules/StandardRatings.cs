using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Standard ampere ratings of fuses and inverse-time breakers, 240.6(A).</summary>
public static class StandardRatings
{
    private static readonly (decimal Amps, bool FuseOnly)[] Ratings =
        CodeTables.StandardRatings.Rows.Select(r => (CsvTable.Number(r[0])!.Value, r[1] == "yes")).ToArray();

    public static IEnumerable<decimal> For(bool fuse) => Ratings.Where(r => fuse || !r.FuseOnly).Select(r => r.Amps);

    public static bool IsStandard(decimal amps, bool fuse) => For(fuse).Contains(amps);

    /// <summary>The smallest standard rating at or above <paramref name="amps"/>; null above 6000 A.</summary>
    public static decimal? AtOrAbove(decimal amps, bool fuse) => For(fuse).Where(r => r >= amps).Cast<decimal?>().FirstOrDefault();

    /// <summary>The largest standard rating at or below <paramref name="amps"/>; null below the smallest.</summary>
    public static decimal? AtOrBelow(decimal amps, bool fuse) => For(fuse).Where(r => r <= amps).Cast<decimal?>().LastOrDefault();
}
