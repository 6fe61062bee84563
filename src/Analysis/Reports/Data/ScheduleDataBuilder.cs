using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Sizing;

namespace MotorLang.Analysis.Reports.Data;

/// <summary>Builds the typed schedule of one analysed document, in line order.</summary>
public static class ScheduleDataBuilder
{
    /// <param name="file">How the caller names the document (a path); Analysis itself knows no files.</param>
    public static ScheduleData Of(AnalysisResult analysis, string? file = null) => Of(analysis, line => (file, line));

    /// <summary>
    /// The typed schedule of an analysis whose lines come from several files (a plant's joined
    /// analysis): <paramref name="locate"/> gives the file and 0-based line in it of each analysed
    /// line, so every row and finding names its own file and line.
    /// </summary>
    public static ScheduleData Of(AnalysisResult analysis, Func<int, (string? File, int Line)> locate)
    {
        // Findings by line, once, so each row collects its own lines' findings: linear in the list's size.
        var byLine = new Dictionary<int, List<Finding>>();
        foreach (var f in analysis.Findings)
        {
            if (!byLine.TryGetValue(f.Range.Start.Line, out var list)) byLine[f.Range.Start.Line] = list = [];
            list.Add(f);
        }

        var model = analysis.Parse.Model;
        var motors = analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index)
            .Select(m => Motor(m, model, locate(m.Motor.Header.Line.Index), FindingsOn(byLine, m.Motor.Header.Line.Index, m.Motor.LastLine, locate), analysis.Power)).ToList();
        var feeders = analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index)
            .Select(f => Feeder(f, locate(f.Feeder.Header.Line.Index), FindingsOn(byLine, f.Feeder.Header.Line.Index, f.Feeder.LastOwnLine, locate), analysis.Power)).ToList();
        return new ScheduleData(ScheduleData.CurrentFormatVersion, TitleBlocks.Of(model), motors, feeders);
    }

    private static MotorData Motor(MotorResult m, MotorList model, (string? File, int Line) at, IReadOnlyList<RowFinding> findings, Power.FaultStudy power)
    {
        var node = m.Motor;
        T? Own<T>(Func<MotorNode, Located<T>?> get) where T : struct => Likes.Get(node, model, get) is { } v ? v.Value.Value : null;
        var missing = new List<NotComputed>();
        var fireMinimum = Value(m.FirePumpMinimumProtection, "minimumProtection", missing);
        var maximum = Value(m.MaximumProtection, "maximumProtection", missing);
        if (maximum is { } max && m.Device == ProtectiveDevice.InstantaneousTripBreaker) maximum = decimal.Floor(max); // a setting at or below the limit
        var disconnect = m.Disconnect?.Value;
        if (m.Disconnect is { Unavailable: { } why }) missing.Add(new NotComputed("disconnect", why));
        var row = new MotorData
        {
            File = at.File,
            Line = at.Line + 1,
            Feeder = node.Feeder.Tag?.Value ?? "",
            Tag = m.Tag,
            Description = node.Description?.Value ?? "",
            Quantity = m.Quantity,
            Kind = node.IsCompressor ? "compressor" : "motor",
            Power = node.Power is { } p ? Measure.Written(p.Value) : null,
            RatedLoadCurrent = Own(n => n.RatedLoad) is { } rla ? Measure.Written(rla) : null,
            SelectionCurrent = Own(n => n.SelectionCurrent) is { } bcsc ? Measure.Written(bcsc) : null,
            LockedRotorCurrent = Own(n => n.LockedRotorCurrent) is { } lra ? Measure.Written(lra) : null,
            MinimumCircuitAmpacity = Own(n => n.MinimumAmpacity) is { } mca ? Measure.Written(mca) : null,
            MarkedMaximumProtection = Own(n => n.MarkedMaximumProtection) is { } mop ? Measure.Written(mop) : null,
            Volts = m.Volts > 0 ? Measure.Of(m.Volts, Measure.Volts) : null,
            RatedVolts = m.RatedVolts > 0 ? Measure.Of(m.RatedVolts, Measure.Volts) : null,
            Phases = m.Volts > 0 ? (int)m.Phases : null,
            StartingMethod = Word(Keywords.StartingMethods, m.StartingMethod),
            NameplateCurrent = Own(n => n.Nameplate) is { } np ? Measure.Written(np) : null,
            ServiceFactor = Own(n => n.ServiceFactor),
            CodeLetter = Own(n => n.CodeLetter)?.ToString(),
            Design = Own(n => n.Design)?.ToString(),
            FullLoadCurrent = Measure.Of(Value(m.FullLoadCurrent, "fullLoadCurrent", missing), Measure.Amps),
            RequiredAmpacity = Measure.Of(Value(m.RequiredAmpacity, "requiredAmpacity", missing), Measure.Amps),
            MinimumWire = Value(m.MinimumWire, "minimumWire", missing)?.ToString(),
            Wire = m.Wire?.ToString(),
            WireAmpacity = Measure.Of(Value(m.WireAmpacity, "wireAmpacity", missing), Measure.Amps),
            LeadsRequiredAmpacity = Measure.Of(Value(m.LeadAmpacity, "leadsRequiredAmpacity", missing), Measure.Amps),
            MinimumLeads = Value(m.MinimumLeads, "minimumLeads", missing)?.ToString(),
            Leads = m.Leads?.ToString(),
            CapacitorRatedCurrent = Measure.Of(Value(m.CapacitorRatedCurrent, "capacitorRatedCurrent", missing), Measure.Amps),
            CapacitorWireRequiredAmpacity = Measure.Of(Value(m.CapacitorRequiredAmpacity, "capacitorWireRequiredAmpacity", missing), Measure.Amps),
            MinimumCapacitorWire = Value(m.MinimumCapacitorWire, "minimumCapacitorWire", missing)?.ToString(),
            CapacitorWire = m.CapacitorWire?.ToString(),
            ControlConductorLimit = Measure.Of(Value(m.ControlConductorLimit, "controlConductorLimit", missing), Measure.Amps),
            ControlPrimaryLimit = Measure.Of(Value(m.ControlPrimaryLimit, "controlPrimaryLimit", missing), Measure.Amps),
            OverloadUnitsRequired = m.OverloadUnitsRequired?.Value,
            ProtectionDevice = m.DeviceUnknown ? "" : Word(Keywords.Devices, m.Device),
            MaximumProtection = fireMinimum is null ? Measure.Of(maximum, Measure.Amps) : null,
            MinimumProtection = Measure.Of(fireMinimum, Measure.Amps),
            Protection = Measure.Of(m.ProtectionRating, Measure.Amps),
            OverloadLimit = Measure.Of(Value(m.OverloadLimit, "overloadLimit", missing), Measure.Amps),
            Overload = Measure.Of(m.Overload, Measure.Amps),
            ProtectedBy = m.ProtectedByGroup ? node.Feeder.Tag?.Value : null,
            TapRequiredAmpacity = Measure.Of(Value(m.TapAmpacity, "tapRequiredAmpacity", missing), Measure.Amps),
            DisconnectMinimumCurrent = Measure.Of(disconnect?.MinimumAmps, Measure.Amps),
            DisconnectMinimumPower = Measure.Of(disconnect?.MinimumHorsepower, Measure.Horsepower),
            StarterSize = m.NemaStarterSize,
            MinimumGround = Value(m.MinimumGround, "minimumGround", missing)?.ToString(),
            Ground = m.Ground?.ToString(),
            MinimumConduit = Value(m.MinimumConduit, "minimumConduit", missing)?.ToString(),
            Conduit = Own(n => n.Conduit) is { } c ? Parser.Values.Quantity.Number(c.Value) : null,
            ConduitFill = Measure.Of(m.ConduitFillPercent, Measure.Percent),
            Length = Own(n => n.Length) is { } l ? Measure.Written(l) : null,
            BranchVoltageDrop = Measure.Of(Value(m.BranchDrop, "branchVoltageDrop", missing)?.Percent, Measure.Percent),
            TotalVoltageDrop = Measure.Of(m.TotalDropPercent, Measure.Percent),
            FaultCurrent = Fault(power, power.AtController(node), missing, p => p.Bolted),
            FaultCurrentWithMotors = Fault(power, power.AtController(node), null, p => p.WithMotors),
            FaultXOverR = XOverR(power.AtController(node)),
            Status = Status(findings),
            Findings = findings,
            NotComputed = missing,
            RulesApplied = Coverage.RulesApplied.Of(m),
            NotChecked = NotCheckedNote.Of(Coverage.NotChecked.For(m, power)),
        };
        return row;
    }

    private static FeederData Feeder(FeederResult f, (string? File, int Line) at, IReadOnlyList<RowFinding> findings, Power.FaultStudy power)
    {
        var node = f.Feeder;
        var missing = new List<NotComputed>();
        var fireMinimum = Value(f.FirePumpMinimumProtection, "minimumProtection", missing);
        var maximum = Value(f.MaximumProtection, "maximumProtection", missing);
        return new FeederData
        {
            File = at.File,
            Line = at.Line + 1,
            Tag = f.Tag,
            Description = node.Description?.Value ?? "",
            From = node.From?.Value,
            Volts = f.Volts > 0 ? Measure.Of(f.Volts, Measure.Volts) : null,
            Phases = f.Volts > 0 ? (int)f.Phases : null,
            MotorCount = node.Motors.Count,
            CalculatedLoad = Measure.Of(f.CalculatedLoad, Measure.Amps),
            RequiredAmpacity = Measure.Of(Value(f.RequiredAmpacity, "requiredAmpacity", missing), Measure.Amps),
            MinimumWire = Value(f.MinimumWire, "minimumWire", missing)?.ToString(),
            Wire = f.Wire?.ToString(),
            WireAmpacity = Measure.Of(Value(f.WireAmpacity, "wireAmpacity", missing), Measure.Amps),
            ProtectionDevice = node.Protection is { } d ? Word(Keywords.Devices, d.Value) : "",
            MaximumProtection = fireMinimum is null ? Measure.Of(maximum, Measure.Amps) : null,
            MinimumProtection = Measure.Of(fireMinimum, Measure.Amps),
            Protection = Measure.Of(f.ProtectionRating, Measure.Amps),
            MinimumGround = Value(f.MinimumGround, "minimumGround", missing)?.ToString(),
            Ground = f.Ground?.ToString(),
            MinimumConduit = Value(f.MinimumConduit, "minimumConduit", missing)?.ToString(),
            Conduit = node.Conduit is { } c ? Parser.Values.Quantity.Number(c.Value.Value) : null,
            ConduitFill = Measure.Of(f.ConduitFillPercent, Measure.Percent),
            Length = node.Length is { } l ? Measure.Written(l.Value) : null,
            VoltageDrop = Measure.Of(Value(f.Drop, "voltageDrop", missing)?.Percent, Measure.Percent),
            TotalVoltageDrop = Measure.Of(f.CumulativeDropPercent, Measure.Percent),
            FaultCurrent = Fault(power, power.Feeders.GetValueOrDefault(node)?.Bus, missing, p => p.Bolted),
            FaultCurrentWithMotors = Fault(power, power.Feeders.GetValueOrDefault(node)?.Bus, null, p => p.WithMotors),
            FaultXOverR = XOverR(power.Feeders.GetValueOrDefault(node)?.Bus),
            SuppliesFirePump = f.SuppliesFirePump,
            BranchGroup = node.BranchGroup is { } g ? Word(Keywords.BranchGroupKinds, g.Value) : null,
            DemandFactor = node.DemandPermission is not null && node.DemandFactor is { } df ? Measure.Of(df.Value.Value, Measure.Percent) : null,
            DisconnectMinimumCurrent = Measure.Of(Value(f.Disconnect, "disconnectMinimumCurrent", missing)?.MinimumAmps, Measure.Amps),
            DisconnectMinimumPower = Measure.Of(f.Disconnect?.Value?.MinimumHorsepower, Measure.Horsepower),
            Status = Status(findings),
            Findings = findings,
            NotComputed = missing,
            RulesApplied = Coverage.RulesApplied.Of(f),
            NotChecked = NotCheckedNote.Of(Coverage.NotChecked.For(f, power)),
        };
    }

    /// <summary>
    /// A fault current in kA at a point. Only a list with a 'source' asks for one, so only then is a
    /// value that could not be worked out noted with its reason (under "faultCurrent").
    /// </summary>
    private static Measure? Fault(Power.FaultStudy power, Power.FaultPoint? at, List<NotComputed>? missing, Func<Power.FaultPoint, Result<decimal>> value)
    {
        if (!power.HasSource || at is null) return null;
        var r = value(at);
        if (r.Value is { } amps) return Measure.Of(amps / 1000m, Measure.KiloAmps);
        if (missing is not null && r.Unavailable is { } why) missing.Add(new NotComputed("faultCurrent", why));
        return null;
    }

    private static decimal? XOverR(Power.FaultPoint? at) => at?.XOverR is { } k ? decimal.Round(k, 4) : null;

    /// <summary>A result's value; when it was attempted but could not be worked out, its reason is noted under the field's name.</summary>
    private static T? Value<T>(Result<T>? r, string field, List<NotComputed> missing) where T : struct
    {
        if (r is { Value: null, Unavailable: { } why }) missing.Add(new NotComputed(field, why));
        return r?.Value;
    }

    private static List<RowFinding> FindingsOn(Dictionary<int, List<Finding>> byLine, int first, int last, Func<int, (string? File, int Line)> locate)
    {
        var found = new List<RowFinding>();
        for (var line = first; line <= last; line++)
        {
            if (!byLine.TryGetValue(line, out var list)) continue;
            var own = locate(line).Line + 1;
            found.AddRange(list.Select(f => new RowFinding(f.Code, SeverityName(f.Severity), own, f.Message)));
        }

        return found;
    }

    private static string Status(IReadOnlyList<RowFinding> findings) =>
        findings.Any(f => f.Severity == "error") ? "errors" : findings.Any(f => f.Severity == "warning") ? "warnings" : "ok";

    public static string SeverityName(Severity s) => s switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "information",
    };

    /// <summary>An enumerated value in the word the list uses for it, so machine output reads like the source.</summary>
    private static string Word(IReadOnlyList<WordChoice> choices, object value) =>
        choices.FirstOrDefault(c => c.Value.Equals(value))?.Canonical ?? value.ToString()!;
}
