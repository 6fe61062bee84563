using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Sizing;

namespace MotorLang.Analysis;

/// <summary>Joins the model to the sizing core. Pure: text in, results out; nothing here knows files or editors.</summary>
public static class Analyzer
{
    public static AnalysisResult Analyze(string text) => Analyze(DocumentParser.Parse(text));

    public static AnalysisResult Analyze(ParseResult parse)
    {
        var model = parse.Model;
        var run = new Run(parse);
        var motors = new Dictionary<MotorNode, MotorResult>();
        var likeUsers = new List<MotorNode>();
        foreach (var motor in model.Motors)
        {
            if (motor.Like is not null) likeUsers.Add(motor);
            if (Sized(motor)) motors[motor] = run.Size(motor);
        }

        run.ShareInheritedFixes(motors);
        var (feeders, system) = run.SizeFeeders(motors, shared: null);
        var parseFindings = parse.Diagnostics.Select(Finding.From).ToImmutableArray();
        var all = new List<RankedFinding>();
        AddParseFindings(all, parseFindings);
        foreach (var r in motors.Values) AddMotorFindings(all, r);
        AddSystemFindings(all, system);
        all.Sort(FindingOrder.Instance);
        return new AnalysisResult(parse, motors, feeders, all, parseFindings, system, likeUsers);
    }

    /// <summary>
    /// The analysis of a document re-read after a one-line edit (<see cref="ParseResult.Edit"/>),
    /// made from the previous analysis: only the motors the edit can affect are sized again (the
    /// edited motor, the motors written 'like' it, or every motor of an edited feeder); results of
    /// the others are kept, and feeders, which depend on all their motors, are sized again (there
    /// are few of them). Null when <paramref name="parse"/> is not such a re-read of
    /// <paramref name="previous"/>'s document; then call <see cref="Analyze(ParseResult)"/>.
    /// The result equals a full analysis; tests check that on random edits.
    /// </summary>
    public static AnalysisResult? Update(AnalysisResult previous, ParseResult parse)
    {
        if (ReferenceEquals(previous.Parse.Model, parse.Model)) return Reuse(previous, parse);
        if (parse.Edit is not { } edit || !ReferenceEquals(edit.Before, previous.Parse.Model)) return null;

        var model = parse.Model;
        var likeUsers = previous.LikeUsers.Select(u => edit.Copies.TryGetValue(u, out var c) ? (MotorNode)c : u).ToList();
        var resize = MotorsToResize(edit, model, likeUsers);

        var motors = new Dictionary<MotorNode, MotorResult>(previous.MotorTable);
        var owned = new HashSet<MotorResult>(ReferenceEqualityComparer.Instance);
        var removed = new HashSet<Finding>(ReferenceEqualityComparer.Instance);
        foreach (var old in edit.OldFeeder.Motors)
        {
            var copy = (MotorNode)edit.Copies[old];
            if (!motors.Remove(old, out var result)) continue;
            if (resize.Contains(copy)) removed.UnionWith(result.Findings);
            else owned.Add(motors[copy] = result.Rebind(copy));
        }

        var run = new Run(parse);
        var added = new List<RankedFinding>();
        foreach (var motor in resize)
        {
            if (motors.Remove(motor, out var old)) removed.UnionWith(old.Findings);
            if (!Sized(motor)) continue;
            owned.Add(motors[motor] = run.Size(motor));
        }

        run.ShareInheritedFixes(motors);
        foreach (var motor in resize)
        {
            if (motors.TryGetValue(motor, out var r)) AddMotorFindings(added, r);
        }

        var (feeders, system) = run.SizeFeeders(motors, shared: r => !owned.Contains(r));
        removed.UnionWith(previous.SystemFindings);
        AddSystemFindings(added, system);

        var parseFindings = SpliceLine(previous.ParseFindings, parse.Diagnostics, edit.Line, removed, added);
        added.Sort(FindingOrder.Instance);
        var kept = previous.Ranked.Where(f => !removed.Contains(f.Finding)).ToList();
        return new AnalysisResult(parse, motors, feeders, FindingOrder.Merge(kept, added), parseFindings, system, likeUsers);
    }

