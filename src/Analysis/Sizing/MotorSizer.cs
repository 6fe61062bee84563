using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Analysis.Sizing;

/// <summary>Sizes one motor circuit with the sizing core and reports what the motor list gets wrong or leaves out.</summary>
internal sealed class MotorSizer(MotorList model, EditBuilder edits, List<Finding> findings, SizingCache cache)
{
    /// <summary>Findings about values a motor inherits through 'like', with the motor they are written on.</summary>
    public List<(Finding Finding, MotorNode Owner)> Inherited { get; } = [];

    private readonly Dictionary<FeederNode, Settings> _feederSettings = [];

    private Settings FeederSettings(FeederNode feeder)
    {
        if (!_feederSettings.TryGetValue(feeder, out var s)) _feederSettings[feeder] = s = Settings.For(feeder, model);
        return s;
    }

    public MotorResult Size(MotorNode motor)
    {
        var r = new MotorResult(motor);
        var feeder = motor.Feeder;
        if (motor.Power is not { } power || feeder.Voltage is not { } systemVolts || feeder.Phases is not { } systemPhases) return r;

        var settings = motor.Like is null && !Settings.HasOwn(motor) ? FeederSettings(feeder) : Settings.For(motor, model);
        r.Settings = settings;
        var ratedVolts = motor.RatedVoltage?.Value.Value ?? systemVolts.Value.Value;
        var phases = motor.Phases?.Value ?? systemPhases.Value;
        r.Volts = systemVolts.Value.Value;
        r.Phases = phases;
        r.Quantity = Get(motor, m => m.Quantity)?.Value ?? 1;
        r.StartingMethod = Get(motor, m => m.Starting)?.Value ?? StartingMethod.FullVoltage;
        if (!CheckVoltage(motor, ratedVolts, phases, systemVolts.Value.Value, systemPhases.Value)) return r;

        var kind = Get(motor, m => m.Kind)?.Value ?? (phases == Phases.Dc ? MotorKind.Dc : MotorKind.Induction);
        var design = Get(motor, m => m.Design)?.Value;
        var efficiency = Get(motor, m => m.Efficiency)?.Value ?? Efficiency.Standard;
        var nameplate = Get(motor, m => m.Nameplate)?.Value.Value;
        var basis = Get(motor, m => m.Application)?.Value ?? NameplateBasis.None;
        var ratedPf = Get(motor, m => m.RatedPowerFactor)?.Value ?? 1.0m;
        var rating = new MotorRating(power.Value.Value, power.Value.Unit == Unit.Kw, ratedVolts, phases, kind, design, efficiency, basis, nameplate, ratedPf);
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
        r.RequiredAmpacity = cache.RequiredAmpacity(new BranchInput(flc, nameplate, duty, dutyRating, starting, driveInput));
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

        CheckProtection(motor, r, flc, phases, kind, design, efficiency);
        CheckOverload(motor, r);
        CheckDisconnectAndController(motor, r, flc);
        CheckGround(motor, r, flc, phases, kind, design, efficiency, settings);
        LockedRotor(motor, r, phases, design);
        CheckVoltageDrop(motor, r, flc, settings);
        CheckConduit(motor, r, phases, settings);
        return r;
    }

