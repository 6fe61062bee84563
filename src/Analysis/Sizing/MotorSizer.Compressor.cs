using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// A hermetic refrigerant motor-compressor, or equipment marked as one ('compressor'), sized to
/// Article 440 from its marked currents: conductors 440.32/440.35, protection 440.22 under the
/// marked maximum, disconnect 440.12(A). Grounding, voltage drop and conduit fill as for a motor.
/// </summary>
internal sealed partial class MotorSizer
{
    /// <summary>Motor attributes a compressor has no use for: each is said to be unused, never silently dropped.</summary>
    private static readonly Dictionary<string, string> NotForCompressors = new(StringComparer.Ordinal)
    {
        ["nameplate"] = "a motor-compressor is sized from its rated-load current (440.6(A)): write 'rated-load'",
        ["service-factor"] = "a motor-compressor is sized from its marked currents, not from a service factor",
        ["temp-rise"] = "a motor-compressor is sized from its marked currents",
        ["design"] = "a motor-compressor is sized from its marked currents, not its design letter",
        ["code-letter"] = "a motor-compressor's locked-rotor current is written with 'locked-rotor' from its nameplate",
        ["kind"] = "a motor-compressor is sized under Article 440 whatever its construction",
        ["rated-pf"] = "a motor-compressor is sized from its marked currents",
        ["efficiency"] = "a motor-compressor is sized from its marked currents",
        ["duty"] = "a motor-compressor is sized as continuous duty from its marked currents",
        ["starting"] = "the starting method of a motor-compressor is not modelled; drives and reduced-voltage starters on one are not checked",
        ["drive-overload"] = "drives on a motor-compressor are not modelled",
        ["application"] = "a motor-compressor is sized from its marked currents",
        ["fire-service"] = "a motor-compressor is not part of a fire pump installation",
        ["overload"] = "motor-compressor overload protection (440 Part VI, 440.52) is not checked by MotorLang",
        ["controller"] = "a motor-compressor's controller rating (440.41) is not checked by MotorLang",
        ["capacitor"] = "power-factor capacitors on a motor-compressor circuit are not modelled (Article 460 is checked on motors only)",
        ["capacitor-wire"] = "power-factor capacitors on a motor-compressor circuit are not modelled",
        ["improved-current"] = "a motor-compressor's overload (440 Part VI) is not checked by MotorLang",
        ["motor-leads"] = "the starting method of a motor-compressor is not modelled",
        ["drive-bypass"] = "drives on a motor-compressor are not modelled",
        ["drive-max-protection"] = "drives on a motor-compressor are not modelled",
        ["overload-units"] = "motor-compressor overload protection (440 Part VI) is not checked by MotorLang",
        ["manual-start"] = "motor-compressor overload protection (440 Part VI) is not checked by MotorLang",
        ["control-wire"] = "a motor-compressor's control circuit (430.72) is not checked by MotorLang",
        ["control-protection"] = "a motor-compressor's control circuit (430.72) is not checked by MotorLang",
        ["control-transformer"] = "a motor-compressor's control circuit (430.72) is not checked by MotorLang",
        ["control-primary-protection"] = "a motor-compressor's control circuit (430.72) is not checked by MotorLang",
    };

    private static readonly string[] CompressorOnly = ["rated-load", "selection-current", "min-ampacity", "max-protection"];

    /// <summary>Article 440 markings written under a 'motor': they would be ignored, so it is said.</summary>
    private void WarnCompressorOnly(MotorNode motor)
    {
        foreach (var keyword in CompressorOnly)
        {
            if (motor.Statement(keyword) is { } s)
                Add(FindingCodes.NotUsedHere, Severity.Warning, s.KeywordToken.Range,
                    $"'{keyword}' is not used for a 'motor', which is sized under Article 430 from its horsepower; a motor-compressor or marked equipment is written 'compressor TAG' (Article 440)");
        }
    }

