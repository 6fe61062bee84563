using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Parser.Collections;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing;
using MotorLang.Sizing.Tables;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Sizes feeders (430.24, 430.62(A)) from the motors and loads they supply, including those on
/// feeders supplied from them ('from'), so a switchboard feeder carries its motor control centers.
/// </summary>
internal sealed partial class FeederSizer(MotorList model, LayeredMap<MotorNode, MotorResult>.Builder motors, EditBuilder edits, List<Finding> findings, SizingCache cache)
{
    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    public FeederResult Size(FeederNode feeder)
    {
        var r = new FeederResult(feeder);
        if (feeder.Voltage is not { } volts || feeder.Phases is not { } phases) return r;
        r.Volts = volts.Value.Value;
        r.Phases = phases.Value;
        if (OnCycle(feeder))
        {
            // Its load would include itself: nothing it carries can be added up (conservative: size nothing).
            findings.Add(new Finding(FindingCodes.CannotCheck, Severity.Warning, feeder.Header.KeywordToken.Range,
                "the feeder cannot be sized: its chain of 'from' goes round in a circle (P016), so the load it carries is not defined"));
            return r;
        }

        var settings = Settings.For(feeder, model);
        if (r.Volts > SystemVoltages.LowVoltageLimit)
        {
            findings.Add(new Finding(FindingCodes.OutsideScope, Severity.Warning, volts.Range,
                "feeders over 1000 V are not sized by MotorLang (Article 430 Part XI governs their motors): nothing on this feeder is checked"));
            return r;
        }

        var device = feeder.Protection?.Value ?? ProtectiveDevice.InverseTimeBreaker;
        var carried = CarriedBy(feeder, r.Volts, r.Phases, device);

        // Currents at another voltage cannot be added: a feeder supplied at another voltage is behind a transformer.
        if (carried.OtherVoltage is { } other)
        {
            Add(FindingCodes.SuppliesAnotherVoltage, Severity.Warning, feeder.Header.KeywordToken.Range,
                $"the feeder cannot be sized: {other.Tag?.Value} ({other.Voltage?.Value}) is supplied from it at another voltage, so through a transformer, " +
                (other.Transformer is null
                    ? $"and none is written on it: write 'transformer <kVA> {Format.Number(r.Volts)}V {other.Voltage?.Value}' on {other.Tag?.Value} so its rated primary current is counted here"
                    : "whose kVA, primary voltage or phases do not say what it draws here (or a fire pump is behind it, whose supply rules need every part)"));
            return r;
        }

        if (carried.Unsized is { } unsized)
        {
            // A sum without that motor would be a confident wrong number, so none is given.
            findings.Add(new Finding(FindingCodes.CannotCheck, Severity.Warning, feeder.Header.KeywordToken.Range,
                $"the feeder cannot be sized: motor {unsized.Tag} has no full-load current (see its findings), so any sum would be incomplete"));
            return r;
        }

        // A load with no current would be left out of the sum: then nothing on the feeder is sized.
        if (carried.UnknownLoads is { Count: > 0 } unknownLoads)
        {
            foreach (var (load, _) in unknownLoads.Where(l => l.Load.Feeder == feeder))
                Add(FindingCodes.CannotCheck, Severity.Warning, load.Header.KeywordToken.Range,
                    "the load has no current or kVA, so its feeder cannot be sized (NEC 430.24(3), (4)): write its amperes, e.g. 'load L-1 \"Heaters\" 12A'");
            Add(FindingCodes.CannotCheck, Severity.Warning, feeder.Header.KeywordToken.Range,
                $"the feeder cannot be sized: {string.Join(", ", unknownLoads.Select(l => l.Load.Tag?.Value ?? "a load"))} has no current or kVA");
            return r;
        }

        var totals = carried.Totals!;
        r.CalculatedLoad = totals.RunningAmps + totals.LoadAmps;
        r.RequiredAmpacity = WithCompressors(Running(feeder, carried, totals, Feeders.RequiredAmpacity(totals)), carried.Compressors, "NEC 440.33",
            "counted as motors at the rated-load or branch-circuit selection current, the larger; marked equipment's other loads are its minimum circuit ampacity less 125 % of that current");
        var fuse = ShortCircuitProtection.IsFuse(device);
        // A fire pump supply's rules list every part they add up, so they take the list itself.
        var parts = carried.FirePump ? FirePumpParts(feeder, r.Volts, r.Phases) : [];
        r.SuppliesFirePump = carried.FirePump;
        var governedBy695 = r.SuppliesFirePump && FirePumpAmpacity(r, parts);
        if (r.SuppliesFirePump)
            r.FirePumpMinimumProtection = FirePump.MinimumDevice(parts, fuse);
        else if (feeder.BranchGroup is { } group)
            r.BranchGroup = group.Value; // 430.53 replaces 430.62: its limit needs the conductors' ampacity, so it is worked out below
        else
            r.MaximumProtection = !ShortCircuitProtection.IsTableDevice(device) || device == ProtectiveDevice.InstantaneousTripBreaker
                ? Result<decimal>.Missing(NotAFeederDevice(device))
                : WithCompressors(Feeders.MaximumProtection(totals, fuse), carried.Compressors, "NEC 430.62(A), 440.22",
                    "a motor-compressor's branch device counts at its 440.22 maximum (under the marked maximum); marked equipment's other loads are left out, the lower limit");
        r.ProtectionRating = feeder.ProtectionRating?.Value.Value;
        var required = r.RequiredAmpacity.Value!.Value;
        if (required > 0) r.MinimumWire = cache.MinimumWire(required, settings.Conditions, false);

        CheckWire(feeder, r, required, settings, governedBy695);
        // 430.62(B): conductors larger than 430.24 requires may carry a device up to their ampacity.
        if (r.MaximumProtection is { } partA && r.BranchGroup is null)
            r.MaximumProtection = FeederConductorProtection.Maximum(partA, r.WireAmpacity?.Value, required, fuse);
        if (r.SuppliesFirePump)
            CheckFirePumpProtection(feeder, r);
        else if (r.BranchGroup is { } kind)
            CheckGroup(feeder, r, kind, device, fuse);
        else
            CheckProtection(feeder, r);
        CheckDisconnect(feeder, r, carried, totals);
        CheckGround(feeder, r, settings);
        CheckConduit(feeder, r, settings);
        Drop(r, settings);
        return r;
    }

