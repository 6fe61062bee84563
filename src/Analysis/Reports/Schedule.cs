using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Sizing;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;
using MotorLang.Sizing.Tables;

namespace MotorLang.Analysis.Reports;

/// <summary>One schedule row: computed and specified values side by side, as text ready to print.</summary>
public sealed record ScheduleRow(
    string Feeder, string Tag, string Description, string Power, string Volts, string Flc,
    string MinimumWire, string Wire, string MaximumProtection, string Protection, string OverloadLimit, string Overload,
    string Disconnect, string MinimumGround, string Ground, string VoltageDrop, string Status)
{
    public static readonly string[] Headers =
    [
        "Feeder", "Tag", "Description", "Power", "Volts", "FLC", "Min wire", "Wire", "Max protection", "Protection",
        "Overload limit", "Overload", "Disconnect", "Min ground", "Ground", "Voltage drop", "Status",
    ];

    /// <summary>The code rules this motor's sizing applied (from its steps).</summary>
    public IReadOnlyList<AppliedRule> RulesApplied { get; init; } = [];

    /// <summary>The rules that bear on this motor but that MotorLang does not check.</summary>
    public IReadOnlyList<NotCheckedNote> NotChecked { get; init; } = [];

    public string[] Cells =>
    [
        Feeder, Tag, Description, Power, Volts, Flc, MinimumWire, Wire, MaximumProtection, Protection, OverloadLimit, Overload,
        Disconnect, MinimumGround, Ground, VoltageDrop, Status,
    ];
}

/// <summary>A feeder's totals under its motors.</summary>
public sealed record FeederTotals(string Tag, string Volts, string CalculatedLoad, string RequiredAmpacity, string MinimumWire,
    string Wire, string MaximumProtection, string Protection, string MinimumGround, string Ground, string VoltageDrop)
{
    /// <summary>The code rules this feeder's sizing applied (from its steps).</summary>
    public IReadOnlyList<AppliedRule> RulesApplied { get; init; } = [];

    /// <summary>The rules that bear on this feeder but that MotorLang does not check.</summary>
    public IReadOnlyList<NotCheckedNote> NotChecked { get; init; } = [];

    /// <summary>The available fault current at the feeder's bus, e.g. "13.58 kA + 0.22 motors, X/R 2.1"; empty without a 'source'.</summary>
    public string FaultCurrent { get; init; } = "";
}

/// <summary>A rule not checked on a circuit, as the schedule reports it: the rule, what it covers, and why it is not checked.</summary>
public sealed record NotCheckedNote(string Rule, string Text, string Reason)
{
    public static IReadOnlyList<NotCheckedNote> Of(IReadOnlyList<NotCheckedRule> rules) => rules.Select(r => new NotCheckedNote(r.Rule, r.Text, r.Reason)).ToList();
}

/// <summary>The motor schedule of a document: one row per motor, then each feeder's totals.</summary>
public sealed record Schedule(IReadOnlyList<ScheduleRow> Rows, IReadOnlyList<FeederTotals> Feeders)
{
    /// <summary>The list writes a 'source', so the feeders' fault currents are shown.</summary>
    public bool ShowsFaultCurrent { get; init; }