    private MotorResult SizeCompressor(MotorNode motor, MotorResult r)
    {
        var feeder = motor.Feeder;
        r.IsCompressor = true;
        if (feeder.Voltage is not { } systemVolts || feeder.Phases is not { } systemPhases) return r;
        var settings = Settings.For(motor, model, _likes);
        r.Settings = settings;
        var ratedVolts = motor.RatedVoltage?.Value.Value ?? systemVolts.Value.Value;
        var phases = motor.Phases?.Value ?? systemPhases.Value;
        r.Volts = systemVolts.Value.Value;
        r.Phases = phases;
        r.Quantity = Get(motor, m => m.Quantity)?.Value ?? 1;
        if (!CheckVoltage(motor, ratedVolts, phases, systemVolts.Value.Value, systemPhases.Value, out var columnVolts)) return r;
        r.RatedVolts = ratedVolts;
        if (Math.Max(ratedVolts, systemVolts.Value.Value) > SystemVoltages.LowVoltageLimit)
        {
            Add(FindingCodes.OutsideScope, Severity.Warning, motor.RatedVoltage?.Range ?? motor.Header.KeywordToken.Range,
                "equipment over 1000 V is not sized by MotorLang: nothing on this motor-compressor is checked, and its feeder is not summed");
            return r;
        }

        foreach (var (keyword, why) in NotForCompressors)
        {
            if (motor.Statement(keyword) is { } s)
                Add(FindingCodes.NotUsedHere, Severity.Warning, s.KeywordToken.Range, $"'{keyword}' is not used here: {why}");
        }

        var marking = new CompressorMarking(
            Get(motor, m => m.RatedLoad)?.Value.Value, Get(motor, m => m.SelectionCurrent)?.Value.Value,
            Get(motor, m => m.LockedRotorCurrent)?.Value.Value, Get(motor, m => m.MinimumAmpacity)?.Value.Value,
            Get(motor, m => m.MarkedMaximumProtection)?.Value.Value);
        r.Compressor = marking;
        r.FullLoadCurrent = MotorCompressors.DesignCurrent(marking);
        var design = r.FullLoadCurrent.Value;
        if (design is null)
            Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                $"{r.FullLoadCurrent.Unavailable}; without it the disconnect is not sized and the feeder cannot count this equipment (440.33)");
        if (marking.MinimumAmpacity is { } mca && design is { } largest)
            r.EquipmentOtherLoads = Math.Max(0, mca - largest * 1.25m);

