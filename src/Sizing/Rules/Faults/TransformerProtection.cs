using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules.Faults;

/// <summary>Table 450.3(B): with a secondary device, the primary may go to 250 % and the secondary to 125 % (167 %); without one, the primary alone to 125 % (167 %, 300 %).</summary>
public enum TransformerProtectionMethod { PrimaryOnly, PrimaryAndSecondary }

/// <summary>The largest overcurrent device Table 450.3(B) permits on a transformer winding of 1000 V or less.</summary>
public static class TransformerProtection
{
    private const string Rule = "NFPA 70-2023 Table 450.3(B)";

    private static readonly (string Method, string Winding, decimal From, decimal Percent, bool NextSizeUp)[] Rows =
        CodeTables.TransformerProtection.Rows
            .Select(r => (r[0], r[1], CsvTable.Number(r[2])!.Value, CsvTable.Number(r[3])!.Value, r[4] == "yes")).ToArray();

    public static string Name(TransformerProtectionMethod method) =>
        method == TransformerProtectionMethod.PrimaryOnly ? "primary-only" : "primary-and-secondary";

    /// <summary>
    /// The maximum rating for the winding whose rated current is <paramref name="ratedAmps"/>: the
    /// table's percentage, and for the 125 % cells Note 1's next standard rating (240.6(A)) where
    /// 125 % is not one. <paramref name="fuse"/> selects the standard ratings that apply.
    /// </summary>
    public static Result<decimal> Maximum(TransformerProtectionMethod method, bool primary, decimal ratedAmps, bool fuse)
    {
        var name = Name(method);
        var winding = primary ? "primary" : "secondary";
        var row = Rows.Where(r => r.Method == name && r.Winding == winding && ratedAmps >= r.From).MaxBy(r => r.From);
        var limit = ratedAmps * row.Percent / 100m;
        var basis = Step.Amps($"Table 450.3(B), {name}, {winding}", limit, Rule,
            $"{Format.Number(row.Percent)} % × {Format.Amps(ratedAmps)} rated {winding} current ({(row.From == 0 ? "the first column" : $"currents of {Format.Number(row.From)} A or more")})");
        if (!row.NextSizeUp || StandardRatings.IsStandard(limit, fuse)) return Result<decimal>.Of(limit, basis);
        if (StandardRatings.AtOrAbove(limit, fuse) is not { } next) return Result<decimal>.Of(limit, basis);
        return Result<decimal>.Of(next, basis,
            Step.Amps("Next standard rating (Note 1)", next, $"{Rule} Note 1, 240.6(A)",
                $"{Format.Amps(limit)} is not a standard rating; Note 1 permits the next higher one"));
    }
}