    /// <summary>
    /// A motor as the feeder sees it. An instantaneous-trip branch breaker counts at the rating 430.62(A)
    /// Exception No. 1 assumes for the feeder's device type, never at its instantaneous setting.
    /// </summary>
    /// <remarks>
    /// Exception No. 1 names instantaneous-trip breakers and motor short-circuit protectors. A
    /// self-protected combination controller or semiconductor fuses are counted the same way: their
    /// setting or marked rating is not a 430.52 maximum, and the table percentage is the smaller
    /// figure, so the feeder limit is never larger for it (the conservative reading).
    /// </remarks>
    private static FeederMotor AsFeederMotor(MotorResult m, ProtectiveDevice feederDevice)
    {
        var flc = m.FullLoadCurrent.Value!.Value;
        var assumed = m.Device is ProtectiveDevice.InstantaneousTripBreaker or ProtectiveDevice.MotorShortCircuitProtector
            or ProtectiveDevice.SelfProtectedController or ProtectiveDevice.SemiconductorFuse;
        if (assumed && m.ProtectionBasis is { } basis && ShortCircuitProtection.IsTableDevice(feederDevice) && feederDevice != ProtectiveDevice.InstantaneousTripBreaker)
        {
            var (amps, why) = Feeders.AssumedInstantaneousTrip(basis, feederDevice);
            return new FeederMotor(m.Tag, flc, amps, m.Quantity, m.DutyCycleAmps, why);
        }

        return new FeederMotor(m.Tag, flc, m.MaximumProtection?.Value, m.Quantity, m.DutyCycleAmps);
    }

