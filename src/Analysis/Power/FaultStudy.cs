using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Analysis.Power;

/// <summary>A transformer at the head of a feeder: its rated currents and what Table 450.3(B) and 240.21(C) allow.</summary>
public sealed record TransformerFacts(decimal Kva, decimal PrimaryVolts, decimal SecondaryVolts, decimal PrimaryAmps, decimal SecondaryAmps,
    TransformerProtectionMethod? Method, Result<decimal>? PrimaryMaximum, Result<decimal>? SecondaryMaximum, SecondaryCheck? Secondary,
    string? ProtectionNotChecked);

/// <summary>The fault current where a feeder's supply-end device stands, and at its bus.</summary>
public sealed record FeederFault(FeederNode Feeder, FaultPoint Supply, FaultPoint Bus, TransformerFacts? Transformer)
{
    /// <summary>Where the feeder's own 'protection' stands: at its supply end, or for a transformer feeder where the secondary conductors end (its bus).</summary>
    public FaultPoint ProtectionPoint => Transformer is null ? Supply : Bus;
}

/// <summary>
/// The available fault current at the service, at every feeder's bus and at every motor's
/// controller, worked out once per analysis from the project's 'source' down the 'from' chains
/// (docs/checks.md, Available fault current), and the findings of the checks against it.
/// </summary>
public sealed class FaultStudy
{
    private FaultStudy(FaultPoint? service, Dictionary<FeederNode, FeederFault> feeders, ImmutableArray<Finding> findings, bool hasSource,
        Dictionary<MotorNode, TapResult> taps, Dictionary<MotorNode, StartingDipResult> dips)
    {
        Taps = taps;
        Dips = dips;
        HasSource = hasSource;
        Service = service;
        Feeders = feeders;
        Findings = findings;
    }

    public static readonly FaultStudy Empty = new(null, [], [], false, [], []);

    /// <summary>The project writes a 'source' (its values may still be incomplete).</summary>
    public bool HasSource { get; }

    /// <summary>At the service (the point the 'source' is stated at); null when the project writes no 'source'.</summary>
    public FaultPoint? Service { get; }

    public IReadOnlyDictionary<FeederNode, FeederFault> Feeders { get; }

    public ImmutableArray<Finding> Findings { get; }

    /// <summary>Every motor with a feeder tap ('tap'), and what 430.28 asks of it.</summary>
    public IReadOnlyDictionary<MotorNode, TapResult> Taps { get; }

    /// <summary>Every three-phase motor's starting dip at its bus and terminals (a list with a 'source' only).</summary>
    public IReadOnlyDictionary<MotorNode, StartingDipResult> Dips { get; }

    /// <summary>At a motor's controller: its feeder's bus (the controller is taken to stand in the MCC).</summary>
    public FaultPoint? AtController(MotorNode motor) => Feeders.GetValueOrDefault(motor.Feeder)?.Bus;

    public static FaultStudy Run(MotorList model, IReadOnlyDictionary<MotorNode, MotorResult> motors, IReadOnlyDictionary<FeederNode, FeederResult> feeders)
    {
        // One resolver for the pass: each motor reads attributes along its 'like' chain, remembered, so a long chain stays linear.
        var likes = new LikeResolver(model);
        var builder = new StudyBuilder(model, motors, feeders, likes);
        // Feeder taps (430.28) need the motors' and the feeders' sizing both, as the fault study does: they run in the same pass.
        var taps = FeederTapChecks.Run(model, likes, motors, feeders, builder.Findings);
        // The starting dip reads the system impedance the study found, so only a list with a 'source' has one.
        var dips = builder.Service is null ? [] : StartingDips.Run(model, likes, motors, m => builder.Results.GetValueOrDefault(m.Feeder)?.Bus, builder.Findings);
        return new FaultStudy(builder.Service, builder.Results, [.. builder.Findings], model.Project?.Source is not null, taps, dips);
    }

    private sealed class StudyBuilder
    {
        private readonly MotorList _model;
        private readonly IReadOnlyDictionary<FeederNode, FeederResult> _sized;
        private readonly decimal _motorVoltAmps;
        public readonly Dictionary<FeederNode, FeederFault> Results = [];
        public readonly List<Finding> Findings = [];
        public readonly FaultPoint? Service;
        private readonly string? _noSource;
        private readonly decimal _serviceVolts;

