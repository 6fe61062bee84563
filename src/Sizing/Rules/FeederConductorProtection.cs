namespace MotorLang.Sizing.Rules;

/// <summary>430.62(B): feeder protection based on the ampacity of feeder conductors larger than 430.24 requires.</summary>
public static class FeederConductorProtection
{
    /// <summary>
    /// The larger of the 430.62(A) maximum and, where the written conductors' corrected ampacity is
    /// above what 430.24 requires, the largest standard rating not above that ampacity. Read
    /// conservatively: no 240.4(B) next-size-up, the device never exceeds the conductors' ampacity.
    /// </summary>
    public static Result<decimal> Maximum(Result<decimal> partA, decimal? wireAmpacity, decimal requiredAmpacity, bool fuse)
    {
        // Where 430.62(A) gives no limit (a device MotorLang cannot size, a motor with no maximum) neither does (B).
        if (partA.Value is null || wireAmpacity is not { } ampacity || ampacity <= requiredAmpacity) return partA;
        var byConductors = StandardRatings.AtOrBelow(ampacity, fuse);
        if (byConductors is not { } rating || partA.Value >= rating) return partA;
        return new Result<decimal>(rating, [.. partA.Steps,
            Step.Amps("Conductor ampacity", ampacity, "NEC 430.62(B)", $"the feeder conductors carry more than the {Format.Amps(requiredAmpacity)} 430.24 requires"),
            Step.Amps("Maximum feeder protection", rating, "NEC 430.62(B), 240.6(A)",
                "based on the conductors' ampacity: the largest standard rating not above it (no 240.4(B) round-up, conservative reading)")]);
    }
}
