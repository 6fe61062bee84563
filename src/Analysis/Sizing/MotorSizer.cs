using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Analysis.Sizing;

/// <summary>Sizes one motor circuit with the sizing core and reports what the motor list gets wrong or leaves out.</summary>
internal sealed partial class MotorSizer(MotorList model, EditBuilder edits, List<Finding> findings, SizingCache cache)
{
    /// <summary>Findings about values a motor inherits through 'like', with the motor they are written on.</summary>
    public List<(Finding Finding, MotorNode Owner)> Inherited { get; } = [];

    private readonly Dictionary<FeederNode, Settings> _feederSettings = [];

    // 'like' lookups remembered for this pass: linear in the length of a chain.
    private readonly LikeResolver _likes = new(model);

    private Settings FeederSettings(FeederNode feeder)
    {
        if (!_feederSettings.TryGetValue(feeder, out var s)) _feederSettings[feeder] = s = Settings.For(feeder, model);
        return s;
    }

    public MotorResult Size(MotorNode motor)
    {
        var r = new MotorResult(motor);
        CheckInterlock(motor);
        if (motor.IsCompressor) return SizeCompressor(motor, r);
        WarnCompressorOnly(motor);
        var feeder = motor.Feeder;
        if (motor.Power is not { } power || feeder.Voltage is not { } systemVolts || feeder.Phases is not { } systemPhases) return r;

        var settings = motor.Like is null && !Settings.HasOwn(motor) ? FeederSettings(feeder) : Settings.For(motor, model, _likes);
        r.Settings = settings;
        var ratedVolts = motor.RatedVoltage?.Value.Value ?? systemVolts.Value.Value;
        var phases = motor.Phases?.Value ?? systemPhases.Value;
        r.Volts = systemVolts.Value.Value;
        r.Phases = phases;
        r.Quantity = Get(motor, m => m.Quantity)?.Value ?? 1;
        r.StartingMethod = Get(motor, m => m.Starting)?.Value ?? StartingMethod.FullVoltage;
        if (!CheckVoltage(motor, ratedVolts, phases, systemVolts.Value.Value, systemPhases.Value, out var columnVolts)) return r;
        r.RatedVolts = ratedVolts;
        if (Math.Max(ratedVolts, systemVolts.Value.Value) > SystemVoltages.LowVoltageLimit)
        {
            // Part XI has its own rules for conductors, protection and controllers; the low-voltage
            // tables would give a confident wrong answer, so nothing is computed.
            Add(FindingCodes.OutsideScope, Severity.Warning, motor.RatedVoltage?.Range ?? motor.Header.KeywordToken.Range,
                $"motors over 1000 V are not sized by MotorLang (Article 430 Part XI): nothing on this motor is checked, and its feeder is not summed");
            return r;
        }

        var kind = Get(motor, m => m.Kind)?.Value ?? (phases == Phases.Dc ? MotorKind.Dc : MotorKind.Induction);
        var design = Get(motor, m => m.Design)?.Value;
        var efficiency = Get(motor, m => m.Efficiency)?.Value ?? Efficiency.Standard;
        var nameplate = Get(motor, m => m.Nameplate)?.Value.Value;
        var basis = Get(motor, m => m.Application)?.Value ?? NameplateBasis.None;
        var ratedPf = Get(motor, m => m.RatedPowerFactor)?.Value ?? 1.0m;
        var rating = new MotorRating(power.Value.Value, power.Value.Unit == Unit.Kw, columnVolts, phases, kind, design, efficiency, basis, nameplate, ratedPf);
        r.Horsepower = power.Value.Unit == Unit.Kw
            ? MotorCurrent.Lookup(rating)?.Horsepower ?? power.Value.Value / MotorCurrent.KilowattsPerHorsepower
            : power.Value.Value;
        r.FullLoadCurrent = cache.DesignCurrent(rating);
        if (r.FullLoadCurrent.Value is not { } flc)
        {
            Add(FindingCodes.NeedsNameplate, Severity.Error, power.Range,
                $"{r.FullLoadCurrent.Unavailable} (NEC 430.6(A)); nothing else on this motor can be sized until then");
            return r;
        }

        var designBcd = design is DesignLetter.B or DesignLetter.C or DesignLetter.D;
        var conditions = settings.Conditions;
        var duty = Get(motor, m => m.Duty)?.Value ?? DutyKind.Continuous;
        var dutyRating = DutyRatingOf(Get(motor, m => m.DutyRating)?.Value);
        var starting = Get(motor, m => m.Starting)?.Value ?? StartingMethod.FullVoltage;
        var driveInput = Get(motor, m => m.DriveInputCurrent)?.Value.Value;
        var bypass = DriveBypass(motor, starting);
        r.RequiredAmpacity = cache.RequiredAmpacity(new BranchInput(flc, nameplate, duty, dutyRating, starting, driveInput, bypass));
        if (duty != DutyKind.Continuous) r.DutyCycleAmps = r.RequiredAmpacity.Value;
        if (r.RequiredAmpacity.Value is { } required)
        {
            r.MinimumWire = cache.MinimumWire(required, conditions, designBcd);
            CheckWire(motor, r, required, conditions, designBcd);
        }
        else
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range, $"branch conductors cannot be sized: {r.RequiredAmpacity.Unavailable}");
        }

        CheckLeads(motor, r, flc, starting, conditions, designBcd);
        CheckGroupTap(motor, r, conditions, designBcd);

        var protectionFlc = ProtectionCurrent(rating, flc);
        r.FireService = Get(motor, m => m.FireService)?.Value;
        if (r.FireService == FireServiceRole.FirePump)
        {
            CheckFirePumpProtection(motor, r, flc, phases, design);
        }
        else
        {
            CheckProtection(motor, r, protectionFlc, phases, kind, design, efficiency, starting);
            if (protectionFlc != flc && r.MaximumProtection?.Value is { } lowerMax)
                r.MaximumProtection = new Result<decimal>(lowerMax, [
                    Step.Amps("Full-load current for the 430.52 maximum", protectionFlc, "common practice, no source",
                        $"{Format.Number(r.Horsepower)} hp row gives {Format.Amps(flc)} for conductors; the next smaller row gives {Format.Amps(protectionFlc)}, so the maximum is never larger than the motor allows"),
                    .. r.MaximumProtection.Steps]);
        }

        if (r.FireService is FireServiceRole.PressureMaintenance) r.FirePumpLockedRotor = FirePumpLockedRotor(motor, r, phases, design);
        if (r.FireService == FireServiceRole.FirePump)
            CheckFirePumpOverload(motor, r);
        else
            CheckOverload(motor, r, starting);
        CheckCapacitor(motor, r, settings);
        CheckControlCircuit(motor, r, settings);
        CheckOverloadUnits(motor, r);
        CheckDisconnectAndController(motor, r, flc, power.Value, starting, driveInput);
        CheckGround(motor, r, protectionFlc, phases, kind, design, efficiency, settings);
        LockedRotor(motor, r, phases, design);
        CheckVoltageDrop(motor, r, flc, settings);
        if (r.FireService == FireServiceRole.FirePump) FirePumpBranchDrops(motor, r, flc, settings);
        CheckConduit(motor, r, phases, settings);
        return r;
    }

    private bool CheckVoltage(MotorNode motor, decimal ratedVolts, Phases phases, decimal systemVolts, Phases systemPhases, out decimal columnVolts)
    {
        columnVolts = ratedVolts;
        var range = motor.RatedVoltage?.Range ?? motor.Phases?.Range ?? motor.Header.KeywordToken.Range;
        if (phases != systemPhases && !(phases == Phases.Single && systemPhases == Phases.Three))
        {
            Add(FindingCodes.VoltageMismatch, Severity.Error, range,
                $"a {Describe(phases)} motor cannot be supplied by a {Describe(systemPhases)} feeder ({motor.Feeder.Tag?.Value})");
            return false;
        }

        if (ratedVolts == systemVolts) return true;
        if (SystemVoltages.IsUsualPair(systemVolts, ratedVolts, phases)) return true;
        var rated = Band(ratedVolts);
        var system = Band(systemVolts);
        if (rated is not null && rated == system) return true;
        if (ratedVolts == 230 && systemVolts == 208)
        {
            // 208 V is outside the 220-240 V range the Table 430.248/430.250 headnotes give the 230 V
            // column, so the motor's current is taken from the 208 V column (higher), never the 230 V one.
            columnVolts = 208;
            Add(FindingCodes.VoltageMismatch, Severity.Warning, range,
                "a 230 V motor on a 208 V system runs at 90 % voltage, the edge of its tolerance (common practice, no source); 208 V is outside the 220-240 V range of the 230 V column (Table 430.250 headnote), so it is sized from the 208 V column; a 200 V or 208-230 V rated motor is the usual choice");
            return true;
        }

        Add(FindingCodes.VoltageMismatch, Severity.Error, range,
            $"a {Format.Number(ratedVolts)} V motor cannot run on the {Format.Number(systemVolts)} V feeder {motor.Feeder.Tag?.Value} (Table 430.250 headnote voltage ranges)");
        return false;
    }

    /// <summary>
    /// The full-load current the 430.52 maximum is worked out from: for a rating between table rows
    /// (a kW rating, or an unlisted horsepower) the smaller row's, so that the maximum is never
    /// larger than the motor allows, while conductors use the larger row's (docs/checks.md).
    /// </summary>
    private decimal ProtectionCurrent(MotorRating rating, decimal flc)
    {
        if (rating.Basis != NameplateBasis.None || !MotorCurrent.IsBetweenRows(rating)) return flc;
        return cache.DesignCurrent(rating with { LowerRow = true }).Value is { } lower && lower < flc ? lower : flc;
    }

    /// <summary>The voltage band a system voltage or a motor rating belongs to (the headnote ranges of Tables 430.248/430.250).</summary>
    private static string? Band(decimal v) => v switch
    {
        >= 110 and <= 120 => "115",
        200 => "200",
        208 => "208",
        >= 220 and <= 240 => "230",
        >= 440 and <= 480 => "460",
        >= 550 and <= 600 => "575",
        _ => null,
    };

    private void CheckWire(MotorNode motor, MotorResult r, decimal required, InstallationConditions conditions, bool designBcd)
    {
        // The rule the requirement comes from: 430.22 for most motors, 430.122(A)/(C) for a drive.
        var rule = r.RequiredAmpacity?.Steps is { Length: > 0 } steps && steps[^1].Rule.StartsWith("NEC 430.122", StringComparison.Ordinal) ? steps[^1].Rule : "NEC 430.22";
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
            CheckSmallConductor(motor, r, owner, wire, conditions);
            return;
        }

        r.WireAmpacity = cache.Allowable(wire.Value, conditions, designBcd);
        if (r.WireAmpacity.Value is not { } allowable)
        {
            // A wire whose ampacity the tables cannot give is never passed in silence.
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} cannot be checked against the {Format.Amps(required)} {rule} requires: {r.WireAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        if (r.MinimumWire?.Value is { } minimum)
            Add(FindingCodes.WireUndersized, Severity.Error, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} carries {Format.Amps(allowable)} here; {rule} requires {Format.Amps(required)}: use {minimum}",
                ReplaceOrOverride(motor, owner, "wire", "size", minimum.ToString(), $"Change the wire to {minimum}"));
        else
            Add(FindingCodes.WireUndersized, Severity.Error, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} carries {Format.Amps(allowable)} here; {rule} requires {Format.Amps(required)}, and {r.MinimumWire?.Unavailable}");
    }

    /// <summary>430.22(G): 16 and 18 AWG copper only for small currents, and only under conditions the list cannot show.</summary>
    private void CheckSmallConductor(MotorNode motor, MotorResult r, MotorNode? owner, Located<WireSpec> wire, InstallationConditions conditions)
    {
        var current = Math.Max(r.FullLoadCurrent.Value ?? 0, Get(motor, m => m.Nameplate)?.Value.Value ?? 0);
        var verdict = SmallConductors.Check(wire.Value.Size, conditions.Material, current);
        r.SmallConductor = verdict;
        if (!verdict.Permitted)
        {
            var minimum = r.MinimumWire?.Value;
            Add(FindingCodes.SmallConductorNotPermitted, Severity.Error, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} is not permitted here: {verdict.Reason}" + (minimum is { } m ? $"; use {m}" : ""),
                minimum is { } fix ? ReplaceOrOverride(motor, owner, "wire", "size", fix.ToString(), $"Change the wire to {fix}") : null);
            return;
        }

        Add(FindingCodes.SmallConductorConditions, Severity.Warning, RangeOn(motor, owner, wire.Range),
            $"wire {wire.Value} is permitted for {Format.Amps(current)} only {verdict.Reason}; the list cannot show these, so they are not checked");
    }

    private void CheckProtection(MotorNode motor, MotorResult r, decimal flc, Phases phases, MotorKind kind, DesignLetter? design, Efficiency efficiency, StartingMethod starting)
    {
        var device = Get(motor, m => m.Protection, out var deviceOwner);
        var rating = Get(motor, m => m.ProtectionRating, out var ratingOwner);
        if (device is null && motor.Statement("protection") is { } written)
        {
            // The line names a device MotorLang does not know (the parser said which): no percentage
            // of Table 430.52(C)(1) is assumed for it, and nothing that depends on it is sized.
            r.DeviceUnknown = true;
            Add(FindingCodes.OutsideScope, Severity.Warning, written.KeywordToken.Range,
                "this protective device type is not one MotorLang sizes (inverse-time breaker, instantaneous-trip breaker, dual-element or non-time-delay fuse): its NEC 430.52 maximum and the grounding conductor that depends on it are not checked");
            return;
        }

        r.Device = device?.Value ?? ProtectiveDevice.InverseTimeBreaker;
        r.ProtectionRating = rating?.Value.Value;
        var hardStart = _likes.Has(motor, static m => m.HardStart);
        var classCc = ClassCcFuse(motor, r.Device);
        r.ProtectionBasis = new ProtectionInput(flc, r.Device, phases, kind, design, efficiency, hardStart, classCc);
        var input = r.ProtectionBasis.Value;
        r.MaximumProtection = cache.MaximumProtection(input);
        // 430.130(A)(2): the drive's marked or instructed maximum is never exceeded, whatever 430.52 permits.
        var driveCapped = DriveMaximum(motor, r, starting);
        // 430.52(C)(3), (C)(7), (C)(5): devices permitted only in a listed combination, or rated as marked.
        if (!DeviceInLieuPermitted(motor, r, device, deviceOwner, rating)) return;
        // 430.4: a part-winding motor's devices are limited per winding unless the list says one protects both (the stricter reading when not said).
        var windings = starting == StartingMethod.PartWinding ? Get(motor, m => m.ProtectionWindings)?.Value ?? WindingScope.PerWinding : (WindingScope?)null;
        if (windings is { } scope) r.MaximumProtection = PartWinding.MaximumProtection(r.MaximumProtection, input, scope);
        var windingWord = windings is null || Get(motor, m => m.ProtectionWindings) is not null ? "" : " per-winding";
        if (r.MaximumProtection.Value is not { } max)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, device is null ? motor.Header.KeywordToken.Range : RangeOn(motor, deviceOwner, device.Range),
                $"the short-circuit and ground-fault protection cannot be checked: {r.MaximumProtection.Unavailable} (NEC 430.52)");
            return;
        }
        var deviceName = ShortCircuitProtection.DeviceName(r.Device);
        var unit = ShortCircuitProtection.IsSetting(r.Device) ? "setting" : "rating";
        // Written only when a finding needs it: most motors are correct, and this runs for each.
        string MaxText() => ShortCircuitProtection.IsSetting(r.Device) ? Format.Number(decimal.Floor(max)) + "A" : Format.Number(max) + "A";

        if (device is null && IsGroupTap(motor))
        {
            GroupProtected(motor, r);
            return;
        }

        if (device is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                $"no short-circuit protection given; NEC 430.52 allows an {deviceName} up to {Format.Amps(max)}",
                Insert(motor, $"protection inverse-time-breaker {MaxText()}{windingWord}", "Add the maximum inverse-time breaker"));
            return;
        }

        if (rating is null)
        {
            var statement = deviceOwner!.Statement("protection")!;
            Add(FindingCodes.NotWritten, Severity.Information, device.Range,
                $"no rating given; NEC 430.52 allows this {deviceName} up to {Format.Amps(max)}",
                deviceOwner == motor ? new Fix($"Add the maximum {unit}", [EditBuilder.Append(statement, MaxText())]) : null);
            return;
        }

        var value = rating.Value.Value;
        if (value > max && SmallMotorOnTwentyAmpCircuit(motor, r, value, driveCapped))
            return;
        if (value > max)
        {
            var rule = windings is not null ? "NEC 430.4" : driveCapped ? "the drive's marking or instructions (NEC 430.130(A)(2))" : MaximumRule(r.Device, hardStart);
            Add(driveCapped && windings is null ? FindingCodes.AboveDriveMaximum : windings is null ? FindingCodes.ProtectionTooLarge : FindingCodes.PartWindingProtectionTooLarge, Severity.Error, RangeOn(motor, ratingOwner, rating.Range),
                $"{deviceName} {unit} {Format.Amps(value)} is above the {Format.Amps(max)} that {rule} allows for {Format.Amps(flc)} full-load current{SmallMotorCombinationNote(r.Device, flc)}",
                ReplaceOrOverride(motor, ratingOwner, "protection", "rating", MaxText(), $"Change the {unit} to {MaxText()}",
                    overrideText: $"protection {Keywords.Devices.First(d => Equals(d.Value, r.Device)).Canonical} {MaxText()}{windingWord}"));
        }
        else if (value < flc * 1.25m && windings is null && Get(motor, m => m.ProtectionCombinedOverload) is null)
        {
            // Common practice, no source: below 125 % of full-load current a motor device opens on normal starting.
            Add(FindingCodes.ProtectionMayTrip, Severity.Warning, RangeOn(motor, ratingOwner, rating.Range),
                $"{deviceName} {unit} {Format.Amps(value)} is under 125 % of the {Format.Amps(flc)} full-load current; the motor will likely trip it while starting (NEC 430.52 allows up to {Format.Amps(max)})");
        }
    }

    private void CheckOverload(MotorNode motor, MotorResult r, StartingMethod starting)
    {
        var nameplate = Get(motor, m => m.Nameplate)?.Value.Value;
        var sf = Get(motor, m => m.ServiceFactor)?.Value;
        // A temperature rise converts from °F by 5/9 alone: it is a difference, not a temperature.
        var riseQuantity = Get(motor, m => m.TemperatureRise)?.Value;
        decimal? rise = riseQuantity is { } q ? (q.Unit == Unit.Fahrenheit ? q.Value * 5m / 9m : q.Value) : null;
        r.OverloadLimit = cache.Overload(nameplate, sf, rise, absolute: false);
        r.OverloadAbsoluteLimit = cache.Overload(nameplate, sf, rise, absolute: true);
        // 430.32(B), (D): motors of 1 hp or less have the same percentages under rules of their own.
        var (running, smallMotorExempt) = SmallMotorOverload(motor, r);
        // 460.9: with a capacitor on its load side, the overload is selected from the improved-power-factor current.
        if (CapacitorOverloadBasis(motor, r, nameplate) is { } basis)
        {
            r.OverloadBasis = basis;
            r.OverloadLimit = Overloads.FromBasis(basis, sf, rise, absolute: false);
            r.OverloadAbsoluteLimit = Overloads.FromBasis(basis, sf, rise, absolute: true);
        }

        // A wye-delta motor's overload in the motor leads carries 1/√3 of the line current (430.22(C) note).
        var location = Get(motor, m => m.OverloadLocation);
        var inDeltaLeads = starting == StartingMethod.WyeDelta && location?.Value != OverloadLocation.LineLeads;
        if (inDeltaLeads)
        {
            r.OverloadLimit = WyeDelta.OverloadInDeltaLeads(r.OverloadLimit, location is not null, "Overload limit in the delta leads");
            r.OverloadAbsoluteLimit = WyeDelta.OverloadInDeltaLeads(r.OverloadAbsoluteLimit, location is not null, "Overload maximum in the delta leads");
        }
        else if (location is not null && starting != StartingMethod.WyeDelta)
            Add(FindingCodes.NotUsedHere, Severity.Warning, location.Range,
                "an overload location (delta-leads, line-leads) means something only for a wye-delta motor ('starting wye-delta'); it is not used here");
        var where = inDeltaLeads ? " (in the delta leads, 1/√3 of the line current)" : r.OverloadBasis is not null ? " (from the 460.9 improved-power-factor current)" : "";
        // 430.4: separate overloads on each half of a part-winding motor trip at one half (the stricter reading when not said).
        var windings = starting == StartingMethod.PartWinding ? Get(motor, m => m.OverloadWindings)?.Value ?? WindingScope.PerWinding : (WindingScope?)null;
        if (windings is { } scope)
        {
            r.OverloadLimit = PartWinding.Overload(r.OverloadLimit, scope, "Overload limit for each winding");
            r.OverloadAbsoluteLimit = PartWinding.Overload(r.OverloadAbsoluteLimit, scope, "Overload maximum for each winding");
        }

        var overload = Get(motor, m => m.Overload, out var owner);
        r.Overload = overload?.Value.Value;
        if (overload is null)
        {
            // 430.33: a duty-cycle motor is protected against overload by its branch device.
            if (Get(motor, m => m.Duty) is { Value: not DutyKind.Continuous }) return;
            if (DriveProvidesOverload(motor, r, starting)) return;
            if (CombinedDeviceIsOverload(motor, r)) return;
            if (smallMotorExempt is not null)
            {
                r.NoOverloadRequired = smallMotorExempt;
                return;
            }

            if (r.OverloadLimit.Value is { } limit)
                Add(FindingCodes.OverloadMissing, Severity.Warning, motor.Header.KeywordToken.Range,
                    $"no overload given; NEC {(windings is null ? running : $"{running} and 430.4")} requires one, rated at most {Format.Amps(limit)}{where}",
                    Insert(motor, $"overload {Format.Number(RoundDown(limit))}A{(windings is null ? "" : windings == WindingScope.PerWinding ? " per-winding" : "")}{(inDeltaLeads ? " delta-leads" : "")}", $"Add the overload at its {running} limit"));
            else if (r.OverloadBasis is { Unavailable: { } needsImproved })
                Add(FindingCodes.CapacitorOverloadBasis, Severity.Warning, motor.Header.KeywordToken.Range,
                    $"no overload given, and none can be proposed: {needsImproved}");
            else
                Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                    "no overload and no nameplate current: NEC 430.32 overloads are sized from the nameplate");
            return;
        }

        if (r.OverloadBasis is { Unavailable: { } noBasis })
        {
            Add(FindingCodes.CapacitorOverloadBasis, Severity.Warning, RangeOn(motor, owner, overload.Range),
                $"overload {Format.Amps(overload.Value.Value)} cannot be checked: {noBasis}");
            return;
        }

        if (r.OverloadLimit.Value is not { } max || r.OverloadAbsoluteLimit.Value is not { } absolute)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, overload.Range),
                "the overload cannot be checked without the nameplate current (NEC 430.6(A)(2), 430.32)");
            return;
        }

        var value = overload.Value.Value;
        if (value > absolute)
            Add(FindingCodes.OverloadTooLarge, Severity.Error, RangeOn(motor, owner, overload.Range),
                $"overload {Format.Amps(value)} is above even the NEC 430.32(C) maximum of {Format.Amps(absolute)}{where}; NEC {running} allows {Format.Amps(max)}",
                ReplaceOrOverride(motor, owner, "overload", "setting", $"{Format.Number(RoundDown(max))}A", $"Change the overload to {Format.Amps(RoundDown(max))}"));
        else if (value > max)
            Add(FindingCodes.OverloadAboveRunningLimit, Severity.Warning, RangeOn(motor, owner, overload.Range),
                $"overload {Format.Amps(value)} is above the NEC {running} limit of {Format.Amps(max)}{where}; that is allowed only where the smaller device will not start the motor (430.32(C), up to {Format.Amps(absolute)})");
    }

    private void CheckDisconnectAndController(MotorNode motor, MotorResult r, decimal flc, Quantity power, StartingMethod starting, decimal? driveInput)
    {
        // 430.128: a drive's disconnect is sized from the drive's rated input current, not the motor's.
        var drive = starting == StartingMethod.Drive && driveInput is not null;
        r.Disconnect = drive ? DriveCircuits.Disconnect(driveInput!.Value, r.Horsepower) : cache.Disconnect(flc, r.Horsepower);
        r.Controller = cache.Controller(r.Horsepower);
        // The NEMA sizes carried are those of polyphase ac starters: no suggestion for a single-phase or dc motor.
        if (r.Phases == Phases.Three)
        {
            (r.NemaStarter, var size) = cache.Nema(r.Horsepower, r.Volts);
            r.NemaStarterSize = r.NemaStarter.HasValue ? size : null;
        }
        var need = r.Disconnect.Value!.Value;
        if (Get(motor, m => m.DisconnectRating, out var ampsOwner) is { } amps && amps.Value.Value < need.MinimumAmps)
        {
            // The next Table 240.6(A) rating at or above 115 % (a switch rated in between is rare; any rating ≥ 115 % complies).
            var fix = StandardRatings.AtOrAbove(need.MinimumAmps, fuse: false);
            Add(FindingCodes.DisconnectTooSmall, Severity.Error, RangeOn(motor, ampsOwner, amps.Range),
                (drive
                    ? $"disconnect rated {Format.Amps(amps.Value.Value)} is below the {Format.Amps(need.MinimumAmps)} (115 % of the drive's rated input current {Format.Amps(driveInput!.Value)}) that NEC 430.128 requires"
                    : $"disconnect rated {Format.Amps(amps.Value.Value)} is below the {Format.Amps(need.MinimumAmps)} (115 % of {Format.Amps(flc)}) that NEC 430.110(A) requires")
                + (fix is { } f ? $": use {Format.Amps(f)}" : ""),
                fix is { } value ? ReplaceOrOverride(motor, ampsOwner, "disconnect", "rating", $"{Format.Number(value)}A", $"Change the disconnect's ampere rating to {Format.Amps(value)}") : null);
        }

        var required = RatingText(power, r.Horsepower);
        if (Get(motor, m => m.DisconnectPower, out var hpOwner) is { } hp && !Covers(hp.Value, power, need.MinimumHorsepower))
            Add(FindingCodes.DisconnectTooSmall, Severity.Error, RangeOn(motor, hpOwner, hp.Range),
                $"disconnect rated {hp.Value} is below the motor's {Describe(power, need.MinimumHorsepower)} (NEC 430.109(A), 430.110(A))",
                ReplaceOrOverride(motor, hpOwner, "disconnect", "power", required, "Change the disconnect's horsepower rating"));
        if (Get(motor, m => m.ControllerPower, out var cOwner) is { } controller && !Covers(controller.Value, power, r.Horsepower))
            Add(FindingCodes.ControllerTooSmall, Severity.Error, RangeOn(motor, cOwner, controller.Range),
                $"controller rated {controller.Value} is below the motor's {Describe(power, r.Horsepower)} (NEC 430.83(A)(1))",
                ReplaceOrOverride(motor, cOwner, "controller", "power", required, "Change the controller rating"));
    }

    /// <summary>
    /// Whether a disconnect's or controller's power rating covers the motor: kW against kW when
    /// both are in kW; otherwise in horsepower (kW ÷ 0.746), against the table row the motor is
    /// sized at (docs/checks.md).
    /// </summary>
    private static bool Covers(Quantity device, Quantity motor, decimal motorHorsepower)
    {
        if (device.Unit == Unit.Kw && motor.Unit == Unit.Kw) return device.Value >= motor.Value;
        return HorsepowerOf(device) >= motorHorsepower;
    }

    /// <summary>The rating a fix writes: the motor's own kW when it is rated in kW, else its horsepower.</summary>
    private static string RatingText(Quantity motor, decimal horsepower) =>
        motor.Unit == Unit.Kw ? $"{Quantity.Number(motor.Value)}kW" : $"{Numbers.Horsepower(horsepower)}hp";

    private static string Describe(Quantity motor, decimal horsepower) =>
        motor.Unit == Unit.Kw ? $"{Quantity.Number(motor.Value)} kW (sized as {Numbers.Horsepower(horsepower)} hp)" : $"{Numbers.Horsepower(horsepower)} hp";

    private void CheckGround(MotorNode motor, MotorResult r, decimal flc, Phases phases, MotorKind kind, DesignLetter? design, Efficiency efficiency, Settings settings,
        string rule = "NEC 250.122(D)(1)")
    {
        var material = settings.Material;
        var phaseMinimum = r.MinimumWire?.Value;
        if (r.DeviceUnknown) return;
        // An installed wire smaller than the minimum is itself an error whose fix raises it to the
        // minimum: the grounding conductor is sized for that corrected wire, so check and size give
        // the same number (and 250.122(A) never caps it at a wire that has to be replaced).
        var phase = WireToBeReplaced(r) && phaseMinimum is { } corrected ? corrected : r.Wire ?? phaseMinimum;
        // A tap of a group circuit is grounded for the circuit's device (250.122(A), 430.53(D)); none written yet is asked for there.
        if (IsGroupTap(motor))
        {
            if (motor.Feeder.ProtectionRating?.Value.Value is not { } groupDevice) return;
            // The tap's own minimum carries what 430.53(D) asks as well as 430.22: a tap that size is not "increased" (250.122(B)).
            var tapMinimum = r.TapAmpacity?.Value is { } tap
                ? cache.MinimumWire(Math.Max(tap, r.RequiredAmpacity?.Value ?? 0), settings.Conditions, design is DesignLetter.B or DesignLetter.C or DesignLetter.D).Value ?? phaseMinimum
                : phaseMinimum;
            r.MinimumGround = cache.Ground(groupDevice, material, phase, tapMinimum, "NEC 250.122(A), 430.53(D)");
        }
        else if (r.Device is ProtectiveDevice.InstantaneousTripBreaker or ProtectiveDevice.MotorShortCircuitProtector)
            r.MinimumGround = cache.GroundForInstantaneousTrip(new ProtectionInput(flc, r.Device, phases, kind, design, efficiency), material, phase, phaseMinimum);
        else if ((r.ProtectionRating ?? r.MaximumProtection?.Value ?? r.FirePumpMinimumProtection?.Value) is { } device)
            r.MinimumGround = cache.Ground(device, material, phase, phaseMinimum, rule);
        var ground = Get(motor, m => m.Ground, out var owner);
        if (r.MinimumGround?.Value is not { } min)
        {
            // No device to size from is already reported with the protection; a table that stops is said here.
            if (r.MinimumGround is { Unavailable: { } why })
                Add(FindingCodes.CannotCheck, Severity.Warning, ground is null ? motor.Header.KeywordToken.Range : RangeOn(motor, owner, ground.Range),
                    $"the grounding conductor cannot be sized: {why} (NEC 250.122)");
            return;
        }

        if (ground is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                $"no grounding conductor given; NEC 250.122 needs {min}", Insert(motor, $"ground {min}", "Add the grounding conductor"));
            return;
        }

        r.Ground = ground.Value.Size;
        if (ground.Value.Size < min)
            Add(FindingCodes.GroundUndersized, Severity.Error, RangeOn(motor, owner, ground.Range),
                $"grounding conductor {ground.Value.Size} is smaller than the {min} NEC 250.122 requires here",
                ReplaceOrOverride(motor, owner, "ground", "size", min.ToString(), $"Change the grounding conductor to {min}"));
    }

    /// <summary>Whether the installed wire is reported too small (its fix replaces it with the minimum).</summary>
    private static bool WireToBeReplaced(MotorResult r) =>
        r.Wire is not null && (r.SmallConductor is { Permitted: false }
                               || (r.WireAmpacity?.Value is { } allowable && r.RequiredAmpacity?.Value is { } required && allowable < required));

    private void CheckVoltageDrop(MotorNode motor, MotorResult r, decimal flc, Settings settings)
    {
        var length = Get(motor, m => m.Length)?.Value;
        var wire = r.Wire ?? r.MinimumWire?.Value;
        if (length is null || wire is null) return;
        r.BranchDrop = VoltageDrop.Of(flc, Conversions.Feet(length.Value), wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway, settings.PowerFactor);
        // Starting drop at the largest locked-rotor current known: the code letter's upper end, else the table maximum.
        var lockedRotor = r.LockedRotorFromCodeLetter?.Value is { } range ? range.Maximum ?? range.Minimum : r.LockedRotorTableMaximum?.Value;
        if (lockedRotor is { } lra)
            r.Starting = new StartingDropInput(lra, Conversions.Feet(length.Value), wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway);
        if (r.BranchDrop.Unavailable is { } noDrop)
            Add(FindingCodes.CannotCheck, Severity.Warning, Get(motor, m => m.Length)?.Range ?? motor.Header.KeywordToken.Range,
                $"the branch voltage drop cannot be worked out: {noDrop}");
        if (r.BranchDrop.Value is { } drop && drop.Percent > settings.BranchDropLimit)
            Add(FindingCodes.VoltageDropHigh, Severity.Warning, (Get(motor, m => m.Wire) ?? null)?.Range ?? motor.Header.KeywordToken.Range,
                $"branch voltage drop {drop.Percent:0.##} % is above the {Format.Percent(settings.BranchDropLimit)} limit (NEC 210.19 Informational Note No. 4)");
    }

    private void CheckConduit(MotorNode motor, MotorResult r, Phases phases, Settings settings)
    {
        // The wire and ground the check and the fixes agree on: a wire reported too small counts at its corrected size.
        var wire = WireToBeReplaced(r) ? r.MinimumWire?.Value : r.Wire ?? r.MinimumWire?.Value;
        if (wire is null) return;
        var ground = r.Ground is { } g && r.MinimumGround?.Value is { } mg && g < mg ? mg : r.Ground ?? r.MinimumGround?.Value;
        var contents = new RacewayContents(phases == Phases.Three ? 3 : 2, wire.Value.Size, ground);
        r.MinimumConduit = cache.SmallestConduit(contents, settings.Raceway, settings.Insulation);
        if (Get(motor, m => m.Conduit, out var owner) is not { } conduit) return;
        var trade = Numbers.Horsepower(conduit.Value.Value);
        var outcome = ConduitCheck.Check(wire.Value, ground, contents.PhaseConductors, settings.Raceway, settings.Insulation, trade,
            wire.Value.Sets == 1 ? r.MinimumConduit : null);
        r.ConduitFillPercent = outcome.FillPercent;
        if (outcome.NotChecked is { } why)
            Add(FindingCodes.OutsideScope, Severity.Warning, RangeOn(motor, owner, conduit.Range), why);
        else if (outcome.FillPercent is { } fill && fill > outcome.PermittedPercent)
            Add(FindingCodes.ConduitOverfilled, Severity.Error, RangeOn(motor, owner, conduit.Range),
                $"{trade} in {settings.Raceway.ToString().ToUpperInvariant()} is {fill:0.#} % full; Chapter 9 Table 1 allows {Format.Percent(outcome.PermittedPercent)}"
                + (outcome.Smallest is { } s ? $": use {s} in" : $"; {r.MinimumConduit.Unavailable}"),
                outcome.Smallest is { } smallest ? ReplaceOrOverride(motor, owner, "conduit", "trade-size", $"{smallest}in", $"Change the conduit to {smallest} in") : null);
    }

    private void LockedRotor(MotorNode motor, MotorResult r, Phases phases, DesignLetter? design)
    {
        if (phases == Phases.Dc) return;
        if (Get(motor, m => m.CodeLetter) is { } letter)
            // Table 430.7(B) gives kVA per hp at the motor's rated voltage: the current is worked out at that voltage, not the system's.
            r.LockedRotorFromCodeLetter = cache.LockedRotorFromCodeLetter(r.Horsepower, r.RatedVolts, phases, letter.Value);
        r.LockedRotorTableMaximum = cache.LockedRotorMaximum(r.Horsepower, r.Volts, phases, design ?? DesignLetter.B);
    }

    private Located<T>? Get<T>(MotorNode motor, Func<MotorNode, Located<T>?> get) => _likes.Get(motor, get)?.Value;

    private Located<T>? Get<T>(MotorNode motor, Func<MotorNode, Located<T>?> get, out MotorNode? owner)
    {
        var found = _likes.Get(motor, get);
        owner = found?.Owner;
        return found?.Value;
    }

    /// <summary>Where a finding goes, and the motor its value was inherited from (null when written here).</summary>
    private readonly record struct Place(SourceRange Range, MotorNode? InheritedFrom)
    {
        public static implicit operator Place(SourceRange range) => new(range, null);
    }

    /// <summary>A finding about an inherited value is shown on this motor's 'like' line, not on the other motor.</summary>
    private static Place RangeOn(MotorNode motor, MotorNode? owner, SourceRange valueRange) =>
        owner is null || owner == motor ? valueRange : new Place(motor.Like?.Range ?? motor.Header.KeywordToken.Range, owner);

    /// <summary>Replace the value where it is written on this motor, or add an overriding line when it is inherited.</summary>
    private Fix ReplaceOrOverride(MotorNode motor, MotorNode? owner, string keyword, string arg, string value, string title, string? overrideText = null)
    {
        if (owner == motor && motor.Statement(keyword) is { } s && s.Arg(arg) is { } a)
            return new Fix(title, [EditBuilder.Replace(a, value)]);
        return new Fix(title + " on this motor", [edits.Insert(motor, overrideText ?? $"{keyword} {value}")]);
    }

    private Fix Insert(MotorNode motor, string statement, string title) => new(title, [edits.Insert(motor, statement)]);

    private void Add(string code, Severity severity, Place place, string message, Fix? fix = null)
    {
        var finding = new Finding(code, severity, place.Range, message, fix);
        findings.Add(finding);
        if (place.InheritedFrom is { } owner) Inherited.Add((finding, owner));
    }

    /// <summary>A limit written with two decimals, rounded down so that the written value never exceeds it.</summary>
    private static decimal RoundDown(decimal limit) => decimal.Floor(limit * 100m) / 100m;

    private static decimal HorsepowerOf(Quantity q) => q.Unit == Unit.Kw ? q.Value / MotorCurrent.KilowattsPerHorsepower : q.Value;

    private static DutyRating DutyRatingOf(Quantity? minutes) => minutes?.Value switch
    {
        null => DutyRating.Continuous,
        <= 5 => DutyRating.Minutes5,
        <= 15 => DutyRating.Minutes15,
        _ => DutyRating.Minutes30To60,
    };

    private static string Describe(Phases p) => p switch { Phases.Dc => "dc", Phases.Single => "single-phase", _ => "three-phase" };
}
