using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// A feeder that supplies a fire pump, directly or through feeders 'from' it: its device must
/// carry the locked-rotor currents (695.4(B)(2)(a)(1)) instead of staying under the 430.62 maximum,
/// and its conductors carry 125 % of the fire pump and pressure maintenance motors (695.6(C)).
/// </summary>
internal sealed partial class FeederSizer
{
    /// <summary>Everything the feeder supplies, as the fire pump rules see it (motors first, then loads).</summary>
    private List<FirePumpPart> FirePumpParts(FeederNode feeder, decimal volts, Phases phases)
    {
        var supplied = Downstream(feeder).ToList();
        Steps += supplied.Count;
        var results = supplied.SelectMany(f => f.Motors).Select(m => motors.GetValueOrDefault(m)).OfType<MotorResult>().ToList();
        var parts = new List<FirePumpPart>(results.Count);
        foreach (var m in results)
            parts.Add(new FirePumpPart(m.Tag, m.FireService, m.FullLoadCurrent.Value!.Value, m.FirePumpLockedRotor?.Value, m.Quantity));
        foreach (var load in supplied.SelectMany(f => f.Loads))
        {
            if (LoadOf(load, volts, phases) is { } l) parts.Add(new FirePumpPart(l.Tag, load.FireService?.Value, l.Amps, null));
        }

        return parts;
    }

    /// <summary>695.6(C) where it asks for more than 430.24; true when it governs.</summary>
    private static bool FirePumpAmpacity(FeederResult r, List<FirePumpPart> parts)
    {
        if (FirePump.ConductorAmpacity(parts) is not { Value: { } needed } fp || r.RequiredAmpacity?.Value is not { } byArticle430) return false;
        if (needed <= byArticle430)
        {
            r.RequiredAmpacity = new Result<decimal>(byArticle430, [.. r.RequiredAmpacity.Steps, .. fp.Steps,
                Step.Amps("Required feeder ampacity", byArticle430, "NEC 430.24, 695.6(C)", "the larger of the two: 430.24 governs")]);
            return false;
        }

        r.RequiredAmpacity = new Result<decimal>(needed, [.. r.RequiredAmpacity.Steps, .. fp.Steps,
            Step.Amps("Required feeder ampacity", needed, "NEC 430.24, 695.6(C)", "the larger of the two: 695.6(C) governs")]);
        return true;
    }

    private void CheckFirePumpProtection(FeederNode feeder, FeederResult r)
    {
        if (r.FirePumpMinimumProtection is not { } minimum) return;
        if (minimum.Value is not { } min)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, feeder.Header.KeywordToken.Range,
                $"the feeder supplies a fire pump and its protection cannot be checked: {minimum.Unavailable}");
            return;
        }

        var text = $"{Format.Number(min)}A";
        if (feeder.Protection is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Header.KeywordToken.Range,
                $"no feeder protection given; a fire pump supply's device must be at least {Format.Amps(min)} (NEC 695.4(B)(2)(a)(1))",
                new Fix("Add the fire pump supply's minimum protection", [edits.Insert(feeder, $"protection inverse-time-breaker {text}")]));
            return;
        }

        if (feeder.ProtectionRating is not { } rating)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Protection.Range,
                $"no rating given; a fire pump supply's device must be at least {Format.Amps(min)} (NEC 695.4(B)(2)(a)(1))",
                new Fix("Add the minimum rating", [EditBuilder.Append(feeder.Statement("protection")!, text)]));
            return;
        }

        if (feeder.ProtectionListed is not null)
        {
            Add(FindingCodes.FirePumpListedDevice, Severity.Information, feeder.Protection.Range,
                "accepted as listed for fire pump service (NEC 695.4(B)(2)); its time-current curve was not checked against the locked-rotor currents it must carry");
            return;
        }

        if (rating.Value.Value < min)
            Add(FindingCodes.FirePumpProtectionTooSmall, Severity.Error, rating.Range,
                $"feeder protection {Format.Amps(rating.Value.Value)} is below the {Format.Amps(min)} a fire pump supply needs to carry the locked-rotor currents indefinitely (NEC 695.4(B)(2)(a)(1))",
                new Fix($"Change the rating to {text}", [EditBuilder.Replace(feeder.Statement("protection")!.Arg("rating")!, text)]));
    }
}