        private readonly LikeResolver _likes;

        public StudyBuilder(MotorList model, IReadOnlyDictionary<MotorNode, MotorResult> motors, IReadOnlyDictionary<FeederNode, FeederResult> feeders, LikeResolver likes)
        {
            _likes = likes;
            _model = model;
            _sized = feeders;
            // Every ac motor is counted as running and as feeding every point, with no impedance between:
            // an upper bound (docs/checks.md). Kept as volt-amperes per phase so it refers to any voltage.
            foreach (var m in motors.Values)
            {
                if (m.Phases == Phases.Dc || m.FullLoadCurrent.Value is not { } flc) continue;
                _motorVoltAmps += flc * m.Quantity * m.Volts;
            }

            var project = model.Project;
            var root = model.Feeders.FirstOrDefault(f => f.From is null);
            _serviceVolts = root is null ? 0 : SupplyVolts(root);
            if (project?.Source is not { } source)
                _noSource = "no 'source' is written in the project block";
            else if (root is null || _serviceVolts <= 0)
                _noSource = "no feeder is supplied at the source (every feeder has 'from')";
            else
                Service = ServicePoint(project, source.Value);

            foreach (var f in model.Feeders) Solve(f);
            foreach (var f in model.Feeders) Check(f);
            foreach (var m in motors.Values) Check(m);
        }

        private static decimal SupplyVolts(FeederNode f) =>
            f.TransformerPrimary?.Value.Value ?? f.Voltage?.Value.Value ?? 0;

        private decimal RunningAmps(decimal volts) => volts > 0 ? _motorVoltAmps / volts : 0;

        private FaultPoint ServicePoint(ProjectNode project, SourceKind kind)
        {
            var v = _serviceVolts;
            Result<Impedance> z = kind switch
            {
                SourceKind.Utility when project.SourceFaultCurrent is { } ka && project.SourceXOverR is { } xr =>
                    FaultCurrent.Utility(ka.Value.Value, xr.Value.Value, v),
                SourceKind.Generator when project.SourceRating is { } kva && project.SourceReactance is { } xd =>
                    FaultCurrent.Generator(kva.Value.Value, xd.Value.Value, project.SourceXOverR?.Value.Value, v),
                SourceKind.InfiniteBus => Result<Impedance>.Of(Impedance.Zero,
                    new Step("Source impedance", Impedance.Zero.ToString(), FaultCurrent.MethodReference, "infinite bus: no impedance ahead of the first transformer")),
                _ => Result<Impedance>.Missing("the 'source' line lacks a value its kind needs (P035)"),
            };
            if (z.Value is not { } zz) return new FaultPoint("the service", z.Unavailable!);
            return new FaultPoint("the service", v, zz, null, z.Steps, RunningAmps(v));
        }

        /// <summary>Works out a feeder and those it is supplied from, without recursion (a 'from' chain may be long).</summary>
        private void Solve(FeederNode start)
        {
            if (Results.ContainsKey(start)) return;
            var chain = new List<FeederNode>();
            var seen = new HashSet<FeederNode>();
            FeederNode? f = start;
            while (f is not null && !Results.ContainsKey(f))
            {
                if (!seen.Add(f))
                {
                    // A 'from' cycle (P016): nothing on it has a source.
                    foreach (var c in chain) Results[c] = Failed(c, "its 'from' chain goes round in a circle (P016)");
                    return;
                }

                chain.Add(f);
                f = f.From is { } tag ? _model.Find(tag.Value) as FeederNode : null;
            }

            for (var i = chain.Count - 1; i >= 0; i--) Results[chain[i]] = Compute(chain[i]);
        }

        private static FeederFault Failed(FeederNode f, string why)
        {
            var p = new FaultPoint(Name(f), why);
            return new FeederFault(f, p, p, null);
        }

        private static string Name(FeederNode f) => $"{f.Tag?.Value}'s bus";

