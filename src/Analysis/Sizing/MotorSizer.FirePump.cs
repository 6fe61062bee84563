using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Text;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Fire pump motors (Article 695): the branch device carries locked-rotor current (a minimum, no
/// 430.52 maximum), there is no overload, and the branch's part of the 695.7 drops is worked out
/// here (the feeders' part is added once feeders are sized). Also the drive and part-winding
/// details that change how an ordinary motor's overload is judged.
/// </summary>
internal sealed partial class MotorSizer
{
    /// <summary>The largest locked-rotor current known, at the motor's rated voltage (695.4(B)(2)(a)(1)).</summary>
    private Result<decimal> FirePumpLockedRotor(MotorNode motor, MotorResult r, Phases phases, DesignLetter? design)
    {
        var nameplate = Get(motor, m => m.LockedRotorCurrent)?.Value.Value;
        Result<CurrentRange>? letter = phases != Phases.Dc && Get(motor, m => m.CodeLetter) is { } l
            ? cache.LockedRotorFromCodeLetter(r.Horsepower, r.RatedVolts, phases, l.Value)
            : null;
        Result<decimal>? table = phases != Phases.Dc ? cache.LockedRotorMaximum(r.Horsepower, r.RatedVolts, phases, design ?? DesignLetter.B) : null;
        return FirePump.LockedRotorCurrent(nameplate, letter, table);
    }

    private void CheckFirePumpProtection(MotorNode motor, MotorResult r, decimal flc, Phases phases, DesignLetter? design)
    {
        var device = Get(motor, m => m.Protection, out var deviceOwner);
        var rating = Get(motor, m => m.ProtectionRating, out var ratingOwner);
        r.Device = device?.Value ?? ProtectiveDevice.InverseTimeBreaker;
        r.ProtectionRating = rating?.Value.Value;
        r.FirePumpListedDevice = Get(motor, m => m.ProtectionListed) is not null;
        r.FirePumpLockedRotor = FirePumpLockedRotor(motor, r, phases, design);
        if (r.FirePumpLockedRotor.Value is not { } lrc)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                $"fire pump protection cannot be checked: {r.FirePumpLockedRotor.Unavailable} (NEC 695.4(B)(2)(a)(1))");
            return;
        }

        var min = FirePumpMinimum(r, lrc, flc);
        if (min is null) return;
        var text = Format.Number(min.Value) + "A";
        if (device is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                $"no protection given; a fire pump's device must carry its locked-rotor current indefinitely: at least {Format.Amps(min.Value)} (NEC 695.4(B)(2)(a)(1))",
                Insert(motor, $"protection inverse-time-breaker {text}", "Add the fire pump's minimum inverse-time breaker"));
            return;
        }

        if (rating is null)
        {
            var statement = deviceOwner!.Statement("protection")!;
            Add(FindingCodes.NotWritten, Severity.Information, device.Range,
                $"no rating given; a fire pump's device must be at least {Format.Amps(min.Value)} (NEC 695.4(B)(2)(a)(1))",
                deviceOwner == motor ? new Fix("Add the minimum rating", [EditBuilder.Append(statement, text)]) : null);
            return;
        }

        if (r.FirePumpListedDevice)
        {
            Add(FindingCodes.FirePumpListedDevice, Severity.Information, RangeOn(motor, deviceOwner, device.Range),
                $"accepted as listed for fire pump service (NEC 695.4(B)(2)); its time-current curve was not checked against the {Format.Amps(lrc)} locked-rotor current");
            return;
        }

        if (rating.Value.Value < min.Value)
            Add(FindingCodes.FirePumpProtectionTooSmall, Severity.Error, RangeOn(motor, ratingOwner, rating.Range),
                $"{ShortCircuitProtection.DeviceName(r.Device)} {Format.Amps(rating.Value.Value)} is below the {Format.Amps(min.Value)} a fire pump needs to carry its {Format.Amps(lrc)} locked-rotor current indefinitely (NEC 695.4(B)(2)(a)(1))",
                ReplaceOrOverride(motor, ratingOwner, "protection", "rating", text, $"Change the rating to {text}",
                    overrideText: $"protection {Keywords.Devices.First(d => Equals(d.Value, r.Device)).Canonical} {text}"));
    }

    /// <summary>The fire pump's minimum device: a standard rating, or for an instantaneous-trip breaker a setting.</summary>
    private decimal? FirePumpMinimum(MotorResult r, decimal lrc, decimal flc)
    {
        if (ShortCircuitProtection.IsSetting(r.Device))
        {
            var setting = decimal.Ceiling(lrc);
            r.FirePumpMinimumProtection = Result<decimal>.Of(setting, [.. r.FirePumpLockedRotor!.Steps,
                Step.Amps("Minimum setting", setting, "NEC 695.4(B)(2)(a)(1)", "an instantaneous-trip setting is not a standard rating; rounded up to a whole ampere")]);
        }
        else
        {
            var fuse = ShortCircuitProtection.IsFuse(r.Device);
            var min = FirePump.MinimumDevice([new FirePumpPart(r.Tag, FireServiceRole.FirePump, flc, lrc)], fuse);
            r.FirePumpMinimumProtection = new Result<decimal>(min.Value, [.. r.FirePumpLockedRotor!.Steps, .. min.Steps], min.Unavailable);
        }

        if (r.FirePumpListedDevice)
            r.FirePumpMinimumProtection = new Result<decimal>(r.FirePumpMinimumProtection.Value, [.. r.FirePumpMinimumProtection.Steps,
                new Step("Device listed for fire pump service", "accepted", "NEC 695.4(B)(2) (from memory)", "its time-current curve was not checked")]);
        return r.FirePumpMinimumProtection.Value;
    }

    /// <summary>695.6(D): no automatic overload protection on a fire pump's power circuit, so never M203 and never an added overload.</summary>
    private void CheckFirePumpOverload(MotorNode motor, MotorResult r)
    {
        r.NoOverloadRequired = Result<bool>.Of(true,
            new Step("Overload protection", "none", "NEC 695.6(D)", "a fire pump's power circuit has no automatic overload protection"));
        var overload = Get(motor, m => m.Overload, out var owner);
        r.Overload = overload?.Value.Value;
        if (overload is null) return;
        // Commenting the line out keeps every byte the user wrote.
        Fix? fix = owner == motor && motor.Statement("overload") is { } s
            ? new Fix("Comment out the overload (NEC 695.6(D))", [new TextEdit(new SourceRange(s.KeywordToken.Range.Start, s.KeywordToken.Range.Start), "# ")])
            : null;
        Add(FindingCodes.FirePumpOverload, Severity.Error, RangeOn(motor, owner, overload.Range),
            owner == motor
                ? "a fire pump's power circuit must have no automatic overload protection (NEC 695.6(D)): remove the overload"
                : $"a fire pump's power circuit must have no automatic overload protection (NEC 695.6(D)); this motor inherits an overload from {owner?.Tag?.Value}: do not base it on that motor",
            fix);
    }

    /// <summary>The branch's part of the 695.7 drops: locked-rotor current while starting, 115 % of full-load current running.</summary>
    private void FirePumpBranchDrops(MotorNode motor, MotorResult r, decimal flc, Settings settings)
    {
        var running = flc * FirePump.RunningCurrentFactor;
        if (r.FirePumpLockedRotor?.Value is not { } lrc)
        {
            r.FirePumpBranch = new FirePumpBranch(null, null, 0, 0, "its locked-rotor current is not known");
            return;
        }

        var length = Get(motor, m => m.Length)?.Value;
        var wire = r.Wire ?? r.MinimumWire?.Value;
        if (length is null || wire is null)
        {
            r.FirePumpBranch = new FirePumpBranch(null, null, lrc, running - flc, length is null ? "the branch has no length" : "the branch wire is not known");
            return;
        }

        var feet = Conversions.Feet(length.Value);
        var starting = VoltageDrop.Of(lrc, feet, wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway, VoltageDrop.StartingPowerFactor).Value;
        var run = VoltageDrop.Of(running, feet, wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway, settings.PowerFactor).Value;
        r.FirePumpBranch = new FirePumpBranch(starting, run, lrc, running - flc, starting is null || run is null ? "Chapter 9 Table 9 has no row for the branch wire" : null);
    }

    /// <summary>430.124(A): a drive marked as providing the motor's overload protection needs no separate overload.</summary>
    private bool DriveProvidesOverload(MotorNode motor, MotorResult r, StartingMethod starting)
    {
        if (Get(motor, m => m.DriveOverload) is not { } marked) return false;
        if (starting == StartingMethod.Drive)
        {
            r.NoOverloadRequired = Result<bool>.Of(true,
                new Step("Separate overload", "not required", "NEC 430.124(A)", "the drive is marked as providing the motor's overload protection"));
            return true;
        }

        Add(FindingCodes.CannotCheck, Severity.Warning, marked.Range,
            "'drive-overload' says a drive protects the motor, but the motor is not written as 'starting drive'; the overload is still required (NEC 430.124(A))");
        return false;
    }
}
