using MotorLang.Analysis.Findings;
using MotorLang.Parser.Formatting;
using MotorLang.Parser.Model;

namespace MotorLang.Analysis.Reports;

public enum ChangeKind { Added, Removed, Changed }

/// <summary>One attribute written differently: its keyword and its old and new text (null when absent).</summary>
public sealed record AttributeChange(string Attribute, string? Old, string? New);

/// <summary>A computed value that moved, e.g. "minimum wire: 10 AWG → 8 AWG".</summary>
public sealed record ResultChange(string Quantity, string Old, string New);

/// <summary>What changed about one feeder, motor or load, matched by tag.</summary>
public sealed record RecordChange(
    string Kind, string Tag, ChangeKind Change, IReadOnlyList<AttributeChange> Attributes, IReadOnlyList<ResultChange> Results,
    IReadOnlyList<string> NewFindings, IReadOnlyList<string> ResolvedFindings);

/// <summary>
/// Compares two versions of a motor list record by record (by tag, not by line), so a review sees
/// "P-301 15 hp → 20 hp: minimum wire 10 AWG → 8 AWG" instead of a text diff.
/// </summary>
public static class ListDiff
{
    public static IReadOnlyList<RecordChange> Compare(AnalysisResult before, AnalysisResult after)
    {
        var old = Records(before);
        var now = Records(after);
        var schedules = (Before: Indexed.Of(before), After: Indexed.Of(after));
        var changes = new List<RecordChange>();
        foreach (var (key, node) in now)
        {
            if (!old.TryGetValue(key, out var was))
            {
                changes.Add(new RecordChange(node.Keyword, node.Tag!.Value, ChangeKind.Added, [], [], FindingsOf(schedules.After.FindingsByLine, node), []));
                continue;
            }

            var attributes = Attributes(was, node);
            var results = Results(schedules, was, node);
            var oldFindings = FindingsOf(schedules.Before.FindingsByLine, was);
            var newFindings = FindingsOf(schedules.After.FindingsByLine, node);
            var added = newFindings.Except(oldFindings).ToList();
            var resolved = oldFindings.Except(newFindings).ToList();
            if (attributes.Count + results.Count + added.Count + resolved.Count > 0)
                changes.Add(new RecordChange(node.Keyword, node.Tag!.Value, ChangeKind.Changed, attributes, results, added, resolved));
        }

        foreach (var (key, node) in old)
        {
            if (!now.ContainsKey(key)) changes.Add(new RecordChange(node.Keyword, node.Tag!.Value, ChangeKind.Removed, [], [], [], []));
        }

        return changes;
    }

    /// <summary>One line per change, for the terminal and for review comments.</summary>
    public static string Describe(RecordChange c)
    {
        var head = c.Change switch
        {
            ChangeKind.Added => $"+ {c.Kind} {c.Tag} added",
            ChangeKind.Removed => $"- {c.Kind} {c.Tag} removed",
            _ => $"~ {c.Kind} {c.Tag}",
        };
        var parts = new List<string>();
        parts.AddRange(c.Attributes.Select(a => $"{a.Attribute} {a.Old ?? "(none)"} → {a.New ?? "(none)"}"));
        parts.AddRange(c.Results.Select(r => $"{r.Quantity} {r.Old} → {r.New}"));
        parts.AddRange(c.NewFindings.Select(f => $"now: {f}"));
        parts.AddRange(c.ResolvedFindings.Select(f => $"fixed: {f}"));
        return parts.Count == 0 ? head : $"{head}: {string.Join("; ", parts)}";
    }

    private static Dictionary<string, CircuitNode> Records(AnalysisResult a)
    {
        var records = new Dictionary<string, CircuitNode>(StringComparer.OrdinalIgnoreCase);
        foreach (var node in a.Parse.Model.Feeders.Cast<CircuitNode>().Concat(a.Parse.Model.Motors).Concat(a.Parse.Model.Loads))
        {
            if (node.Tag is { } tag) records.TryAdd(tag.Value, node);
        }

        return records;
    }