    /// <summary>Conduit fill of the feeder's stated raceway: its phase conductors and grounding conductor (a neutral is not modelled).</summary>
    private void CheckConduit(FeederNode feeder, FeederResult r, Settings settings)
    {
        var replaced = r.WireAmpacity?.Value is { } a && a < (r.RequiredAmpacity?.Value ?? 0) && r.MinimumWire?.Value is not null;
        var wire = replaced ? r.MinimumWire!.Value : r.Wire ?? r.MinimumWire?.Value;
        if (wire is null) return;
        var ground = r.Ground is { } g && r.MinimumGround?.Value is { } mg && g < mg ? mg : r.Ground ?? r.MinimumGround?.Value;
        var phaseConductors = r.Phases == Phases.Three ? 3 : 2;
        var contents = new RacewayContents(phaseConductors, wire.Value.Size, ground);
        r.MinimumConduit = wire.Value.Sets == 1 ? cache.SmallestConduit(contents, settings.Raceway, settings.Insulation) : null;
        if (feeder.Conduit is not { } conduit) return;
        var trade = Numbers.Horsepower(conduit.Value.Value);
        var outcome = ConduitCheck.Check(wire.Value, ground, phaseConductors, settings.Raceway, settings.Insulation, trade, r.MinimumConduit);
        r.ConduitFillPercent = outcome.FillPercent;
        if (outcome.NotChecked is { } why)
            Add(FindingCodes.OutsideScope, Severity.Warning, conduit.Range, why);
        else if (outcome.FillPercent is { } fill && fill > outcome.PermittedPercent)
            Add(FindingCodes.ConduitOverfilled, Severity.Error, conduit.Range,
                $"{trade} in {settings.Raceway.ToString().ToUpperInvariant()} is {fill:0.#} % full; Chapter 9 Table 1 allows {Format.Percent(outcome.PermittedPercent)}"
                + (outcome.Smallest is { } s ? $": use {s} in" : $"; {r.MinimumConduit?.Unavailable}"),
                outcome.Smallest is { } smallest
                    ? new Fix($"Change the conduit to {smallest} in", [EditBuilder.Replace(feeder.Statement("conduit")!.Arg("trade-size")!, $"{smallest}in")])
                    : null);
    }

    /// <summary>Voltage drop along the feeder at its running load (with its wire, or the minimum when none is given).</summary>
    private void Drop(FeederResult r, Settings settings)
    {
        var wire = r.Wire ?? r.MinimumWire?.Value;
        if (r.Feeder.Length is not { } length || wire is null || r.CalculatedLoad == 0) return;
        r.DropBasis = new DropBasis(Conversions.Feet(length.Value), wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway, settings.PowerFactor);
        r.Drop = VoltageDrop.Of(r.CalculatedLoad, Conversions.Feet(length.Value), wire.Value, r.Volts, r.Phases, settings.Material, settings.Raceway, settings.PowerFactor);
        if (r.Drop.Unavailable is { } why)
            Add(FindingCodes.CannotCheck, Severity.Warning, length.Range, $"the feeder voltage drop cannot be worked out: {why}");
    }

    private readonly Dictionary<FeederNode, decimal> _cumulative = [];
    private Dictionary<FeederNode, List<FeederNode>>? _suppliedFrom;
    private HashSet<FeederNode>? _onCycle;

    private bool OnCycle(FeederNode feeder)
    {
        if (feeder.From is null) return false;
        if (_onCycle is null)
        {
            var steps = Steps;
            _onCycle = ReferenceCycles.Members(model.Feeders, f => Supplier(f, model), ref steps);
            Steps = steps;
        }

        return _onCycle.Contains(feeder);
    }

    /// <summary>
    /// Feeders visited while working out drops from the source and cycles of 'from', and feeders,
    /// motors and loads visited while adding up what each feeder carries; tests use it to check
    /// the work grows linearly.
    /// </summary>
    internal long Steps { get; private set; }

    /// <summary>
    /// Drop from the source to this feeder's load end: its own and that of each feeder it is
    /// supplied from (once round a cycle of 'from', which is reported as an error). Remembered per
    /// feeder and worked out without recursion, so a chain of n feeders costs n steps, not n².
    /// Call it once every feeder is sized: it remembers the drops it has added up.
    /// </summary>
    public decimal CumulativeDrop(FeederNode feeder, IReadOnlyDictionary<FeederNode, FeederResult> feeders)
    {
        decimal Own(FeederNode f) => feeders.GetValueOrDefault(f)?.Drop?.Value?.Percent ?? 0;
        if (_cumulative.TryGetValue(feeder, out var known)) return known;

        // Walk up to a feeder already known, the source, or back into this walk (a cycle).
        var walk = new List<FeederNode>();
        var position = new Dictionary<FeederNode, int>();
        decimal above = 0;
        var cycleStart = -1;
        for (FeederNode? f = feeder; f is not null; f = Supplier(f, model))
        {
            Steps++;
            if (_cumulative.TryGetValue(f, out known))
            {
                above = known;
                break;
            }

            if (position.TryGetValue(f, out var back))
            {
                cycleStart = back;
                break;
            }

            position[f] = walk.Count;
            walk.Add(f);
        }

        var end = walk.Count;
        if (cycleStart >= 0)
        {
            // Every member of a cycle gets the cycle's whole drop, as a walk from it that stops where it came back would.
            decimal round = 0;
            for (var i = cycleStart; i < end; i++) round += Own(walk[i]);
            for (var i = cycleStart; i < end; i++) _cumulative[walk[i]] = round;
            above = round;
            end = cycleStart;
        }

        for (var i = end - 1; i >= 0; i--) _cumulative[walk[i]] = above += Own(walk[i]);
        return _cumulative[feeder];
    }

