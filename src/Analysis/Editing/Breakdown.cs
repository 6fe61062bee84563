using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;
using MotorLang.Domain;

namespace MotorLang.Analysis.Editing;

/// <summary>One part of a hover: a heading, the calculation steps, and how the written value compares.</summary>
public sealed record BreakdownSection(string Heading, IReadOnlyList<Step> Steps, string? Verdict = null);

/// <summary>
/// What to show for a position: a title, the sections that explain it, and, for a whole motor or
/// feeder, the rules it applied and those it did not check.
/// </summary>
public sealed record BreakdownView(string Title, IReadOnlyList<BreakdownSection> Sections, SourceRange Range, CircuitCoverage? Coverage = null);

/// <summary>
/// The calculation behind whatever is under the cursor: a motor's whole sizing on its header, one
/// quantity on its own line (wire, protection, overload...), a feeder's totals on the feeder.
/// </summary>
public static class Breakdown
{
    public static BreakdownView? At(AnalysisResult analysis, TextPosition position)
    {
        var lines = analysis.Parse.Tree.Lines;
        if (position.Line >= lines.Length) return null;
        var line = lines[position.Line];
        var range = line.Statement?.Range ?? SourceRange.OnLine(position.Line, 0, line.Length);
        var keyword = line.Statement?.Keyword;

        // The block under the cursor by binary search over the ordered blocks, then its result by
        // key: a hover costs the same at 100 motors and at 100,000.
        var block = analysis.Parse.Model.BlockAt(position.Line);
        if (block is MotorNode motorNode && analysis.Motors.TryGetValue(motorNode, out var motor))
        {
            var whole = keyword is "motor" or "compressor";
            var dip = analysis.Power.Dips.GetValueOrDefault(motor.Motor);
            var all = MotorSections(motor, dip is null);
            if (dip is not null) all = all.Append(DipSection.Of(dip));
            // With no 'source' at all there is nothing to show but the reason, which the "Not checked" list gives (110.24).
            if (analysis.Power.HasSource && analysis.Power.AtController(motor.Motor) is { } bus) all = all.Concat(FaultSections.ForMotor(motor.Motor, bus));
            if (analysis.Power.Taps.GetValueOrDefault(motor.Motor) is { } tap) all = all.Append(TapSection.Of(tap));
            var sections = whole ? all.ToList() : all.Where(s => Belongs(s.Heading, keyword)).ToList();
            if (sections.Count == 0)
            {
                sections = all.ToList();
                whole = true;
            }

            // A single line's hover explains that line; the whole motor's says what was and was not checked.
            var title = motor.IsCompressor ? $"{motor.Tag} — motor-compressor (Article 440)" : $"{motor.Tag} — {motor.Motor.Power?.Value} motor";
            return new BreakdownView(title, sections, range, whole ? CircuitCoverage.For(motor, analysis.Power) : null);
        }

        if (block is FeederNode feederNode && position.Line <= feederNode.LastOwnLine && analysis.Feeders.TryGetValue(feederNode, out var feeder))
        {
            var sections = FeederSections(feeder);
            if (analysis.Power.HasSource && analysis.Power.Feeders.GetValueOrDefault(feeder.Feeder) is { } fault) sections = sections.Concat(FaultSections.ForFeeder(fault));
            return new BreakdownView($"{feeder.Tag} — feeder, {Format.Amps(feeder.CalculatedLoad)} running load", sections.ToList(), range,
                CircuitCoverage.For(feeder, analysis.Power));
        }

        if (keyword == "source" && analysis.Power.Service is { } service)
            return new BreakdownView("Source — available fault current at the service", [FaultSections.ForService(service)], range);
        return null;
    }

    /// <summary>The results of the motors whose headers are on the given lines, in line order, found without scanning the list (inlay hints for the visible window).</summary>
    public static IEnumerable<MotorResult> MotorsOnLines(AnalysisResult analysis, int first, int last)
    {
        foreach (var node in analysis.Parse.Model.MotorsBetween(first, last))
        {
            if (analysis.Motors.TryGetValue(node, out var result)) yield return result;
        }
    }