        private FeederFault Compute(FeederNode f)
        {
            FaultPoint supply;
            if (f.From is { } tag)
            {
                if (_model.Find(tag.Value) is not FeederNode up || !Results.TryGetValue(up, out var upFault))
                    return WithTransformerFacts(Failed(f, $"'from {tag.Value}' names no feeder"), null);
                supply = upFault.Bus;
            }
            else
            {
                supply = Service ?? new FaultPoint("the service", _noSource!);
            }

            var transformer = TransformerOf(f);
            var volts = f.Voltage?.Value.Value ?? 0;
            string? why = null;
            if (!supply.Known) why = $"not worked out where it is supplied: {supply.Bolted.Unavailable}";
            else if (f.Phases?.Value is not (Phases.Three or Phases.Single)) why = "dc fault current is not worked out";
            else if (f.Phases?.Value == Phases.Three && supply.SinglePhase) why = "a three-phase feeder supplied from a single-phase bus";
            else if (f.Phases?.Value == Phases.Single && f.From is null)
                why = "a single-phase feeder at the source: the source's kA is read as three-phase, so its line-to-line value is not worked out";
            else if (f.Transformer is not null && (f.TransformerRating is null || f.TransformerPrimary is null || f.TransformerSecondary is null))
                why = "the transformer line lacks its kVA or its voltages";
            else if (f.Transformer is not null && f.TransformerImpedance is null) why = "the transformer has no %Z written";
            else if (f.Transformer is not null && f.TransformerXOverR is null) why = "the transformer has no X/R written";
            else if (f.Transformer is not null && (f.TransformerPrimary!.Value.Value != supply.Volts || f.TransformerSecondary!.Value.Value != volts))
                why = $"the transformer's voltages do not match: {Format.Number(supply.Volts)} V where it is supplied, {Format.Number(volts)} V on the feeder (M508)";
            else if (f.Transformer is null && volts != supply.Volts)
                why = $"the feeder is {Format.Number(volts)} V and is supplied at {Format.Number(supply.Volts)} V with no 'transformer' written";
            if (why is not null)
            {
                var failed = new FaultPoint(Name(f), why);
                return new FeederFault(f, supply, failed, transformer);
            }

            var steps = ImmutableArray.CreateBuilder<Step>();
            var z = supply.Impedance;
            var dip = supply.DipImpedance;
            var gap = supply.DipGap;
            // Single phase, line to line: the loop impedance. Taken off a three-phase bus, two of its phases are in the loop.
            var single = f.Phases?.Value == Phases.Single;
            if (single && !supply.SinglePhase)
            {
                z = Twice(z);
                dip = Twice(dip);
                steps.Add(new Step("Two phases in the loop", z.ToString(), FaultCurrent.MethodReference,
                    $"line to line from the three-phase bus: 2 × the impedance to {supply.Name} per phase"));
            }

            if (f.Transformer is not null)
            {
                var vp = f.TransformerPrimary!.Value.Value;
                dip = dip.Referred(vp, volts);
                gap ??= $"{f.Tag?.Value}'s transformer primary conductors are not in the list";
                if (z != Impedance.Zero)
                {
                    z = z.Referred(vp, volts);
                    steps.Add(new Step("Referred to the secondary", z.ToString(), FaultCurrent.MethodReference,
                        $"the impedance up to {f.Tag?.Value}'s transformer × ({Format.Number(volts)} V ÷ {Format.Number(vp)} V)²; its primary conductors are not in the list and are taken as none, which can only overstate the current"));
                }

                var zt = FaultCurrent.Transformer(f.TransformerRating!.Value.Value, f.TransformerImpedance!.Value.Value, f.TransformerXOverR!.Value.Value, volts);
                z += zt.Value!.Value;
                dip += zt.Value!.Value;
                steps.AddRange(zt.Steps);
            }

            var conductors = Conductors(f, steps);
            if (single && conductors != Impedance.Zero)
            {
                conductors = Twice(conductors);
                steps.Add(new Step("Conductor loop", conductors.ToString(), FaultCurrent.MethodReference, "single phase: out and back, 2 × the one-way impedance"));
            }

            z += conductors;
            var (dipConductors, dipGap) = DipConductors(f);
            dip += single ? Twice(dipConductors) : dipConductors;
            gap ??= dipGap;
            var below = single && (f.Transformer is not null || supply.BelowSinglePhaseTransformer);
            var bus = new FaultPoint(Name(f), volts, z, supply, steps.ToImmutable(), RunningAmps(volts), dip, gap, single, below);
            return new FeederFault(f, supply, bus, transformer);
        }

        private static Impedance Twice(Impedance z) => new(2 * z.R, 2 * z.X);

        private FeederFault WithTransformerFacts(FeederFault fault, TransformerFacts? facts) => fault with { Transformer = facts ?? TransformerOf(fault.Feeder) };