    /// <summary>
    /// The previous analysis for a re-read document whose model is the very same object (an edit
    /// inside a comment or blank line): every result and finding still holds.
    /// </summary>
    private static AnalysisResult Reuse(AnalysisResult previous, ParseResult parse) =>
        new(parse, previous.MotorTable, previous.Feeders, previous.Ranked, previous.ParseFindings, previous.SystemFindings, previous.LikeUsers);

    /// <summary>Motors whose header is unreadable and that give no power are left out rather than reported twice.</summary>
    private static bool Sized(MotorNode motor) => !motor.Header.Line.IsBroken || motor.Power is not null;

    /// <summary>
    /// The edited motor, or every motor of an edited feeder (they inherit its settings); then every
    /// motor written 'like' one of those, directly or through others, since it takes their values
    /// and defers to their findings.
    /// </summary>
    private static HashSet<MotorNode> MotorsToResize(ModelEdit edit, MotorList model, List<MotorNode> likeUsers)
    {
        var changed = edit.Edited switch
        {
            FeederNode feeder => feeder.Motors.ToHashSet(),
            MotorNode motor => [motor],
            _ => new HashSet<MotorNode>(),
        };

        var resize = new HashSet<MotorNode>(changed);
        if (changed.Count == 0) return resize;
        foreach (var user in likeUsers)
        {
            if (Likes.Chain(user, model).Skip(1).Any(changed.Contains)) resize.Add(user);
        }

        return resize;
    }

    /// <summary>The parse findings with the edited line's replaced; the replaced ones go to <paramref name="removed"/>, the new ones to <paramref name="added"/>.</summary>
    private static ImmutableArray<Finding> SpliceLine(ImmutableArray<Finding> before, ImmutableArray<Diagnostic> diagnostics, int line,
        HashSet<Finding> removed, List<RankedFinding> added)
    {
        var fresh = diagnostics.Where(d => d.Range.Start.Line == line).Select(Finding.From).ToList();
        var first = 0;
        while (first < before.Length && before[first].Range.Start.Line < line) first++;
        var end = first;
        while (end < before.Length && before[end].Range.Start.Line == line) end++;
        if (first == end && fresh.Count == 0) return before;
        for (var i = first; i < end; i++) removed.Add(before[i]);
        for (var i = 0; i < fresh.Count; i++) added.Add(new RankedFinding(fresh[i], RankedFinding.ParseRank(line, i)));
        var builder = ImmutableArray.CreateBuilder<Finding>(before.Length - (end - first) + fresh.Count);
        builder.AddRange(before.AsSpan()[..first]);
        builder.AddRange(fresh);
        builder.AddRange(before.AsSpan()[end..]);
        return builder.MoveToImmutable();
    }

    private static void AddParseFindings(List<RankedFinding> into, ImmutableArray<Finding> parseFindings)
    {
        var line = -1;
        var index = 0;
        foreach (var f in parseFindings)
        {
            index = f.Range.Start.Line == line ? index + 1 : 0;
            line = f.Range.Start.Line;
            into.Add(new RankedFinding(f, RankedFinding.ParseRank(line, index)));
        }
    }

    private static void AddMotorFindings(List<RankedFinding> into, MotorResult r)
    {
        for (var i = 0; i < r.Findings.Length; i++) into.Add(new RankedFinding(r.Findings[i], RankedFinding.MotorRank(r.Motor.Header.Line.Index, i)));
    }

    private static void AddSystemFindings(List<RankedFinding> into, List<Finding> system)
    {
        for (var i = 0; i < system.Count; i++) into.Add(new RankedFinding(system[i], RankedFinding.SystemRank(i)));
    }

    /// <summary>One pass of sizing over a parse: the shared pieces the motor and feeder sizers need.</summary>
    private sealed class Run(ParseResult parse)
    {
        private readonly EditBuilder _edits = new(parse.Tree);
        private readonly SizingCache _cache = new();
        private readonly List<Finding> _scratch = [];
        private readonly List<(Finding Finding, MotorNode Owner, MotorNode Motor)> _inherited = [];
        private MotorSizer? _motorSizer;

        private MotorSizer MotorSizer => _motorSizer ??= new MotorSizer(parse.Model, _edits, _scratch, _cache);