    /// <summary>Which sections a statement line shows.</summary>
    private static bool Belongs(string heading, string? keyword) => keyword switch
    {
        "wire" or "conductor" or "ambient" or "ccc" => heading is "Full-load current" or CompressorCurrent or "Branch conductors" || heading.StartsWith("Written wire", StringComparison.Ordinal),
        "protection" or "hard-start" or "max-protection" => heading is "Full-load current" or CompressorCurrent or "Short-circuit and ground-fault protection",
        "rated-load" or "selection-current" => heading is CompressorCurrent or "Branch conductors" or "Short-circuit and ground-fault protection" or "Disconnecting means",
        "min-ampacity" => heading == "Branch conductors",
        "locked-rotor" => heading is "Short-circuit and ground-fault protection" or "Locked-rotor current" or "Disconnecting means" or FirePumpVoltageHeading,
        "drive-overload" => heading == "Overload",
        "capacitor" => heading is "Capacitor conductors" or "Overload",
        "capacitor-wire" => heading == "Capacitor conductors",
        "improved-current" => heading == "Overload",
        "control-wire" or "control-protection" => heading is ControlConductors or ControlTransformer,
        "control-transformer" or "control-primary-protection" => heading is ControlTransformer or ControlConductors,
        "overload-units" => heading == OverloadUnitsHeading,
        "manual-start" => heading == "Overload",
        "motor-leads" => heading == "Branch conductors",
        "drive-bypass" => heading == "Branch conductors",
        "drive-max-protection" => heading == "Short-circuit and ground-fault protection",
        "overload" or "nameplate" or "service-factor" or "temp-rise" => heading is "Full-load current" or "Overload",
        "ground" => heading == "Grounding conductor",
        "length" or "drop-limit" or "power-factor" => heading is "Voltage drop" or FirePumpVoltageHeading,
        "disconnect" => heading == "Disconnecting means",
        "controller" => heading == "Controller",
        "conduit" or "raceway" => heading == "Conduit",
        "code-letter" or "design" => heading == "Locked-rotor current",
        "sccr" or "interrupting" => heading.StartsWith(FaultSections.Heading, StringComparison.Ordinal),
        "tap" => heading == TapSection.Heading,
        "dip-limit" => heading == DipSection.Heading,
        _ => true,
    };

    /// <summary>
    /// The conductors from the controller or drive to the motor (430.22(C), (D), 430.122(B)), shown with the
    /// branch conductors: the requirement, then the leads as written or taken to be the branch wire, with the verdict.
    /// </summary>
    private static IEnumerable<Step> LeadSteps(MotorResult m)
    {
        if (m.LeadAmpacity is not { Value: { } needed } leads) yield break;
        var requirement = leads.Steps[0];
        if (m.Leads is not { } wire || m.LeadsAmpacity?.Value is not { } carries)
        {
            yield return requirement;
            if (m.MinimumLeads?.Value is { } minimum)
                yield return new Step("Minimum motor leads", minimum.ToString(), requirement.Rule, $"smallest size that carries {Format.Amps(needed)}");
            yield break;
        }

        // One row: the requirement with its verdict on the leads (as written, or the branch wire they are taken to be).
        var verdict = (carries >= needed ? "✓ " : "✗ ") + $"{wire}{(m.LeadsWritten ? "" : " (branch wire)")} carries {Format.Amps(carries)}";
        yield return requirement with { Note = $"{requirement.Short}; {verdict}" };
    }

