using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Part-winding start motors, 430.4: each winding connection has its own short-circuit device at
/// most one half of the 430.52 value, and separate overloads trip at one half of the 430.32 value;
/// or one device protects both windings where it lets the motor start, a time-delay fuse then at
/// most 150 % of full-load current.
/// </summary>
public static class PartWinding
{
    /// <summary>The short-circuit device limit for a part-winding motor, from the ordinary 430.52 maximum.</summary>
    public static Result<decimal> MaximumProtection(Result<decimal> full, ProtectionInput p, WindingScope scope)
    {
        if (full.Value is not { } max) return full;
        var fuse = ShortCircuitProtection.IsFuse(p.Device);
        var steps = full.Steps.ToList();
        if (scope == WindingScope.PerWinding)
        {
            var half = max / 2m;
            if (ShortCircuitProtection.IsSetting(p.Device))
            {
                steps.Add(Step.Amps("Maximum setting for each winding", half, "NEC 430.4", $"one half of {Format.Amps(max)}"));
                return new Result<decimal>(half, [.. steps]);
            }

            var rating = StandardRatings.AtOrBelow(half, fuse);
            if (rating is null) return Result<decimal>.Missing($"no standard rating at or below {Format.Amps(half)}", [.. steps]);
            steps.Add(Step.Amps("Maximum rating for each winding", rating.Value, "NEC 430.4",
                $"one half of {Format.Amps(max)} = {Format.Amps(half)}, not rounded up again (conservative reading); one device per winding connection"));
            return new Result<decimal>(rating, [.. steps]);
        }

        if (p.Device == ProtectiveDevice.DualElementFuse)
        {
            var limit = p.FullLoadAmps * 1.5m;
            var rating = StandardRatings.AtOrBelow(Math.Min(limit, max), fuse);
            if (rating is null) return Result<decimal>.Missing($"no standard rating at or below {Format.Amps(limit)}", [.. steps]);
            steps.Add(Step.Amps("Maximum rating for both windings", rating.Value, "NEC 430.4 Exception",
                $"a time-delay fuse for both windings: not exceeding 150 % × {Format.Amps(p.FullLoadAmps)} = {Format.Amps(limit)}"));
            return new Result<decimal>(rating, [.. steps]);
        }

        steps.Add(Step.Amps("Maximum for both windings", max, "NEC 430.4 Exception",
            "one device for both windings where it allows the motor to start; the rule sets no other ceiling for this device, so the full 430.52 maximum still applies (conservative reading)"));
        return new Result<decimal>(max, [.. steps]);
    }

    /// <summary>430.4: separate overloads on each half of the winding trip at one half of the 430.32 value.</summary>
    public static Result<decimal> Overload(Result<decimal> full, WindingScope scope, string label)
    {
        if (full.Value is not { } limit || scope == WindingScope.BothWindings) return full;
        return new Result<decimal>(limit / 2m, [.. full.Steps, Step.Amps(label, limit / 2m, "NEC 430.4", $"one half of {Format.Amps(limit)} for each half of the winding")]);
    }
}