    public static Schedule Of(AnalysisResult analysis)
    {
        // Findings by line, once: each row reads its own lines, so the schedule is linear in the list.
        var byLine = analysis.Findings.ToLookup(f => f.Range.Start.Line);
        var rows = analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index).Select(m => Row(m, byLine, analysis.Power)).ToList();
        var feeders = analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index).Select(f => Totals(f, analysis.Power)).ToList();
        return new Schedule(rows, feeders) { ShowsFaultCurrent = analysis.Power.HasSource };
    }

    private static ScheduleRow Row(MotorResult m, ILookup<int, Finding> byLine, Power.FaultStudy power)
    {
        var findings = Enumerable.Range(m.Motor.Header.Line.Index, m.Motor.LastLine - m.Motor.Header.Line.Index + 1).SelectMany(l => byLine[l]).ToList();
        var status = findings.Any(f => f.Severity == Parser.Diagnostics.Severity.Error)
            ? string.Join(" ", findings.Where(f => f.Severity == Parser.Diagnostics.Severity.Error).Select(f => f.Code).Distinct())
            : findings.Any(f => f.Severity == Parser.Diagnostics.Severity.Warning) ? "warnings" : "ok";
        return new ScheduleRow(
            m.Motor.Feeder.Tag?.Value ?? "", m.Tag, m.Motor.Description?.Value ?? "",
            m.Motor.Power is { } p ? p.Value.ToString() + (m.Quantity > 1 ? $" ×{m.Quantity}" : "") : m.IsCompressor ? "compressor" + (m.Quantity > 1 ? $" ×{m.Quantity}" : "") : "",
            m.Volts > 0 ? $"{Format.Number(m.Volts)} V" : "",
            Amps(m.FullLoadCurrent),
            // The leads' own sizes are shown where they differ from the branch's (the JSON always carries them).
            Text(m.MinimumWire) + (m.MinimumLeads?.Value is { } ml && ml != m.MinimumWire?.Value ? $"; leads {ml}" : ""),
            (m.Wire?.ToString() ?? "") + (m.LeadsWritten && m.Leads is { } lw && lw != m.Wire ? $"; leads {lw}" : ""),
            Protection(m), m.ProtectionRating is { } pr ? $"{Format.Amps(pr)} {Short(m.Device)}" : "",
            Amps(m.OverloadLimit), m.Overload is { } o ? Format.Amps(o) : "",
            m.Disconnect?.Value is { } d ? $"{Format.Amps(d.MinimumAmps)}, {Numbers.Horsepower(d.MinimumHorsepower)} hp" : "",
            m.MinimumGround?.Value?.ToString() ?? "", m.Ground?.ToString() ?? "",
            m.BranchDrop?.Value is { } drop ? $"{drop.Percent:0.##} %" + (m.TotalDropPercent is { } t && t != drop.Percent ? $" ({t:0.##} % total)" : "") : "",
            status)
        {
            RulesApplied = Coverage.RulesApplied.Of(m),
            NotChecked = NotCheckedNote.Of(Coverage.NotChecked.For(m, power)),
        };
    }

    private static FeederTotals Totals(FeederResult f, Power.FaultStudy power) => new(
        f.Tag, f.Volts > 0 ? $"{Format.Number(f.Volts)} V" : "", Format.Amps(f.CalculatedLoad), Amps(f.RequiredAmpacity),
        Text(f.MinimumWire), f.Wire?.ToString() ?? "", f.FirePumpMinimumProtection?.Value is { } fpMin ? $"≥ {Format.Amps(fpMin)}" : Amps(f.MaximumProtection),
        f.ProtectionRating is { } p ? Format.Amps(p) : "", f.MinimumGround?.Value?.ToString() ?? "", f.Ground?.ToString() ?? "",
        f.Drop?.Value is { } d ? $"{d.Percent:0.##} %" : "")
    {
        RulesApplied = Coverage.RulesApplied.Of(f),
        NotChecked = NotCheckedNote.Of(Coverage.NotChecked.For(f, power)),
        FaultCurrent = Fault(power.HasSource ? power.Feeders.GetValueOrDefault(f.Feeder)?.Bus : null),
    };

    /// <summary>The bolted value, the motors' share apart (an approximation), and X/R; "not worked out" where the study could not.</summary>
    private static string Fault(Power.FaultPoint? at) =>
        at is null ? ""
        : at.Bolted.Value is not { } bolted ? "not worked out"
        : $"{FaultCurrentText(bolted)}{(at.MotorAmps is > 0 and { } m ? $" + {FaultCurrentText(m).Replace(" kA", "")} motors" : "")}, X/R {(at.XOverR is { } k ? Format.Number(decimal.Round(k, 1)) : "—")}";

    private static string FaultCurrentText(decimal amps) => MotorLang.Sizing.Rules.Faults.FaultCurrent.KiloAmps(amps);

    private static string Protection(MotorResult m) =>
        m.ProtectedByGroup ? $"by {m.Motor.Feeder.Tag?.Value}" :
        m.FirePumpMinimumProtection?.Value is { } min ? $"≥ {Format.Amps(min)} {Short(m.Device)}" :
        m.MaximumProtection?.Value is { } max ? $"{Format.Amps(ShortCircuitProtection.IsSetting(m.Device) ? decimal.Floor(max) : max)} {Short(m.Device)}" : "";

    private static string Short(ProtectiveDevice d) => d switch
    {
        ProtectiveDevice.InverseTimeBreaker => "ITB",
        ProtectiveDevice.InstantaneousTripBreaker => "inst.",
        ProtectiveDevice.DualElementFuse => "DE fuse",
        ProtectiveDevice.NonTimeDelayFuse => "NTD fuse",
        ProtectiveDevice.MotorShortCircuitProtector => "MSCP",
        ProtectiveDevice.SelfProtectedController => "self-prot.",
        ProtectiveDevice.SemiconductorFuse => "semi. fuse",
        _ => d.ToString(),
    };

    private static string Amps(Result<decimal>? r) => r?.Value is { } v ? Format.Amps(v) : "";

    private static string Text<T>(Result<T>? r) where T : struct => r?.Value?.ToString() ?? "";
}