    /// <summary>A motor's whole calculation, section by section (the hover on its header; the report's calculation sheet).</summary>
    /// <param name="branchStartingDrop">False where the starting dip from the system's impedance replaces the branch-only starting drop.</param>
    public static IEnumerable<BreakdownSection> MotorSections(MotorResult m, bool branchStartingDrop = true)
    {
        yield return new BreakdownSection(m.IsCompressor ? CompressorCurrent : "Full-load current", m.FullLoadCurrent.Steps, m.FullLoadCurrent.Unavailable);
        if (m.RequiredAmpacity is { } req)
        {
            yield return new BreakdownSection("Branch conductors", req.Steps.Concat(m.MinimumWire?.Steps ?? []).Concat(LeadSteps(m)).ToList(), req.Unavailable);
            if (m.Wire is { } w && m.WireAmpacity is { Value: { } allowable } written && req.Value is { } needed)
                yield return new BreakdownSection($"Written wire {w}", written.Steps, allowable >= needed
                    ? $"✓ {w} carries {Format.Amps(allowable)} ≥ {Format.Amps(needed)}"
                    : $"✗ {w} carries only {Format.Amps(allowable)}; {Format.Amps(needed)} is required");
        }

        if (m.TapAmpacity is { Value: { } tap } taps)
            yield return new BreakdownSection("Tap conductors", taps.Steps,
                m.Wire is { } tw && m.WireAmpacity?.Value is { } ta ? (ta >= tap ? $"✓ {tw} carries {Format.Amps(ta)} ≥ {Format.Amps(tap)}" : $"✗ {tw} carries only {Format.Amps(ta)}; {Format.Amps(tap)} is required") : null);

        if (m.FirePumpMinimumProtection is { } fireMin)
            yield return new BreakdownSection("Short-circuit and ground-fault protection", fireMin.Steps,
                fireMin.Unavailable ?? (m.FirePumpListedDevice ? "✓ listed for fire pump service; its curve was not checked" : Compare(m.ProtectionRating, fireMin.Value, "rating", atMost: false)));
        else if (m.MaximumProtection is { } max)
            yield return new BreakdownSection("Short-circuit and ground-fault protection", max.Steps.Concat(m.SmallMotorCircuitAllowance?.Steps ?? []).ToList(),
                m.SmallMotorCircuitAllowance is { } allowance
                    ? Compare(m.ProtectionRating, allowance.Value, "rating", atMost: true) + " (430.32(D)(2)(a) Exception)"
                    : Compare(m.ProtectionRating, max.Value, "rating", atMost: true));
        if (m.FireService == FireServiceRole.FirePump && m.NoOverloadRequired is { } none)
            yield return new BreakdownSection("Overload", none.Steps,
                m.Overload is { } written ? $"✗ an overload of {Format.Amps(written)} is written" : "✓ none written");
        if (m.OverloadLimit is { } ol)
            yield return new BreakdownSection("Overload", ol.Steps.Concat(m.OverloadAbsoluteLimit?.Steps.Skip(1) ?? []).Concat(m.NoOverloadRequired?.Steps ?? []).ToList(),
                ol.Unavailable ?? (m.Overload is null && m.NoOverloadRequired is not null
                    ? "✓ none written; the branch device may serve (430.32(D)(2)(a))"
                    : Compare(m.Overload, ol.Value, "setting", atMost: true)));
        if (m.OverloadUnitsRequired is { Value: { } unitsNeeded } units && m.OverloadUnits is { } unitsWritten)
            yield return new BreakdownSection(OverloadUnitsHeading, units.Steps,
                unitsWritten >= unitsNeeded ? $"✓ {unitsWritten} written, at least {unitsNeeded}" : $"✗ {unitsWritten} written; {unitsNeeded} required");
        if (m.CapacitorRatedCurrent is { } cap)
            yield return new BreakdownSection("Capacitor conductors",
                cap.Steps.Concat(m.CapacitorRequiredAmpacity?.Steps ?? []).Concat(m.MinimumCapacitorWire?.Steps ?? []).ToList(),
                cap.Unavailable ?? (m.CapacitorWire is { } cw && m.CapacitorWireAmpacity?.Value is { } ca && m.CapacitorRequiredAmpacity?.Value is { } cr
                    ? (ca >= cr ? $"✓ {cw} carries {Format.Amps(ca)} ≥ {Format.Amps(cr)}" : $"✗ {cw} carries only {Format.Amps(ca)}; {Format.Amps(cr)} is required")
                    : null));
        if (m.ControlConductorLimit is { } control)
            yield return new BreakdownSection(ControlConductors, control.Steps,
                control.Unavailable ?? (m.ControlConductorDevice is { } device && control.Value is { } most
                    ? (device <= most ? $"✓ {Format.Amps(device)} protects them, within {Format.Amps(most)}" : $"✗ {Format.Amps(device)} protects them; at most {Format.Amps(most)}")
                    : null));
        if (m.ControlPrimaryLimit is { } primary)
            yield return new BreakdownSection(ControlTransformer, primary.Steps.Concat(m.ControlSecondaryLimit?.Steps ?? []).ToList(),
                Compare(m.ControlPrimaryDevice, primary.Value, "primary device", atMost: true) ?? "no primary device written");
        if (m.MinimumGround is { } g)
            yield return new BreakdownSection("Grounding conductor", g.Steps,
                m.Ground is { } written && g.Value is { } min ? (written >= min ? $"✓ {written} ≥ {min}" : $"✗ {written} is smaller than {min}") : null);
        if (m.Disconnect is { } d) yield return new BreakdownSection("Disconnecting means", d.Steps, d.Unavailable);
        if (m.Controller is { } c) yield return new BreakdownSection("Controller", c.Steps.Concat(m.NemaStarter?.Steps ?? []).ToList());
        if (m.BranchDrop is { } vd)
            yield return new BreakdownSection("Voltage drop", vd.Steps.Concat(branchStartingDrop ? m.StartingDrop?.Steps ?? [] : []).ToList(),
                m.TotalDropPercent is { } total ? $"feeders and branch together: {total:0.##} %" : null);
        if (m.FirePumpVoltage is { } fpv)
            yield return new BreakdownSection(FirePumpVoltageHeading, fpv.Steps, fpv.Unavailable ?? (fpv.Value is { } v
                ? $"{Within("starting", v.StartingPercent, v.StartingLimitPercent)} · {Within("running", v.RunningPercent, v.RunningLimitPercent)}"
                : null));
        if (m.MinimumConduit is { } conduit)
            yield return new BreakdownSection("Conduit", conduit.Steps,
                m.ConduitFillPercent is { } fill ? $"{(fill <= 40 ? "✓" : "✗")} the written conduit is {fill:0.#} % full" : conduit.Unavailable);
        var lr = (m.LockedRotorFromCodeLetter?.Steps ?? []).Concat(m.LockedRotorTableMaximum?.Steps ?? [])
            .Concat(m.FireService == FireServiceRole.PressureMaintenance ? m.FirePumpLockedRotor?.Steps ?? [] : []).ToList();
        if (lr.Count > 0) yield return new BreakdownSection("Locked-rotor current", lr);
    }

