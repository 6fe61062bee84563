using MotorLang.Analysis;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;

namespace MotorLang.Report.Diagram;

/// <summary>What a diagram node stands for; it decides the symbol drawn.</summary>
public enum NodeKind { Source, Feeder, Motor, Load }

/// <summary>
/// One element of the one-line diagram: its kind, a stable id (the tag, or "supply"), the lines of its
/// label (the first is the tag), the device that protects it, the codes of its error and warning findings, and its 1-based line (0 for the supply).
/// </summary>
public sealed record DiagramNode(string Id, NodeKind Kind, IReadOnlyList<string> Lines, ProtectiveDevice? Device, IReadOnlyList<string> Errors,
    IReadOnlyList<string> Warnings, int Line);

/// <summary>A connection from the element that supplies to the element supplied.</summary>
public sealed record DiagramEdge(string From, string To);

/// <summary>
/// The plant as a graph: the supply, every feeder (supplied from its <c>from</c> feeder or the
/// supply), every motor and load under its feeder. Labels carry what a reader looks for on a one-line
/// diagram: conductors, protection and rating.
/// </summary>
public sealed record OneLineGraph(IReadOnlyList<DiagramNode> Nodes, IReadOnlyList<DiagramEdge> Edges)
{
    public const string SupplyId = "supply";

    public static OneLineGraph Of(AnalysisResult analysis)
    {
        var model = analysis.Parse.Model;
        var nodes = new List<DiagramNode>();
        var edges = new List<DiagramEdge>();
        var findings = FindingsByBlock(analysis);
        var volts = analysis.Feeders.Values.Where(f => f.Feeder.From is null && f.Volts > 0).Select(f => $"{Format.Number(f.Volts)} V").Distinct().ToList();
        nodes.Add(new DiagramNode(SupplyId, NodeKind.Source, ["Supply", volts.Count > 0 ? string.Join(", ", volts) : "voltage not written"], null, [], [], 0));

        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { SupplyId };
        foreach (var feeder in model.Feeders)
        {
            var tag = feeder.Tag?.Value;
            // An untagged or duplicate block cannot be told apart on a drawing; the check reports it.
            if (string.IsNullOrEmpty(tag) || !seen.Add(tag)) continue;
            analysis.Feeders.TryGetValue(feeder, out var result);
            nodes.Add(Feeder(feeder, result, findings));
            var from = feeder.From?.Value;
            edges.Add(new DiagramEdge(from is not null && model.Find(from) is FeederNode ? from : SupplyId, tag));
        }

        foreach (var feeder in model.Feeders)
        {
            var feederTag = feeder.Tag?.Value;
            if (string.IsNullOrEmpty(feederTag) || !nodes.Any(n => n.Id == feederTag)) continue;
            foreach (var motor in feeder.Motors)
            {
                var tag = motor.Tag?.Value;
                if (string.IsNullOrEmpty(tag) || !seen.Add(tag) || !analysis.Motors.TryGetValue(motor, out var result)) continue;
                nodes.Add(Motor(result, findings));
                edges.Add(new DiagramEdge(feederTag, tag));
            }

            foreach (var load in feeder.Loads)
            {
                var tag = load.Tag?.Value;
                if (string.IsNullOrEmpty(tag) || !seen.Add(tag)) continue;
                nodes.Add(Load(load, findings));
                edges.Add(new DiagramEdge(feederTag, tag));
            }
        }

        // A 'from' pointing at a feeder that was skipped (or a cycle) would leave an edge to nothing.
        var ids = nodes.Select(n => n.Id).ToHashSet(StringComparer.OrdinalIgnoreCase);
        edges = edges.Select(e => ids.Contains(e.From) ? e : e with { From = SupplyId }).ToList();
        return new OneLineGraph(nodes, BreakCycles(edges));
    }

    private static DiagramNode Feeder(FeederNode feeder, FeederResult? f, Dictionary<int, List<(string Code, Severity Severity)>> findings)
    {
        var lines = new List<string> { feeder.Tag!.Value };
        if (feeder.Description?.Value is { Length: > 0 } d) lines.Add(Labels.Shorten(d));
        if (f is not null)
        {
            lines.Add($"{(f.Volts > 0 ? Format.Number(f.Volts) + " V" : "voltage not written")} {Labels.Phases(f.Phases)} · load {Format.Amps(f.CalculatedLoad)}");
            lines.Add(Labels.Conductors(f.Wire, f.MinimumWire?.Value, f.Ground));
            lines.Add(Labels.Protection(f.ProtectionRating, feeder.Protection?.Value, f.MaximumProtection?.Value, f.FirePumpMinimumProtection?.Value));
        }

        var (errors, warnings) = Codes(findings, feeder.Header.Line.Index, feeder.LastOwnLine);
        return new DiagramNode(feeder.Tag.Value, NodeKind.Feeder, lines, feeder.Protection?.Value, errors, warnings, feeder.Header.Line.Index + 1);
    }