    private bool CheckVoltage(MotorNode motor, decimal ratedVolts, Phases phases, decimal systemVolts, Phases systemPhases)
    {
        var range = motor.RatedVoltage?.Range ?? motor.Phases?.Range ?? motor.Header.KeywordToken.Range;
        if (phases != systemPhases && !(phases == Phases.Single && systemPhases == Phases.Three))
        {
            Add(FindingCodes.VoltageMismatch, Severity.Error, range,
                $"a {Describe(phases)} motor cannot be supplied by a {Describe(systemPhases)} feeder ({motor.Feeder.Tag?.Value})");
            return false;
        }

        if (ratedVolts == systemVolts) return true;
        var rated = Band(ratedVolts);
        var system = Band(systemVolts);
        if (rated is not null && rated == system) return true;
        if (ratedVolts == 230 && systemVolts == 208)
        {
            Add(FindingCodes.VoltageMismatch, Severity.Warning, range,
                "a 230 V motor on a 208 V system runs at 90 % voltage, the edge of its tolerance; a 200 V or 208-230 V rated motor is the usual choice (common practice, no source)");
            return true;
        }

        Add(FindingCodes.VoltageMismatch, Severity.Error, range,
            $"a {Format.Number(ratedVolts)} V motor cannot run on the {Format.Number(systemVolts)} V feeder {motor.Feeder.Tag?.Value} (Table 430.250 headnote voltage ranges)");
        return false;
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
        var wire = Get(motor, m => m.Wire, out var owner);
        if (wire is null)
        {
            if (r.MinimumWire?.Value is { } min)
                Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                    $"no wire given; NEC 430.22 needs {Format.Amps(required)}: {min}", Insert(motor, $"wire {min}", "Add the minimum wire size"));
            else
                Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                    $"no branch conductor can be chosen for {Format.Amps(required)}: {r.MinimumWire?.Unavailable}");
            return;
        }

        r.Wire = wire.Value;
        r.WireAmpacity = cache.Allowable(wire.Value, conditions, designBcd);
        if (r.WireAmpacity.Value is not { } allowable)
        {
            // A wire whose ampacity the tables cannot give is never passed in silence.
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} cannot be checked against the {Format.Amps(required)} NEC 430.22 requires: {r.WireAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        if (r.MinimumWire?.Value is { } minimum)
            Add(FindingCodes.WireUndersized, Severity.Error, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} carries {Format.Amps(allowable)} here; NEC 430.22 requires {Format.Amps(required)}: use {minimum}",
                ReplaceOrOverride(motor, owner, "wire", "size", minimum.ToString(), $"Change the wire to {minimum}"));
        else
            Add(FindingCodes.WireUndersized, Severity.Error, RangeOn(motor, owner, wire.Range),
                $"wire {wire.Value} carries {Format.Amps(allowable)} here; NEC 430.22 requires {Format.Amps(required)}, and {r.MinimumWire?.Unavailable}");
    }

    private void CheckProtection(MotorNode motor, MotorResult r, decimal flc, Phases phases, MotorKind kind, DesignLetter? design, Efficiency efficiency)
    {
        var device = Get(motor, m => m.Protection, out var deviceOwner);
        var rating = Get(motor, m => m.ProtectionRating, out var ratingOwner);
        r.Device = device?.Value ?? ProtectiveDevice.InverseTimeBreaker;
        r.ProtectionRating = rating?.Value.Value;
        var hardStart = Likes.Has(motor, model, m => m.HardStart);
        r.ProtectionBasis = new ProtectionInput(flc, r.Device, phases, kind, design, efficiency, hardStart);
        r.MaximumProtection = cache.MaximumProtection(r.ProtectionBasis.Value);
        if (r.MaximumProtection.Value is not { } max)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, device is null ? motor.Header.KeywordToken.Range : RangeOn(motor, deviceOwner, device.Range),
                $"the short-circuit and ground-fault protection cannot be checked: {r.MaximumProtection.Unavailable} (NEC 430.52)");
            return;
        }
        var deviceName = ShortCircuitProtection.DeviceName(r.Device);
        var unit = r.Device == ProtectiveDevice.InstantaneousTripBreaker ? "setting" : "rating";
        // Written only when a finding needs it: most motors are correct, and this runs for each.
        string MaxText() => r.Device == ProtectiveDevice.InstantaneousTripBreaker ? Format.Number(decimal.Floor(max)) + "A" : Format.Number(max) + "A";

        if (device is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                $"no short-circuit protection given; NEC 430.52 allows an {deviceName} up to {Format.Amps(max)}",
                Insert(motor, $"protection inverse-time-breaker {MaxText()}", "Add the maximum inverse-time breaker"));
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
        if (value > max)
        {
            var rule = hardStart ? "NEC 430.52(C)(1)(b)" : "NEC 430.52(C)(1)";
            Add(FindingCodes.ProtectionTooLarge, Severity.Error, RangeOn(motor, ratingOwner, rating.Range),
                $"{deviceName} {unit} {Format.Amps(value)} is above the {Format.Amps(max)} that {rule} allows for {Format.Amps(flc)} full-load current",
                ReplaceOrOverride(motor, ratingOwner, "protection", "rating", MaxText(), $"Change the {unit} to {MaxText()}",
                    overrideText: $"protection {Keywords.Devices.First(d => Equals(d.Value, r.Device)).Canonical} {MaxText()}"));
        }
        else if (value < flc * 1.25m)
        {
            // Common practice, no source: below 125 % of full-load current a motor device opens on normal starting.
            Add(FindingCodes.ProtectionMayTrip, Severity.Warning, RangeOn(motor, ratingOwner, rating.Range),
                $"{deviceName} {unit} {Format.Amps(value)} is under 125 % of the {Format.Amps(flc)} full-load current; the motor will likely trip it while starting (NEC 430.52 allows up to {Format.Amps(max)})");
        }
    }

    private void CheckOverload(MotorNode motor, MotorResult r)
    {
        var nameplate = Get(motor, m => m.Nameplate)?.Value.Value;
        var sf = Get(motor, m => m.ServiceFactor)?.Value;
        // A temperature rise converts from °F by 5/9 alone: it is a difference, not a temperature.
        var riseQuantity = Get(motor, m => m.TemperatureRise)?.Value;
        decimal? rise = riseQuantity is { } q ? (q.Unit == Unit.Fahrenheit ? q.Value * 5m / 9m : q.Value) : null;
        r.OverloadLimit = cache.Overload(nameplate, sf, rise, absolute: false);
        r.OverloadAbsoluteLimit = cache.Overload(nameplate, sf, rise, absolute: true);
        var overload = Get(motor, m => m.Overload, out var owner);
        r.Overload = overload?.Value.Value;
        if (overload is null)
        {
            // 430.33: a duty-cycle motor is protected against overload by its branch device.
            if (Get(motor, m => m.Duty) is { Value: not DutyKind.Continuous }) return;
            if (r.OverloadLimit.Value is { } limit)
                Add(FindingCodes.OverloadMissing, Severity.Warning, motor.Header.KeywordToken.Range,
                    $"no overload given; NEC 430.32(A)(1) requires one, rated at most {Format.Amps(limit)}",
                    Insert(motor, $"overload {Format.Number(limit)}A", "Add the overload at its 430.32(A)(1) limit"));
            else
                Add(FindingCodes.CannotCheck, Severity.Warning, motor.Header.KeywordToken.Range,
                    "no overload and no nameplate current: NEC 430.32 overloads are sized from the nameplate");
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
                $"overload {Format.Amps(value)} is above even the NEC 430.32(C) maximum of {Format.Amps(absolute)}; NEC 430.32(A)(1) allows {Format.Amps(max)}",
                ReplaceOrOverride(motor, owner, "overload", "setting", $"{Format.Number(max)}A", $"Change the overload to {Format.Amps(max)}"));
        else if (value > max)
            Add(FindingCodes.OverloadAboveRunningLimit, Severity.Warning, RangeOn(motor, owner, overload.Range),
                $"overload {Format.Amps(value)} is above the NEC 430.32(A)(1) limit of {Format.Amps(max)}; that is allowed only where the smaller device will not start the motor (430.32(C), up to {Format.Amps(absolute)})");
    }

    private void CheckDisconnectAndController(MotorNode motor, MotorResult r, decimal flc)
    {
        r.Disconnect = cache.Disconnect(flc, r.Horsepower);
        r.Controller = cache.Controller(r.Horsepower);
        // The NEMA sizes carried are those of polyphase ac starters: no suggestion for a single-phase or dc motor.
        if (r.Phases == Phases.Three)
        {
            (r.NemaStarter, var size) = cache.Nema(r.Horsepower, r.Volts);
            r.NemaStarterSize = r.NemaStarter.HasValue ? size : null;
        }
        var need = r.Disconnect.Value!.Value;
        if (Get(motor, m => m.DisconnectRating, out var ampsOwner) is { } amps && amps.Value.Value < need.MinimumAmps)
            Add(FindingCodes.DisconnectTooSmall, Severity.Error, RangeOn(motor, ampsOwner, amps.Range),
                $"disconnect rated {Format.Amps(amps.Value.Value)} is below the {Format.Amps(need.MinimumAmps)} (115 % of {Format.Amps(flc)}) that NEC 430.110(A) requires");
        if (Get(motor, m => m.DisconnectPower, out var hpOwner) is { } hp && HorsepowerOf(hp.Value) < need.MinimumHorsepower)
            Add(FindingCodes.DisconnectTooSmall, Severity.Error, RangeOn(motor, hpOwner, hp.Range),
                $"disconnect rated {hp.Value} is below the motor's {Numbers.Horsepower(need.MinimumHorsepower)} hp (NEC 430.109(A), 430.110(A))",
                ReplaceOrOverride(motor, hpOwner, "disconnect", "power", $"{Numbers.Horsepower(need.MinimumHorsepower)}hp", "Change the disconnect's horsepower rating"));
        if (Get(motor, m => m.ControllerPower, out var cOwner) is { } controller && HorsepowerOf(controller.Value) < r.Horsepower)
            Add(FindingCodes.ControllerTooSmall, Severity.Error, RangeOn(motor, cOwner, controller.Range),
                $"controller rated {controller.Value} is below the motor's {Numbers.Horsepower(r.Horsepower)} hp (NEC 430.83(A)(1))",
                ReplaceOrOverride(motor, cOwner, "controller", "power", $"{Numbers.Horsepower(r.Horsepower)}hp", "Change the controller rating"));
    }

    private void CheckGround(MotorNode motor, MotorResult r, decimal flc, Phases phases, MotorKind kind, DesignLetter? design, Efficiency efficiency, Settings settings)
    {
        var material = settings.Material;
        var phaseMinimum = r.MinimumWire?.Value;
        if (r.Device == ProtectiveDevice.InstantaneousTripBreaker)
            r.MinimumGround = cache.GroundForInstantaneousTrip(new ProtectionInput(flc, r.Device, phases, kind, design, efficiency), material, r.Wire ?? phaseMinimum, phaseMinimum);
        else if ((r.ProtectionRating ?? r.MaximumProtection?.Value) is { } device)
            r.MinimumGround = cache.Ground(device, material, r.Wire ?? phaseMinimum, phaseMinimum, "NEC 250.122(D)(1)");
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
        var wire = r.Wire ?? r.MinimumWire?.Value;
        if (wire is null) return;
        var ground = r.Ground ?? r.MinimumGround?.Value;
        var contents = new RacewayContents(phases == Phases.Three ? 3 : 2, wire.Value.Size, ground);
        r.MinimumConduit = cache.SmallestConduit(contents, settings.Raceway, settings.Insulation);
        if (Get(motor, m => m.Conduit, out var owner) is not { } conduit) return;
        var trade = Numbers.Horsepower(conduit.Value.Value);
        r.ConduitFillPercent = ConduitFill.FillPercent(contents, settings.Raceway, trade);
        if (r.ConduitFillPercent is { } fill && fill > 40m && r.MinimumConduit.Value is { } smallest)
            Add(FindingCodes.ConduitOverfilled, Severity.Error, RangeOn(motor, owner, conduit.Range),
                $"{trade} in {settings.Raceway.ToString().ToUpperInvariant()} is {fill:0.#} % full; Chapter 9 Table 1 allows 40 %: use {smallest} in",
                ReplaceOrOverride(motor, owner, "conduit", "trade-size", $"{smallest}in", $"Change the conduit to {smallest} in"));
    }

    private void LockedRotor(MotorNode motor, MotorResult r, Phases phases, DesignLetter? design)
    {
        if (phases == Phases.Dc) return;
        if (Get(motor, m => m.CodeLetter) is { } letter)
            r.LockedRotorFromCodeLetter = cache.LockedRotorFromCodeLetter(r.Horsepower, r.Volts, phases, letter.Value);
        r.LockedRotorTableMaximum = cache.LockedRotorMaximum(r.Horsepower, r.Volts, phases, design ?? DesignLetter.B);
    }

    private Located<T>? Get<T>(MotorNode motor, Func<MotorNode, Located<T>?> get) => Likes.Get(motor, model, get)?.Value;

    private Located<T>? Get<T>(MotorNode motor, Func<MotorNode, Located<T>?> get, out MotorNode? owner)
    {
        var found = Likes.Get(motor, model, get);
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