        public MotorResult Size(MotorNode motor)
        {
            _scratch.Clear();
            var sizer = MotorSizer;
            var r = Guard(() => sizer.Size(motor), motor.Header.KeywordToken.Range, _scratch) ?? new MotorResult(motor);
            r.Findings = [.. _scratch];
            foreach (var (finding, owner) in sizer.Inherited) _inherited.Add((finding, owner, motor));
            sizer.Inherited.Clear();
            return r;
        }

        /// <summary>
        /// A motor written "like" another shares that motor's mistakes. Where the other motor reports the
        /// same problem, the fix belongs there, so this one keeps its finding but loses its own fix.
        /// </summary>
        public void ShareInheritedFixes(Dictionary<MotorNode, MotorResult> motors)
        {
            foreach (var (finding, owner, motor) in _inherited)
            {
                var source = motors.GetValueOrDefault(owner)?.Findings ?? [];
                var atSource = source.Any(f => f.Code == finding.Code && f != finding
                                               && f.Range.Start.Line >= owner.Header.Line.Index && f.Range.Start.Line <= owner.LastLine);
                if (!atSource || motors.GetValueOrDefault(motor) is not { } r) continue;
                var i = Array.IndexOf(r.Findings, finding);
                if (i >= 0) r.Findings[i] = finding with { Fix = null, Message = $"{finding.Message} (inherited from {owner.Tag?.Value}; fix it there)" };
            }

            _inherited.Clear();
        }

        /// <summary>
        /// Sizes every feeder, then voltage drops from the source to each motor. A motor result that
        /// <paramref name="shared"/> says belongs to an earlier analysis is copied before its total drop changes.
        /// </summary>
        public (Dictionary<FeederNode, FeederResult> Feeders, List<Finding> Findings) SizeFeeders(
            Dictionary<MotorNode, MotorResult> motors, Func<MotorResult, bool>? shared)
        {
            var findings = new List<Finding>();
            var model = parse.Model;
            var feederSizer = new FeederSizer(model, motors, _edits, findings, _cache);
            var feeders = new Dictionary<FeederNode, FeederResult>();
            foreach (var feeder in model.Feeders)
            {
                feeders[feeder] = Guard(() => feederSizer.Size(feeder), feeder.Header.KeywordToken.Range, findings) ?? new FeederResult(feeder);
            }

            feederSizer.Drops(feeders);
            TotalDrops(model, motors, feeders, findings, shared);
            return (feeders, findings);
        }

        private static void TotalDrops(MotorList model, Dictionary<MotorNode, MotorResult> motors, Dictionary<FeederNode, FeederResult> feeders,
            List<Finding> findings, Func<MotorResult, bool>? shared)
        {
            List<MotorResult>? copies = null;
            foreach (var r in motors.Values)
            {
                if (r.BranchDrop?.Value is not { } branch) continue;
                var upstream = feeders.GetValueOrDefault(r.Motor.Feeder)?.CumulativeDropPercent ?? 0;
                var total = upstream + branch.Percent;
                var current = r;
                if (r.TotalDropPercent != total)
                {
                    if (shared?.Invoke(r) == true) (copies ??= []).Add(current = r.Rebind(r.Motor));
                    current.TotalDropPercent = total;
                }

                var limit = (r.Settings ?? Settings.For(r.Motor, model)).TotalDropLimit;
                if (upstream > 0 && total > limit)
                    findings.Add(new Finding(FindingCodes.VoltageDropHigh, Severity.Warning, r.Motor.Header.KeywordToken.Range,
                        $"total voltage drop to {r.Tag} is {total:0.##} % (feeders {upstream:0.##} % + branch {branch.Percent:0.##} %), above the {Format.Percent(limit)} limit (NEC 215.2(A)(2) Informational Note No. 2)"));
            }

            foreach (var c in copies ?? []) motors[c.Motor] = c;
        }

        /// <summary>A defect in one motor's sizing becomes a finding on that motor, never a crash of the whole analysis.</summary>
        private static T? Guard<T>(Func<T> size, SourceRange range, List<Finding> findings) where T : class
        {
            try
            {
                return size();
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                findings.Add(new Finding(FindingCodes.CannotCheck, Severity.Warning, range, $"internal error while sizing this item ({e.GetType().Name}: {e.Message}); please report it"));
                return null;
            }
        }
    }
}