    /// <summary>The feeder this one is supplied from ('from'), if any.</summary>
    public static FeederNode? Supplier(FeederNode feeder, MotorList model) => feeder.From is { } from ? model.Find(from.Value) as FeederNode : null;

    private void CheckWire(FeederNode feeder, FeederResult r, decimal required, Settings settings, bool governedBy695)
    {
        if (feeder.Wire is not { } wire)
        {
            if (r.MinimumWire?.Value is { } min)
                Add(FindingCodes.NotWritten, Severity.Information, feeder.Header.KeywordToken.Range,
                    $"no feeder wire given; NEC 430.24 needs {Format.Amps(required)}: {min}",
                    new Fix("Add the minimum feeder wire", [edits.Insert(feeder, $"wire {min}")]));
            else if (r.MinimumWire is { Unavailable: { } none })
                Add(FindingCodes.CannotCheck, Severity.Warning, feeder.Header.KeywordToken.Range,
                    $"no feeder conductor can be chosen for {Format.Amps(required)}: {none}");
            return;
        }

        r.Wire = wire.Value;
        r.WireAmpacity = cache.Allowable(wire.Value, settings.Conditions, false);
        if (r.WireAmpacity.Value is not { } allowable)
        {
            if (required > 0)
                Add(FindingCodes.CannotCheck, Severity.Warning, wire.Range,
                    $"feeder wire {wire.Value} cannot be checked against the {Format.Amps(required)} NEC {(governedBy695 ? "695.6(C)" : "430.24")} requires: {r.WireAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        var code = governedBy695 ? FindingCodes.FirePumpConductorsUndersized : FindingCodes.FeederWireUndersized;
        var rule = governedBy695 ? "695.6(C)" : "430.24";
        if (r.MinimumWire?.Value is { } minimum)
            Add(code, Severity.Error, wire.Range,
                $"feeder wire {wire.Value} carries {Format.Amps(allowable)} here; NEC {rule} requires {Format.Amps(required)}: use {minimum}",
                new Fix($"Change the feeder wire to {minimum}", [EditBuilder.Replace(feeder.Statement("wire")!.Arg("size")!, minimum.ToString())]));
        else
            Add(code, Severity.Error, wire.Range,
                $"feeder wire {wire.Value} carries {Format.Amps(allowable)} here; NEC {rule} requires {Format.Amps(required)}, and {r.MinimumWire?.Unavailable}");
    }

    private void CheckProtection(FeederNode feeder, FeederResult r)
    {
        if (r.MaximumProtection?.Value is not { } max)
        {
            if (feeder.Protection?.Value is { } written && (written == ProtectiveDevice.InstantaneousTripBreaker || !ShortCircuitProtection.IsTableDevice(written)))
                Add(FindingCodes.FeederDeviceNotSized, Severity.Warning, feeder.Protection.Range,
                    $"feeder protection is not checked: {r.MaximumProtection?.Unavailable}");
            else if (r.MaximumProtection is { Unavailable: { } why } && r.RequiredAmpacity?.Value > 0) // an empty feeder has nothing to protect
                Add(FindingCodes.CannotCheck, Severity.Warning, feeder.Protection?.Range ?? feeder.Header.KeywordToken.Range,
                    $"the feeder protection cannot be checked: {why} (NEC 430.62(A))");
            return;
        }

        var text = $"{Format.Number(max)}A";
        if (feeder.Protection is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Header.KeywordToken.Range,
                $"no feeder protection given; NEC 430.62(A) allows up to {Format.Amps(max)}",
                new Fix("Add the maximum feeder protection", [edits.Insert(feeder, $"protection inverse-time-breaker {text}")]));
            return;
        }

        if (feeder.ProtectionRating is not { } rating)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Protection.Range,
                $"no rating given; NEC 430.62(A) allows up to {Format.Amps(max)}",
                new Fix("Add the maximum rating", [EditBuilder.Append(feeder.Statement("protection")!, text)]));
            return;
        }