        /// <summary>The feeder's conductors; none written (or no Table 9 row) counts as no impedance, the side that overstates the current.</summary>
        private Impedance Conductors(FeederNode f, ImmutableArray<Step>.Builder steps)
        {
            var settings = Settings.For(f, _model);
            var what = f.Transformer is null ? "feeder conductors" : "secondary conductors";
            if (f.Length is not { } length || f.Wire is not { } wire)
            {
                steps.Add(new Step("Conductor impedance", "0 Ω", "conservative reading",
                    $"no {(f.Length is null ? "'length'" : "'wire'")} written for the {what}: taken as no impedance, which can only overstate the fault current"));
                return Impedance.Zero;
            }

            var zc = FaultCurrent.Conductor(wire.Value, Conversions.Feet(length.Value), settings.Material, settings.Raceway);
            if (zc.Value is not { } z)
            {
                steps.Add(new Step("Conductor impedance", "0 Ω", "conservative reading", $"{zc.Unavailable}: taken as no impedance, which can only overstate the fault current"));
                return Impedance.Zero;
            }

            steps.AddRange(zc.Steps);
            return z;
        }

        /// <summary>The feeder's conductors as a starting dip reads them (EMT as steel conduit), or why they count as none.</summary>
        private (Impedance, string?) DipConductors(FeederNode f)
        {
            // A feeder at the source with no length is where the source's kA is stated: nothing is missing there.
            if (f.Length is not { } length || f.Wire is not { } wire)
                return (Impedance.Zero, f.From is null && f.Length is null ? null : $"{f.Tag?.Value} writes no {(f.Length is null ? "'length'" : "'wire'")}");
            var settings = Settings.For(f, _model);
            var raceway = settings.Raceway == RacewayType.Emt ? RacewayType.Rmc : settings.Raceway;
            var zc = FaultCurrent.Conductor(wire.Value, Conversions.Feet(length.Value), settings.Material, raceway);
            return zc.Value is { } z ? (z, null) : (Impedance.Zero, $"{f.Tag?.Value}'s conductors: {zc.Unavailable}");
        }

        private TransformerFacts? TransformerOf(FeederNode f)
        {
            if (f.TransformerRating is not { } kva || f.TransformerPrimary is not { } vp || f.TransformerSecondary is not { } vs) return null;
            var single = f.Phases?.Value == Phases.Single;
            var ip = single ? kva.Value.Value * 1000m / vp.Value.Value : FaultCurrent.RatedCurrent(kva.Value.Value, vp.Value.Value);
            var @is = single ? kva.Value.Value * 1000m / vs.Value.Value : FaultCurrent.RatedCurrent(kva.Value.Value, vs.Value.Value);
            if (vp.Value.Value > 1000m || vs.Value.Value > 1000m)
                return new TransformerFacts(kva.Value.Value, vp.Value.Value, vs.Value.Value, ip, @is, null, null, null, null,
                    "a winding over 1000 V: Table 450.3(A) applies, which MotorLang does not carry");
            if (f.PrimaryProtection is not { } primary || f.PrimaryProtectionRating is not { } primaryRating)
                return new TransformerFacts(kva.Value.Value, vp.Value.Value, vs.Value.Value, ip, @is, null, null, null, null,
                    "no 'primary-protection' is written, so neither Table 450.3(B) nor 240.21(C) can be checked");
            var method = f.ProtectionRating is null ? TransformerProtectionMethod.PrimaryOnly : TransformerProtectionMethod.PrimaryAndSecondary;
            var primaryMax = TransformerProtection.Maximum(method, true, ip, MotorLang.Sizing.Rules.ShortCircuitProtection.IsFuse(primary.Value));
            var secondaryMax = method == TransformerProtectionMethod.PrimaryAndSecondary
                ? TransformerProtection.Maximum(method, false, @is, MotorLang.Sizing.Rules.ShortCircuitProtection.IsFuse(f.Protection?.Value ?? ProtectiveDevice.InverseTimeBreaker))
                : null;
            var secondary = SecondaryConductors.Check(f.Length is { } l ? Conversions.Feet(l.Value) : null, f.ProtectionRating?.Value.Value,
                primaryRating.Value.Value, vp.Value.Value, vs.Value.Value);
            return new TransformerFacts(kva.Value.Value, vp.Value.Value, vs.Value.Value, ip, @is, method, primaryMax, secondaryMax, secondary, null);
        }