    private static List<AttributeChange> Attributes(CircuitNode was, CircuitNode now)
    {
        var changes = new List<AttributeChange>();
        foreach (var arg in now.Header.Args.Select(a => a.Spec.Name).Union(was.Header.Args.Select(a => a.Spec.Name)))
        {
            if (arg == "tag") continue;
            var o = was.Header.Arg(arg)?.Canonical;
            var n = now.Header.Arg(arg)?.Canonical;
            if (o != n) changes.Add(new AttributeChange(arg, o, n));
        }

        foreach (var keyword in now.Statements.Keys.Union(was.Statements.Keys, StringComparer.OrdinalIgnoreCase))
        {
            var o = was.Statements.TryGetValue(keyword, out var os) ? Formatter.Canonical(os)[keyword.Length..].Trim() : null;
            var n = now.Statements.TryGetValue(keyword, out var ns) ? Formatter.Canonical(ns)[keyword.Length..].Trim() : null;
            if (o != n) changes.Add(new AttributeChange(keyword, o, n));
        }

        return changes;
    }

    /// <summary>A version's schedule rows by tag (the first of a duplicated tag, as before) and its findings by line: every lookup of the comparison is by key, so it is linear in the list.</summary>
    private sealed record Indexed(IReadOnlyDictionary<string, ScheduleRow> Rows, IReadOnlyDictionary<string, FeederTotals> Feeders, ILookup<int, Finding> FindingsByLine)
    {
        public static Indexed Of(AnalysisResult analysis)
        {
            var schedule = Schedule.Of(analysis);
            var rows = new Dictionary<string, ScheduleRow>(StringComparer.Ordinal);
            foreach (var r in schedule.Rows) rows.TryAdd(r.Tag, r);
            var feeders = new Dictionary<string, FeederTotals>(StringComparer.Ordinal);
            foreach (var f in schedule.Feeders) feeders.TryAdd(f.Tag, f);
            return new Indexed(rows, feeders, analysis.Findings.ToLookup(f => f.Range.Start.Line));
        }
    }

    private static List<ResultChange> Results((Indexed Before, Indexed After) schedules, CircuitNode was, CircuitNode now)
    {
        var changes = new List<ResultChange>();
        if (was is MotorNode && now is MotorNode
            && schedules.Before.Rows.GetValueOrDefault(was.Tag!.Value) is { } oldRow
            && schedules.After.Rows.GetValueOrDefault(now.Tag!.Value) is { } newRow)
        {
            Compare(changes, "FLC", oldRow.Flc, newRow.Flc);
            Compare(changes, "minimum wire", oldRow.MinimumWire, newRow.MinimumWire);
            Compare(changes, "maximum protection", oldRow.MaximumProtection, newRow.MaximumProtection);
            Compare(changes, "overload limit", oldRow.OverloadLimit, newRow.OverloadLimit);
            Compare(changes, "minimum ground", oldRow.MinimumGround, newRow.MinimumGround);
        }
        else if (was is FeederNode && now is FeederNode
                 && schedules.Before.Feeders.GetValueOrDefault(was.Tag!.Value) is { } oldTotals
                 && schedules.After.Feeders.GetValueOrDefault(now.Tag!.Value) is { } newTotals)
        {
            Compare(changes, "required ampacity", oldTotals.RequiredAmpacity, newTotals.RequiredAmpacity);
            Compare(changes, "minimum wire", oldTotals.MinimumWire, newTotals.MinimumWire);
            Compare(changes, "maximum protection", oldTotals.MaximumProtection, newTotals.MaximumProtection);
        }

        return changes;
    }

    private static void Compare(List<ResultChange> changes, string name, string old, string now)
    {
        if (old != now) changes.Add(new ResultChange(name, old.Length == 0 ? "(none)" : old, now.Length == 0 ? "(none)" : now));
    }

    /// <summary>The findings inside a record's lines, as "CODE message" without positions (lines move between versions).</summary>
    private static List<string> FindingsOf(ILookup<int, Finding> byLine, CircuitNode node) =>
        Enumerable.Range(node.Header.Line.Index, OwnEnd(node) - node.Header.Line.Index + 1).SelectMany(l => byLine[l])
            .Where(f => f.Severity != Parser.Diagnostics.Severity.Information)
            .Select(f => $"{f.Code} {f.Message}").Distinct().ToList();

    private static int OwnEnd(CircuitNode node) => node is FeederNode f ? f.LastOwnLine : node.LastLine;
}