    /// <summary>A feeder's whole calculation, section by section.</summary>
    public static IEnumerable<BreakdownSection> FeederSections(FeederResult f)
    {
        if (f.RequiredAmpacity is { } req)
        {
            string? verdict = null;
            if (f.Wire is { } w && f.WireAmpacity?.Value is { } allowable && req.Value is { } needed)
                verdict = allowable >= needed ? $"✓ {w} carries {Format.Amps(allowable)} ≥ {Format.Amps(needed)}" : $"✗ {w} carries only {Format.Amps(allowable)}";
            yield return new BreakdownSection("Feeder conductors", req.Steps.Concat(f.MinimumWire?.Steps ?? []).ToList(), verdict);
        }

        if (f.FirePumpMinimumProtection is { } fireMin)
            yield return new BreakdownSection("Feeder protection", fireMin.Steps,
                fireMin.Unavailable ?? (f.Feeder.ProtectionListed is not null ? "✓ listed for fire pump service; its curve was not checked" : Compare(f.ProtectionRating, fireMin.Value, "rating", atMost: false)));
        if (f.MaximumProtection is { } max)
            yield return new BreakdownSection(f.BranchGroup is null ? "Feeder protection" : "Branch circuit protection (several motors)", max.Steps,
                Compare(f.ProtectionRating, max.Value, "rating", atMost: true) ?? max.Unavailable);
        if (f.Disconnect is { } d) yield return new BreakdownSection("Disconnecting means (several motors)", d.Steps, d.Unavailable);
        if (f.MinimumGround is { } g) yield return new BreakdownSection("Grounding conductor", g.Steps);
        if (f.Drop is { } vd)
            yield return new BreakdownSection("Voltage drop", vd.Steps, f.CumulativeDropPercent is { } c ? $"from the source: {c:0.##} %" : null);
    }