        private void Check(FeederNode f)
        {
            var fault = Results[f];
            var tag = f.Tag?.Value;
            if (f.Interrupting is { } ir)
                CheckRating(ir, fault.ProtectionPoint, FindingCodes.InterruptingTooLow, $"{tag}'s protective device: interrupting rating", "110.9");
            if (f.Sccr is { } sccr)
                CheckRating(sccr, fault.Bus, FindingCodes.BusSccrTooLow, $"{tag}'s bus equipment: short-circuit current rating", "110.10, 409.22");
            if (f.PrimaryInterrupting is { } pir)
                CheckRating(pir, fault.Supply, FindingCodes.PrimaryInterruptingTooLow, $"{tag}'s transformer primary device: interrupting rating", "110.9");
            if (f.Transformer is { } statement && fault.Supply.Known && f.TransformerPrimary is { } vp && f.TransformerSecondary is { } vs
                && f.Voltage is { } fv && (vp.Value.Value != fault.Supply.Volts || vs.Value.Value != fv.Value.Value))
            {
                Findings.Add(new Finding(FindingCodes.TransformerVoltageMismatch, Parser.Diagnostics.Severity.Error, statement.Range,
                    $"transformer {Format.Number(vp.Value.Value)} V to {Format.Number(vs.Value.Value)} V, but it is supplied at {Format.Number(fault.Supply.Volts)} V and the feeder is {Format.Number(fv.Value.Value)} V; the fault current below it is not worked out"));
            }

            // The supplying feeder counts the transformer at its rated primary current (M216), which holds only while its load stays within its rating.
            if (fault.Transformer is { } rated && f.TransformerRating is { } kva && _sized.GetValueOrDefault(f) is { CalculatedLoad: > 0 } sized
                && sized.CalculatedLoad > rated.SecondaryAmps)
                Findings.Add(new Finding(FindingCodes.TransformerOverloaded, Parser.Diagnostics.Severity.Warning, kva.Range,
                    $"{tag}'s running load of {Format.Amps(sized.CalculatedLoad)} is above its {Format.Number(rated.Kva)} kVA transformer's {Format.Amps(decimal.Round(rated.SecondaryAmps, 1))} rated secondary current; the feeder it is supplied from counts it at its rating only"));
            if (fault.Transformer is not { Method: { } method } t) return;
            if (t.PrimaryMaximum?.Value is { } pmax && f.PrimaryProtectionRating is { } pr && pr.Value.Value > pmax)
                Findings.Add(new Finding(FindingCodes.TransformerPrimaryTooLarge, Parser.Diagnostics.Severity.Error, pr.Range,
                    $"primary device {Format.Amps(pr.Value.Value)} is above the {Format.Amps(pmax)} Table 450.3(B) permits ({TransformerProtection.Name(method)} protection, {Format.Amps(decimal.Round(t.PrimaryAmps, 1))} rated primary current)",
                    LargestStandard(f.Statement("primary-protection"), f.PrimaryProtection?.Value, pmax, "primary device")));
            if (t.SecondaryMaximum?.Value is { } smax && f.ProtectionRating is { } sr && sr.Value.Value > smax)
                Findings.Add(new Finding(FindingCodes.TransformerSecondaryTooLarge, Parser.Diagnostics.Severity.Error, sr.Range,
                    $"secondary device {Format.Amps(sr.Value.Value)} is above the {Format.Amps(smax)} Table 450.3(B) permits ({Format.Amps(decimal.Round(t.SecondaryAmps, 1))} rated secondary current)",
                    LargestStandard(f.Statement("protection"), f.Protection?.Value, smax, "secondary device")));
            if (t.Secondary is not { } sc) return;
            if (sc.TooLong && f.Length is { } length)
                Findings.Add(new Finding(FindingCodes.SecondaryConductorsTooLong, Parser.Diagnostics.Severity.Warning, length.Range, sc.MinimumAmpacity.Unavailable!));
            if (sc.NeedsDevice)
                Findings.Add(new Finding(FindingCodes.SecondaryConductorsUnprotected, Parser.Diagnostics.Severity.Warning, f.Header.Range,
                    $"{tag}'s secondary conductors end in no 'protection' written here: {sc.Subsection} asks for an overcurrent device where they end (or, for (C)(2), equipment rated no more than their ampacity)"));
            if (sc.MinimumAmpacity.Value is { } min && _sized.GetValueOrDefault(f)?.WireAmpacity?.Value is { } ampacity && ampacity < min)
            {
                // The smallest conductor with that ampacity under the feeder's conditions is the one right size.
                var size = Ampacity.Minimum(min, Settings.For(f, _model).Conditions, false).Value;
                var fix = size is { } w && f.Statement("wire")?.Arg("size") is { } arg
                    ? new Fix($"Change the secondary conductors to {w}", [Fixes.EditBuilder.Replace(arg, w.ToString())])
                    : null;
                Findings.Add(new Finding(FindingCodes.SecondaryConductorsUndersized, Parser.Diagnostics.Severity.Error, f.Wire?.Range ?? f.Header.Range,
                    $"secondary conductors of {Format.Amps(ampacity)} ampacity; {sc.Subsection} asks at least {Format.Amps(decimal.Round(min, 1))}"
                    + (size is { } s ? $": use {s}" : ""), fix));
            }
        }

