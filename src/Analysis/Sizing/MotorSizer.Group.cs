using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// A motor on a branch circuit that supplies several (430.53): its conductors are a tap
/// (430.53(D)) and its grounding conductor follows the circuit's device; and a branch device that
/// is also the motor's overload (430.55).
/// </summary>
internal sealed partial class MotorSizer
{
    /// <summary>The motor is on a branch circuit supplying several motors and has no device of its own: the circuit's device protects it.</summary>
    private bool IsGroupTap(MotorNode motor) => motor.Feeder.BranchGroup is not null && Get(motor, m => m.Protection) is null;

    /// <summary>A group member without a device of its own: said in its protection steps instead of asking for one.</summary>
    private void GroupProtected(MotorNode motor, MotorResult r)
    {
        var kind = motor.Feeder.BranchGroup!.Value;
        var rule = kind switch { BranchGroupKind.SmallMotors => "NEC 430.53(A)", BranchGroupKind.SmallestProtected => "NEC 430.53(B)", _ => "NEC 430.53(C), 430.53(D)" };
        r.ProtectedByGroup = true;
        var steps = r.MaximumProtection?.Steps ?? [];
        r.MaximumProtection = new Result<decimal>(r.MaximumProtection?.Value,
            [.. steps, new Step("Protected by", $"{motor.Feeder.Tag?.Value}", rule,
                "the branch circuit's device protects this motor with the others; this motor's own 430.52 maximum is what the circuit's limit is worked out from")],
            r.MaximumProtection?.Unavailable);
    }

    /// <summary>
    /// 430.53(D): the motor's conductors are a tap from the group circuit. They meet 430.22 (checked
    /// as a branch wire) and carry the circuit conductors' ampacity, or one third of it for a tap of
    /// 25 ft or less. Only for a motor without its own device.
    /// </summary>
    private void CheckGroupTap(MotorNode motor, MotorResult r, InstallationConditions conditions, bool designBcd)
    {
        if (!IsGroupTap(motor)) return;
        var feeder = motor.Feeder;
        if (feeder.Wire is not { } branch) return;
        if (cache.Allowable(branch.Value, FeederSettings(feeder).Conditions, false).Value is not { } branchAmpacity) return;
        var feet = Get(motor, m => m.Length)?.Value is { } length ? Conversions.Feet(length) : (decimal?)null;
        r.TapAmpacity = GroupCircuits.TapAmpacity(branchAmpacity, feet);
        var need = r.TapAmpacity.Value!.Value;
        if (r.Wire is not { } wire || r.WireAmpacity?.Value is not { } carries || carries >= need) return;
        var minimum = cache.MinimumWire(Math.Max(need, r.RequiredAmpacity?.Value ?? 0), conditions, designBcd).Value;
        var owner = (MotorNode?)null;
        Get(motor, m => m.Wire, out owner);
        Add(FindingCodes.GroupTapUndersized, Severity.Error, RangeOn(motor, owner, Get(motor, m => m.Wire)!.Range),
            $"wire {wire} carries {Format.Amps(carries)}; as a tap from {feeder.Tag?.Value} with no device of its own it must carry {Format.Amps(need)} (NEC {(need == branchAmpacity ? "430.53(D)(1)" : "430.53(D)(2)")})"
            + (minimum is { } m ? $": use {m}" : ""),
            minimum is { } fix ? ReplaceOrOverride(motor, owner, "wire", "size", fix.ToString(), $"Change the wire to {fix}") : null);
    }

    /// <summary>
    /// 430.55: a device written 'combined-overload' is also the motor's overload, so it must be
    /// rated as 430.32 requires of an overload; no separate overload is then asked for.
    /// </summary>
    private bool CombinedDeviceIsOverload(MotorNode motor, MotorResult r)
    {
        if (Get(motor, m => m.ProtectionCombinedOverload, out var owner) is not { } marked) return false;
        var rating = Get(motor, m => m.ProtectionRating);
        r.NoOverloadRequired = Result<bool>.Of(true,
            new Step("Separate overload", "not required", "NEC 430.55", "the branch device is rated to provide the overload protection 430.32 requires"));
        if (rating is null || r.OverloadLimit?.Value is not { } max || r.OverloadAbsoluteLimit?.Value is not { } absolute)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, marked.Range),
                "the device that is also the overload cannot be checked against NEC 430.32 without its rating and the nameplate current (NEC 430.55)");
            return true;
        }

        var value = rating.Value.Value;
        if (value > absolute)
            Add(FindingCodes.CombinedDeviceTooLarge, Severity.Error, RangeOn(motor, owner, rating.Range),
                $"the device {Format.Amps(value)} is also the overload (NEC 430.55), and is above even the NEC 430.32(C) maximum of {Format.Amps(absolute)}; 430.32(A)(1) allows {Format.Amps(max)}");
        else if (value > max)
            Add(FindingCodes.CombinedDeviceAboveRunningLimit, Severity.Warning, RangeOn(motor, owner, rating.Range),
                $"the device {Format.Amps(value)} is also the overload (NEC 430.55), and is above the NEC 430.32(A)(1) limit of {Format.Amps(max)}; allowed only where the smaller one will not start the motor (430.32(C), up to {Format.Amps(absolute)})");
        return true;
    }

    private Dictionary<string, int>? _interlockLines;

    /// <summary>An interlock named on one motor line only interlocks nothing: said, since a misspelt partner would otherwise pass unnoticed.</summary>
    private void CheckInterlock(MotorNode motor)
    {
        if (motor.Interlock is not { } name) return;
        if (_interlockLines is null)
        {
            _interlockLines = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
            foreach (var f in model.Feeders)
            foreach (var m in f.Motors)
                if (m.Interlock is { } n) _interlockLines[n.Value] = _interlockLines.GetValueOrDefault(n.Value) + 1;
        }

        if (_interlockLines.GetValueOrDefault(name.Value) < 2)
            Add(FindingCodes.InterlockAlone, Severity.Warning, name.Range,
                $"interlock {name.Value} is written on this motor only: nothing is interlocked with it, so every motor is counted (NEC 430.24 Exception No. 3)");
    }
}