    private const string FirePumpVoltageHeading = "Fire pump voltage (NEC 695.7)";

    private const string ControlConductors = "Control conductors";

    private const string ControlTransformer = "Control transformer";

    private const string OverloadUnitsHeading = "Overload units";

    private const string CompressorCurrent = "Motor-compressor current";

    private static string Within(string what, decimal percent, decimal limit) =>
        percent <= limit ? $"✓ {what} {percent:0.##} % within {limit:0.##} %" : $"✗ {what} {percent:0.##} % above {limit:0.##} %";

    private static string? Compare(decimal? written, decimal? limit, string what, bool atMost)
    {
        if (written is not { } w || limit is not { } l) return null;
        if (!atMost) return w >= l ? $"✓ the written {what} {Format.Amps(w)} is at least {Format.Amps(l)}" : $"✗ the written {what} {Format.Amps(w)} is below the minimum {Format.Amps(l)}";
        return atMost && w <= l ? $"✓ the written {what} {Format.Amps(w)} is within {Format.Amps(l)}" : $"✗ the written {what} {Format.Amps(w)} exceeds {Format.Amps(l)}";
    }

    /// <summary>The short values shown at the end of a motor's header line.</summary>
    public static string? InlaySummary(MotorResult m, bool flc, bool wire)
    {
        var parts = new List<string>();
        if (flc && m.FullLoadCurrent.Value is { } amps) parts.Add($"FLC {Format.Amps(amps)}");
        if (wire && m.MinimumWire?.Value is { } w) parts.Add($"min {w}");
        if (m.MaximumProtection?.Value is { } p && flc) parts.Add($"max {Format.Amps(p)}");
        if (m.FirePumpMinimumProtection?.Value is { } fp && flc) parts.Add($"min {Format.Amps(fp)} (fire pump)");
        return parts.Count == 0 ? null : string.Join(" · ", parts);
    }

    /// <summary>The feeder totals shown above a feeder, and with a 'source' the fault current at its bus (with the motors' share, what ratings are checked against).</summary>
    public static string FeederSummary(FeederResult f, Power.FaultStudy? power = null) =>
        string.Join(" · ", new[]
        {
            $"load {Format.Amps(f.CalculatedLoad)}",
            f.MinimumWire?.Value is { } w ? $"min wire {w}" : null,
            f.MaximumProtection?.Value is { } p ? $"max protection {Format.Amps(p)}" : null,
            f.FirePumpMinimumProtection?.Value is { } fp ? $"min protection {Format.Amps(fp)} (fire pump)" : null,
            power is { HasSource: true } && power.Feeders.GetValueOrDefault(f.Feeder)?.Bus is { } bus
                ? bus.WithMotors.Value is { } available
                    ? $"fault {MotorLang.Sizing.Rules.Faults.FaultCurrent.KiloAmps(available)} with motors, X/R {(bus.XOverR is { } k ? Format.Number(decimal.Round(k, 1)) : "—")}"
                    : "fault current not worked out"
                : null,
        }.OfType<string>());
}
