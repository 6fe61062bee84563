using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Power;

/// <summary>A motor's feeder tap ('tap'): its conductors, their ampacity, and what 430.28 asks of them; <c>Unchecked</c> says why nothing could be checked.</summary>
public sealed record TapResult(MotorNode Motor, decimal LengthFeet, WireSpec Wire, Result<decimal> Ampacity, TapCheck? Check, string? Unchecked);

/// <summary>
/// 430.28 on every motor with a 'tap': the tap runs from its feeder's conductors to the motor's
/// branch-circuit protective device. It needs both the motor's sizing (Part II) and the feeder's
/// (its conductors and device), so it runs after both, once per analysis, in one pass over the
/// motors (docs/checks.md, Feeder taps).
/// </summary>
internal static class FeederTapChecks
{
    public static Dictionary<MotorNode, TapResult> Run(MotorList model, LikeResolver likes, IReadOnlyDictionary<MotorNode, MotorResult> motors,
        IReadOnlyDictionary<FeederNode, FeederResult> feeders, List<Finding> findings)
    {
        var taps = new Dictionary<MotorNode, TapResult>();
        foreach (var m in motors.Values)
        {
            if (likes.Get(m.Motor, static n => n.TapLength) is not { } length || likes.Get(m.Motor, static n => n.TapWire) is not { } wire) continue;
            var own = wire.Owner == m.Motor;
            var at = own ? wire.Value.Range : m.Motor.Like!.Range;
            var conditions = Settings.For(m.Motor, model, likes).Conditions;
            var tap = Check(m, conditions, feeders.GetValueOrDefault(m.Motor.Feeder), Conversions.Feet(length.Value.Value), wire.Value.Value);
            taps[m.Motor] = tap;
            Report(tap, m, conditions, at, own, findings);
        }

        return taps;
    }

    private static TapResult Check(MotorResult m, InstallationConditions conditions, FeederResult? feeder, decimal feet, WireSpec wire)
    {
        // Tap conductors end at a branch device, not at the motor: the 110.14(C) allowance for design B-D motor terminals is not theirs.
        var ampacity = Ampacity.Allowable(wire, conditions, false);
        TapResult Unchecked(string why) => new(m.Motor, feet, wire, ampacity, null, why);
        if (m.RequiredAmpacity?.Value is not { } partTwo) return Unchecked("the motor's branch conductor ampacity (Part II) was not worked out");
        if (feeder is null) return Unchecked("the motor's feeder was not sized");
        if (m.Motor.Feeder.Transformer is not null)
            return Unchecked($"{feeder.Tag}'s conductors are a transformer's secondary conductors, which 240.21(C) governs, not 430.28");
        var check = FeederTaps.Check(feet, partTwo, ampacity.Value, feeder.WireAmpacity?.Value, feeder.ProtectionRating);
        return new TapResult(m.Motor, feet, wire, ampacity, check, null);
    }

    private static void Report(TapResult tap, MotorResult m, InstallationConditions conditions, SourceRange at, bool own, List<Finding> findings)
    {
        var tag = m.Tag;
        if (m.ProtectionRating is null)
            findings.Add(new Finding(FindingCodes.TapWithoutBranchDevice, Severity.Warning, at,
                $"{tag}'s tap conductors must end in a branch-circuit protective device (430.28), and no 'protection' rating is written for the motor"));
        if (tap.Unchecked is { } why)
        {
            findings.Add(new Finding(FindingCodes.TapNotChecked, Severity.Warning, at, $"{tag}'s feeder tap is not checked: {why}"));
            return;
        }

        if (tap.Ampacity.Value is not { } have)
        {
            findings.Add(new Finding(FindingCodes.TapNotChecked, Severity.Warning, at, $"{tag}'s feeder tap is not checked: {tap.Ampacity.Unavailable}"));
            return;
        }

        var check = tap.Check!;
        if (check.Passes is null)
        {
            findings.Add(new Finding(FindingCodes.TapNotChecked, Severity.Warning, at,
                $"{tag}'s feeder tap ({Format.Amps(have)}) cannot be checked: {check.MinimumAmpacity.Unavailable}"));
            return;
        }

        if (check.Passes == true) return;
        var minimum = check.MinimumAmpacity.Value!.Value;
        var partTwo = m.RequiredAmpacity!.Value!.Value;
        var (code, rule) = have < partTwo
            ? (FindingCodes.TapBelowPartTwo, $"430.28 asks at least the {Format.Amps(partTwo)} Part II asks for the motor")
            : tap.LengthFeet <= 10 ? (FindingCodes.TapTenFootRule, "a tap not over 10 ft needs the feeder's device at most 1000 % of its ampacity (430.28(1)) or one third of the feeder conductors' ampacity (430.28(2))")
            : tap.LengthFeet <= 25 ? (FindingCodes.TapTwentyFiveFootRule, "a tap over 10 ft and not over 25 ft needs one third of the feeder conductors' ampacity (430.28(2))")
            : (FindingCodes.TapOverTwentyFiveFeet, "a tap over 25 ft needs the feeder conductors' ampacity (430.28(3); the high-bay Exception is not applied)");
        var wire = Ampacity.Minimum(minimum, conditions, false).Value;
        var fix = own && wire is { } w && tap.Motor.Statement("tap")?.Arg("size") is { } arg
            ? new Fix($"Change the tap conductors to {w}", [Fixes.EditBuilder.Replace(arg, w.ToString())])
            : null;
        findings.Add(new Finding(code, Severity.Error, at,
            $"{tag}'s {Format.Number(tap.LengthFeet)} ft tap of {tap.Wire} carries {Format.Amps(have)}; {rule}: at least {Format.Amps(decimal.Round(minimum, 2))}"
            + (wire is { } size ? $", {size}" : ""), fix));
    }
}