        if (rating.Value.Value > max)
            Add(FindingCodes.FeederProtectionTooLarge, Severity.Error, rating.Range,
                $"feeder protection {Format.Amps(rating.Value.Value)} is above the {Format.Amps(max)} NEC 430.62(A) allows (largest branch device plus the other loads, rounded down)",
                new Fix($"Change the rating to {text}", [EditBuilder.Replace(feeder.Statement("protection")!.Arg("rating")!, text)]));
    }

    private void CheckGround(FeederNode feeder, FeederResult r, Settings settings)
    {
        if ((r.ProtectionRating ?? r.MaximumProtection?.Value ?? r.FirePumpMinimumProtection?.Value) is not { } device) return;
        // 250.122(B) measures upsizing from the smallest conductor that suits the installation; a feeder's
        // conductors are normally chosen to carry its protective device's rating, so that is the base
        // (common practice, no source). Anything larger counts as upsized.
        var baseline = cache.MinimumWire(Math.Max(r.RequiredAmpacity?.Value ?? 0, device), settings.Conditions, false).Value;
        // A feeder wire reported too small counts at the size its fix writes, so check and size give one number.
        var replaced = r.WireAmpacity?.Value is { } allowable && allowable < (r.RequiredAmpacity?.Value ?? 0) && r.MinimumWire?.Value is not null;
        var phase = replaced ? r.MinimumWire!.Value : r.Wire ?? r.MinimumWire?.Value;
        r.MinimumGround = Grounding.Minimum(device, settings.Material, phase, baseline, "NEC 250.122(A)");
        if (r.MinimumGround.Value is not { } min)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, feeder.Ground?.Range ?? feeder.Header.KeywordToken.Range,
                $"the feeder grounding conductor cannot be sized: {r.MinimumGround.Unavailable} (NEC 250.122)");
            return;
        }
        if (feeder.Ground is not { } ground)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Header.KeywordToken.Range,
                $"no grounding conductor given; NEC 250.122 needs {min}", new Fix("Add the grounding conductor", [edits.Insert(feeder, $"ground {min}")]));
            return;
        }

        r.Ground = ground.Value.Size;
        if (ground.Value.Size < min)
            Add(FindingCodes.GroundUndersized, Severity.Error, ground.Range,
                $"grounding conductor {ground.Value.Size} is smaller than the {min} NEC 250.122 requires for {Format.Amps(device)}",
                new Fix($"Change the grounding conductor to {min}", [EditBuilder.Replace(feeder.Statement("ground")!.Arg("size")!, min.ToString())]));
    }

    /// <summary>The feeder and every feeder supplied from it, directly or further down (breadth first, in list order).</summary>
    private IEnumerable<FeederNode> Downstream(FeederNode feeder)
    {
        _suppliedFrom ??= SuppliedFrom();
        var seen = new HashSet<FeederNode>();
        var queue = new Queue<FeederNode>([feeder]);
        while (queue.Count > 0)
        {
            var f = queue.Dequeue();
            if (!seen.Add(f)) continue;
            yield return f;
            if (_suppliedFrom.TryGetValue(f, out var children))
            {
                foreach (var child in children) queue.Enqueue(child);
            }
        }
    }

    /// <summary>Each feeder's directly supplied feeders, in list order, found once for the pass instead of by a scan of every feeder per step.</summary>
    private Dictionary<FeederNode, List<FeederNode>> SuppliedFrom()
    {
        var map = new Dictionary<FeederNode, List<FeederNode>>();
        foreach (var f in model.Feeders)
        {
            if (Supplier(f, model) is not { } up) continue;
            if (!map.TryGetValue(up, out var list)) map[up] = list = [];
            list.Add(f);
        }

        return map;
    }

    private static FeederLoad? LoadOf(LoadNode load, decimal volts, Phases phases)
    {
        var amps = load.Current?.Value.Value
                   ?? (load.ApparentPower is { } kva ? kva.Value.Value * 1000m / (phases == Phases.Three ? volts * Sqrt3 : volts) : (decimal?)null);
        return amps is null ? null : new FeederLoad(load.Tag?.Value ?? "", amps.Value, load.Continuous);
    }

    private void Add(string code, Severity severity, SourceRange range, string message, Fix? fix = null) =>
        findings.Add(new Finding(code, severity, range, message, fix));

    /// <summary>Why a feeder device of this type gets no 430.62 limit.</summary>
    private static string NotAFeederDevice(ProtectiveDevice device) => device switch
    {
        ProtectiveDevice.InstantaneousTripBreaker =>
            "an instantaneous-trip breaker is not a feeder protective device MotorLang can size (430.52(C)(3) permits one only in a listed combination motor controller on a motor branch circuit)",
        _ => $"a {ShortCircuitProtection.DeviceName(device)} is a motor branch device (430.52(C)(5)-(7)), not a feeder protective device MotorLang can size under 430.62",
    };
}