    private static DiagramNode Motor(MotorResult m, Dictionary<int, List<(string Code, Severity Severity)>> findings)
    {
        var motor = m.Motor;
        var power = motor.Power?.Value.ToString() ?? "rating not written";
        var lines = new List<string> { $"{m.Tag}  {power}{(m.Quantity > 1 ? $" ×{m.Quantity}" : "")}" };
        if (motor.Description?.Value is { Length: > 0 } d) lines.Add(Labels.Shorten(d));
        lines.Add(m.FullLoadCurrent.Value is { } flc ? $"FLC {Format.Amps(flc)}{(m.Overload is { } ol ? $" · OL {Format.Amps(ol)}" : "")}" : "FLC not computed");
        lines.Add(Labels.Conductors(m.Wire, m.MinimumWire?.Value, m.Ground));
        lines.Add(Labels.Protection(m.ProtectionRating, m.ProtectionRating is null ? null : m.Device, m.MaximumProtection?.Value, m.FirePumpMinimumProtection?.Value));
        var (errors, warnings) = Codes(findings, motor.Header.Line.Index, motor.LastLine);
        return new DiagramNode(m.Tag, NodeKind.Motor, lines, m.ProtectionRating is null && motor.Protection is null ? null : m.Device, errors, warnings, motor.Header.Line.Index + 1);
    }

    private static DiagramNode Load(LoadNode load, Dictionary<int, List<(string Code, Severity Severity)>> findings)
    {
        var lines = new List<string> { load.Tag!.Value };
        if (load.Description?.Value is { Length: > 0 } d) lines.Add(Labels.Shorten(d));
        var size = load.Current?.Value.ToString() ?? load.ApparentPower?.Value.ToString();
        if (size is not null) lines.Add(size + (load.Continuous ? " continuous" : ""));
        var (errors, warnings) = Codes(findings, load.Header.Line.Index, load.LastLine);
        return new DiagramNode(load.Tag.Value, NodeKind.Load, lines, load.Protection?.Value, errors, warnings, load.Header.Line.Index + 1);
    }

    /// <summary>Finding codes by line, so each block collects those on its own lines in one pass over the findings.</summary>
    private static Dictionary<int, List<(string Code, Severity Severity)>> FindingsByBlock(AnalysisResult analysis)
    {
        var byLine = new Dictionary<int, List<(string, Severity)>>();
        foreach (var f in analysis.Findings)
        {
            if (!byLine.TryGetValue(f.Range.Start.Line, out var list)) byLine[f.Range.Start.Line] = list = [];
            list.Add((f.Code, f.Severity));
        }

        return byLine;
    }

    private static (IReadOnlyList<string> Errors, IReadOnlyList<string> Warnings) Codes(Dictionary<int, List<(string Code, Severity Severity)>> byLine, int first, int last)
    {
        var errors = new List<string>();
        var warnings = new List<string>();
        for (var line = first; line <= last; line++)
        {
            if (!byLine.TryGetValue(line, out var list)) continue;
            foreach (var (code, severity) in list)
            {
                var target = severity == Severity.Error ? errors : severity == Severity.Warning ? warnings : null;
                if (target is not null && !target.Contains(code)) target.Add(code);
            }
        }

        return (errors, warnings);
    }

    /// <summary>A 'from' cycle (reported as P016) must not make the drawing loop: such an edge is taken from the supply instead.</summary>
    private static List<DiagramEdge> BreakCycles(List<DiagramEdge> edges)
    {
        var parent = edges.ToDictionary(e => e.To, e => e.From, StringComparer.OrdinalIgnoreCase);
        var result = new List<DiagramEdge>(edges.Count);
        foreach (var e in edges)
        {
            var at = e.From;
            var steps = 0;
            while (at != SupplyId && parent.TryGetValue(at, out var up) && !string.Equals(at, e.To, StringComparison.OrdinalIgnoreCase) && steps++ <= parent.Count) at = up;
            result.Add(at == SupplyId ? e : e with { From = SupplyId });
            if (at != SupplyId) parent[e.To] = SupplyId;
        }

        return result;
    }
}