        /// <summary>
        /// A transformer device above its Table 450.3(B) limit: the largest standard rating (240.6(A)) at or
        /// under the limit is the one right value (the limit itself where Note 1 already made it standard).
        /// </summary>
        private static Fix? LargestStandard(Statement? statement, ProtectiveDevice? device, decimal limit, string what)
        {
            var fuse = MotorLang.Sizing.Rules.ShortCircuitProtection.IsFuse(device ?? ProtectiveDevice.InverseTimeBreaker);
            if (statement?.Arg("rating") is not { } arg || StandardRatings.AtOrBelow(limit, fuse) is not { } rating) return null;
            return new Fix($"Change the {what} to {Format.Amps(rating)}", [Fixes.EditBuilder.Replace(arg, $"{Format.Number(rating)}A")]);
        }

        private void Check(MotorResult m)
        {
            if (!Results.TryGetValue(m.Motor.Feeder, out var fault)) return;
            var tag = m.Tag;
            if (Own(m.Motor, static n => n.Interrupting) is { } ir)
                CheckRating(ir, fault.Bus, FindingCodes.InterruptingTooLow, $"{tag}'s branch protective device: interrupting rating", "110.9");
            if (Own(m.Motor, static n => n.Sccr) is { } sccr)
                CheckRating(sccr, fault.Bus, FindingCodes.ControllerSccrTooLow,
                    $"{tag}'s {(m.StartingMethod == StartingMethod.Drive ? "drive" : "controller")}: short-circuit current rating", "110.10, 430.8");
        }

        /// <summary>A rating on the motor or, through 'like', on the motor it copies (then placed on the 'like' line).</summary>
        private Located<Parser.Values.Quantity>? Own(MotorNode motor, Func<MotorNode, Located<Parser.Values.Quantity>?> get) =>
            _likes.Get(motor, get) is not { } found ? null
            : found.Owner == motor ? found.Value : new Located<Parser.Values.Quantity>(found.Value.Value, motor.Like!.Range);

        private void CheckRating(Located<Parser.Values.Quantity> rating, FaultPoint at, string code, string what, string rule)
        {
            if (at.WithMotors.Value is not { } available || at.Bolted.Value is not { } bolted) return;
            var amps = rating.Value.Value * 1000m;
            if (amps >= available) return;
            var message = at.BelowSinglePhaseTransformer
                ? $"{what} {Format.Number(rating.Value.Value)} kA is below the {FaultCurrent.KiloAmps(available)} {at.Name} is held to: {Format.Number(FaultCurrent.LineToNeutralMultiple)} × its {FaultCurrent.KiloAmps(bolted)} line-to-line fault current as a line-to-neutral bound, plus the motors' share ({rule})"
                : $"{what} {Format.Number(rating.Value.Value)} kA is below the {FaultCurrent.KiloAmps(available)} available at {at.Name} "
                          + (amps >= bolted
                              ? $"with the motors' contribution ({FaultCurrent.KiloAmps(bolted)} from the source alone; the motor share ≈ 4 × FLC is an approximation)"
                              : $"({FaultCurrent.KiloAmps(bolted)} from the source alone)")
                          + $" ({rule})";
            Findings.Add(new Finding(code, Parser.Diagnostics.Severity.Error, rating.Range, message));
        }
    }
}