        r.RequiredAmpacity = MotorCompressors.RequiredAmpacity(marking, design);
        if (r.RequiredAmpacity.Value is { } required)
        {
            r.MinimumWire = cache.MinimumWire(required, settings.Conditions, false);
            CheckCompressorWire(motor, r, required, settings.Conditions);
        }
        else
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range, $"branch conductors cannot be sized: {r.RequiredAmpacity.Unavailable}");
        }

        CheckCompressorProtection(motor, r, marking, design);
        if (design is { } current) CheckCompressorDisconnect(motor, r, current, marking.LockedRotor, columnVolts, phases);
        CheckGround(motor, r, design ?? 0, phases, MotorKind.Induction, null, Efficiency.Standard, settings, "NEC 250.122(A)");
        if (design is { } running)
        {
            CheckVoltageDrop(motor, r, running, settings);
            if (marking.LockedRotor is { } lra && Get(motor, m => m.Length)?.Value is { } length && (r.Wire ?? r.MinimumWire?.Value) is { } wire)
                r.Starting = new StartingDropInput(lra, Conversions.Feet(length), wire, r.Volts, r.Phases, settings.Material, settings.Raceway);
        }

        CheckConduit(motor, r, phases, settings);
        return r;
    }

    private void CheckCompressorWire(MotorNode motor, MotorResult r, decimal required, InstallationConditions conditions)
    {
        var rule = r.Compressor?.MarkedEquipment == true ? "NEC 440.35" : "NEC 440.32";
        var wire = Get(motor, m => m.Wire, out var owner);
        if (wire is null)
        {
            if (r.MinimumWire?.Value is { } min)
                Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                    $"no wire given; {rule} needs {Format.Amps(required)}: {min}", Insert(motor, $"wire {min}", "Add the minimum wire size"));
            else
                Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                    $"no branch conductor can be chosen for {Format.Amps(required)}: {r.MinimumWire?.Unavailable}");
            return;
        }

        r.Wire = wire.Value;
        if (SmallConductors.Applies(wire.Value.Size))
        {
            Add(FindingCodes.OutsideScope, Severity.Warning, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} on a motor-compressor circuit is not checked: MotorLang carries no Article 440 rule for 16 and 18 AWG");
            return;
        }

        // No 240.4(D) small-conductor limit here: 240.4(G) sends these circuits to Article 440, so
        // 10 AWG under a larger marked maximum breaker is correct and is not reported.
        r.WireAmpacity = cache.Allowable(wire.Value, conditions, false);
        if (r.WireAmpacity.Value is not { } allowable)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} cannot be checked against the {Format.Amps(required)} {rule} requires: {r.WireAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        var minimum = r.MinimumWire?.Value;
        Add(FindingCodes.CompressorWireUndersized, Severity.Error, RangeOn(motor, owner, wire.Range),
            $"wire {wire.Value} carries {Format.Amps(allowable)} here; {rule} requires {Format.Amps(required)}" + (minimum is { } m ? $": use {m}" : $", and {r.MinimumWire?.Unavailable}"),
            minimum is { } fix ? ReplaceOrOverride(motor, owner, "wire", "size", fix.ToString(), $"Change the wire to {fix}") : null);
    }

    private void CheckCompressorProtection(MotorNode motor, MotorResult r, CompressorMarking marking, decimal? design)
    {
        var device = Get(motor, m => m.Protection, out var deviceOwner);
        var rating = Get(motor, m => m.ProtectionRating, out var ratingOwner);
        if (device is null && motor.Statement("protection") is { } written)
        {
            r.DeviceUnknown = true;
            Add(FindingCodes.OutsideScope, Severity.Warning, written.KeywordToken.Range,
                "this protective device type is not one MotorLang sizes for a motor-compressor (inverse-time breaker, dual-element or non-time-delay fuse): its NEC 440.22 maximum and the grounding conductor that depends on it are not checked");
            return;
        }

        r.Device = device?.Value ?? ProtectiveDevice.InverseTimeBreaker;
        if (r.Device == ProtectiveDevice.InstantaneousTripBreaker)
        {
            // 440.22 gives no percentage for one; 430.52(C)(3) admits it only in a listed combination controller.
            r.DeviceUnknown = true;
            Add(FindingCodes.OutsideScope, Severity.Warning, RangeOn(motor, deviceOwner, device!.Range),
                "an instantaneous-trip breaker on a motor-compressor is not sized by MotorLang (440.22(A) gives no limit for one; 430.52(C)(3) permits it only as part of a listed combination controller): its maximum and the grounding conductor are not checked");
            return;
        }

        if (!ShortCircuitProtection.IsTableDevice(r.Device))
        {
            // A motor short-circuit protector, self-protected controller or semiconductor fuse: 440.22 gives no limit for one.
            r.DeviceUnknown = true;
            Add(FindingCodes.OutsideScope, Severity.Warning, RangeOn(motor, deviceOwner, device!.Range),
                $"a {ShortCircuitProtection.DeviceName(r.Device)} on a motor-compressor is not sized by MotorLang (440.22(A) gives no limit for one): its maximum and the grounding conductor are not checked");
            return;
        }

        var fuse = r.Device is ProtectiveDevice.DualElementFuse or ProtectiveDevice.NonTimeDelayFuse;
        r.ProtectionRating = rating?.Value.Value;
        r.MaximumProtection = MotorCompressors.MaximumProtection(marking, design, _likes.Has(motor, static m => m.HardStart), fuse);
        if (r.MaximumProtection.Value is not { } max)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, device is null ? motor.Header.KeywordToken.Range : RangeOn(motor, deviceOwner, device.Range),
                $"the short-circuit and ground-fault protection cannot be checked: {r.MaximumProtection.Unavailable}");
            return;
        }

        // What a fix writes: a standard rating never above the maximum, so 'size' never exceeds a marked maximum.
        var write = StandardRatings.AtOrBelow(max, fuse) ?? max;
        var deviceName = ShortCircuitProtection.DeviceName(r.Device);
        var rule = marking.MaximumProtection is not null ? "NEC 440.22 and the marked maximum (440.4(B), 110.3(B))" : "NEC 440.22(A)";
        if (device is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                $"no short-circuit protection given; {rule} allows an {deviceName} up to {Format.Amps(max)}",
                Insert(motor, $"protection inverse-time-breaker {Format.Number(write)}A", "Add the maximum inverse-time breaker"));
            return;
        }

        if (rating is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, device.Range,
                $"no rating given; {rule} allows this {deviceName} up to {Format.Amps(max)}",
                deviceOwner == motor ? new Fix("Add the maximum rating", [EditBuilder.Append(deviceOwner!.Statement("protection")!, $"{Format.Number(write)}A")]) : null);
            return;
        }

        if (rating.Value.Value > max)
            Add(FindingCodes.CompressorProtectionTooLarge, Severity.Error, RangeOn(motor, ratingOwner, rating.Range),
                $"{deviceName} rating {Format.Amps(rating.Value.Value)} is above the {Format.Amps(max)} that {rule} allows",
                ReplaceOrOverride(motor, ratingOwner, "protection", "rating", $"{Format.Number(write)}A", $"Change the rating to {Format.Number(write)}A",
                    overrideText: $"protection {Parser.Statements.Keywords.Devices.First(d => Equals(d.Value, r.Device)).Canonical} {Format.Number(write)}A"));
    }

    private void CheckCompressorDisconnect(MotorNode motor, MotorResult r, decimal design, decimal? lockedRotor, decimal volts, Phases phases)
    {
        r.Disconnect = MotorCompressors.Disconnect(design, lockedRotor, volts, phases);
        var amps = Get(motor, m => m.DisconnectRating, out var ampsOwner);
        var hp = Get(motor, m => m.DisconnectPower, out var hpOwner);
        if (r.Disconnect.Value is not { } need)
        {
            var place = amps?.Range ?? hp?.Range;
            Add(FindingCodes.CannotCheck, Severity.Warning, place is { } p ? RangeOn(motor, ampsOwner ?? hpOwner, p) : motor.Header.KeywordToken.Range,
                $"the disconnect is not sized: {r.Disconnect.Unavailable}");
            return;
        }

        if (amps is not null && amps.Value.Value < need.MinimumAmps)
        {
            var fix = StandardRatings.AtOrAbove(need.MinimumAmps, fuse: false);
            Add(FindingCodes.CompressorDisconnectTooSmall, Severity.Error, RangeOn(motor, ampsOwner, amps.Range),
                $"disconnect rated {Format.Amps(amps.Value.Value)} is below the {Format.Amps(need.MinimumAmps)} (115 % of {Format.Amps(design)}) that NEC 440.12(A)(1) requires"
                + (fix is { } f ? $": use {Format.Amps(f)}" : ""),
                fix is { } value ? ReplaceOrOverride(motor, ampsOwner, "disconnect", "rating", $"{Format.Number(value)}A", $"Change the disconnect's ampere rating to {Format.Amps(value)}") : null);
        }

        if (hp is not null && HorsepowerOf(hp.Value) < need.MinimumHorsepower)
            Add(FindingCodes.CompressorDisconnectTooSmall, Severity.Error, RangeOn(motor, hpOwner, hp.Range),
                $"disconnect rated {hp.Value} is below the {Numbers.Horsepower(need.MinimumHorsepower)} hp equivalent that NEC 440.12(A)(2) gives for the marked rated-load and locked-rotor currents",
                ReplaceOrOverride(motor, hpOwner, "disconnect", "power", $"{Numbers.Horsepower(need.MinimumHorsepower)}hp", "Change the disconnect's horsepower rating"));
    }
}
