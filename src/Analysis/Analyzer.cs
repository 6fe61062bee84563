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
        var feeders = run.SizeFeeders(motors, previous: null, affected: null, sharedMotor: null);
        var parseFindings = parse.Diagnostics.Select(Finding.From).ToImmutableArray();
        var all = new List<RankedFinding>();
        AddParseFindings(all, parseFindings);
        foreach (var r in motors.Values) AddMotorFindings(all, r);
        foreach (var r in feeders.Values) AddFeederFindings(all, r);
        all.Sort(FindingOrder.Instance);
        var result = new AnalysisResult(parse, motors, feeders, all, parseFindings, likeUsers);
        result.KeepCache(run.Cache);
        return result;
    }

    /// <summary>
    /// The analysis of a document re-read after a one-line edit (<see cref="ParseResult.Edit"/>),
    /// made from the previous analysis: only what the edit can affect is sized again — the edited
    /// motor and the motors written 'like' it (or every motor of an edited feeder), the feeders
    /// they are on and the feeders those are supplied from; feeders further down only get their
    /// drop from the source brought up to date. Everything else is kept. Null when <paramref name="parse"/> is not such a re-read of
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
            if (!motors.Remove(old, out var earlier)) continue;
            if (resize.Contains(copy)) removed.UnionWith(earlier.Findings);
            else owned.Add(motors[copy] = earlier.Rebind(copy));
        }

        var run = new Run(parse, previous.TakeCache());
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

        var affected = FeedersToResize(edit, resize, run);
        var feeders = run.SizeFeeders(motors, previous.Feeders, affected, sharedMotor: r => !owned.Contains(r));
        foreach (var feeder in model.Feeders)
        {
            var now = feeders[feeder];
            var before = previous.Feeders.GetValueOrDefault(ReferenceEquals(feeder, edit.NewFeeder) ? edit.OldFeeder : feeder);
            if (ReferenceEquals(now, before)) continue;
            if (before is not null)
            {
                removed.UnionWith(before.SizingFindings);
                removed.UnionWith(before.DropFindings);
            }

            AddFeederFindings(added, now);
        }

        var parseFindings = SpliceLine(previous.ParseFindings, parse.Diagnostics, edit.Line, removed, added);
        added.Sort(FindingOrder.Instance);
        var kept = previous.Ranked.Where(f => !removed.Contains(f.Finding)).ToList();
        var result = new AnalysisResult(parse, motors, feeders, FindingOrder.Merge(kept, added), parseFindings, likeUsers);
        result.KeepCache(run.Cache);
        return result;
    }

    /// <summary>
    /// The previous analysis for a re-read document whose model is the very same object (an edit
    /// inside a comment or blank line): every result and finding still holds.
    /// </summary>
    private static AnalysisResult Reuse(AnalysisResult previous, ParseResult parse)
    {
        var result = new AnalysisResult(parse, previous.MotorTable, previous.Feeders, previous.Ranked, previous.ParseFindings, previous.LikeUsers);
        if (previous.TakeCache() is { } cache) result.KeepCache(cache);
        return result;
    }

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

    /// <summary>
    /// The edited feeder, the feeders of the re-sized motors, and every feeder those are supplied
    /// from (their loads include the motors further down).
    /// </summary>
    private static HashSet<FeederNode> FeedersToResize(ModelEdit edit, HashSet<MotorNode> resize, Run run)
    {
        var affected = new HashSet<FeederNode> { edit.NewFeeder };
        foreach (var motor in resize) affected.Add(motor.Feeder);
        foreach (var feeder in affected.ToList())
        {
            for (var up = run.Supplier(feeder); up is not null && affected.Add(up); up = run.Supplier(up))
            {
            }
        }

        return affected;
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

    private static void AddFeederFindings(List<RankedFinding> into, FeederResult r)
    {
        var line = r.Feeder.Header.Line.Index;
        for (var i = 0; i < r.SizingFindings.Length; i++) into.Add(new RankedFinding(r.SizingFindings[i], RankedFinding.FeederRank(line, i)));
        for (var i = 0; i < r.DropFindings.Length; i++)
            into.Add(new RankedFinding(r.DropFindings[i], RankedFinding.FeederRank(line, r.SizingFindings.Length + i)));
    }

    /// <summary>One pass of sizing over a parse: the shared pieces the motor and feeder sizers need.</summary>
    private sealed class Run(ParseResult parse, SizingCache? cache = null)
    {
        private readonly EditBuilder _edits = new(parse.Tree);
        private readonly SizingCache _cache = cache ?? new SizingCache();
        private readonly List<Finding> _scratch = [];
        private readonly List<(Finding Finding, MotorNode Owner, MotorNode Motor)> _inherited = [];
        private MotorSizer? _motorSizer;

        public SizingCache Cache => _cache;

        private MotorSizer MotorSizer => _motorSizer ??= new MotorSizer(parse.Model, _edits, _scratch, _cache);

        public MotorResult Size(MotorNode motor)
        {
            _scratch.Clear();
            var sizer = MotorSizer;
            MotorResult r;
            try
            {
                r = sizer.Size(motor);
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                r = new MotorResult(motor);
                _scratch.Add(InternalError(motor.Header.KeywordToken.Range, e));
            }

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

        public FeederNode? Supplier(FeederNode feeder) => Sizing.FeederSizer.Supplier(feeder, parse.Model);

        /// <summary>
        /// Sizes the feeders in <paramref name="affected"/> (all when null) and keeps the others'
        /// results from <paramref name="previous"/>; then brings every feeder's drop from the source
        /// up to date and, on each feeder sized or whose drop moved, each motor's total drop. A
        /// result that belongs to an earlier analysis is copied before it is changed.
        /// </summary>
        public Dictionary<FeederNode, FeederResult> SizeFeeders(Dictionary<MotorNode, MotorResult> motors,
            IReadOnlyDictionary<FeederNode, FeederResult>? previous, HashSet<FeederNode>? affected, Func<MotorResult, bool>? sharedMotor)
        {
            var model = parse.Model;
            var sizer = new FeederSizer(model, motors, _edits, _scratch, _cache);
            var feeders = new Dictionary<FeederNode, FeederResult>(model.Feeders.Count);
            var fresh = new HashSet<FeederResult>(ReferenceEqualityComparer.Instance);
            foreach (var feeder in model.Feeders)
            {
                if (affected is not null && !affected.Contains(feeder) && previous?.GetValueOrDefault(feeder) is { } kept)
                {
                    feeders[feeder] = kept;
                    continue;
                }

                _scratch.Clear();
                FeederResult r;
                try
                {
                    r = sizer.Size(feeder);
                }
                catch (Exception e) when (e is not OutOfMemoryException)
                {
                    r = new FeederResult(feeder);
                    _scratch.Add(InternalError(feeder.Header.KeywordToken.Range, e));
                }

                r.SizingFindings = [.. _scratch];
                feeders[feeder] = r;
                fresh.Add(r);
            }

            foreach (var feeder in model.Feeders)
            {
                var r = feeders[feeder];
                var total = sizer.CumulativeDrop(feeder, feeders);
                if (r.CumulativeDropPercent == total && !fresh.Contains(r)) continue;
                if (!fresh.Contains(r)) fresh.Add(feeders[feeder] = r = r.Copy());
                r.CumulativeDropPercent = total;
            }

            foreach (var feeder in model.Feeders)
            {
                if (feeders[feeder] is var r && fresh.Contains(r)) r.DropFindings = TotalDrops(model, feeder, r, motors, sharedMotor);
            }

            return feeders;
        }

        /// <summary>Each motor's drop from the source (its feeder's plus its branch) against the total limit.</summary>
        private static Finding[] TotalDrops(MotorList model, FeederNode feeder, FeederResult fr, Dictionary<MotorNode, MotorResult> motors,
            Func<MotorResult, bool>? sharedMotor)
        {
            List<Finding>? findings = null;
            var upstream = fr.CumulativeDropPercent ?? 0;
            foreach (var motor in feeder.Motors)
            {
                if (motors.GetValueOrDefault(motor) is not { } r || r.BranchDrop?.Value is not { } branch) continue;
                var total = upstream + branch.Percent;
                if (r.TotalDropPercent != total)
                {
                    if (sharedMotor?.Invoke(r) == true) motors[motor] = r = r.Rebind(motor);
                    r.TotalDropPercent = total;
                }

                var limit = (r.Settings ?? Settings.For(motor, model)).TotalDropLimit;
                if (upstream > 0 && total > limit)
                    (findings ??= []).Add(new Finding(FindingCodes.VoltageDropHigh, Severity.Warning, motor.Header.KeywordToken.Range,
                        $"total voltage drop to {r.Tag} is {total:0.##} % (feeders {upstream:0.##} % + branch {branch.Percent:0.##} %), above the {Format.Percent(limit)} limit (NEC 215.2(A)(2) Informational Note No. 2)"));
            }

            return findings?.ToArray() ?? [];
        }

        /// <summary>A defect in one item's sizing becomes a finding on that item, never a crash of the whole analysis.</summary>
        private static Finding InternalError(SourceRange range, Exception e) =>
            new(FindingCodes.CannotCheck, Severity.Warning, range, $"internal error while sizing this item ({e.GetType().Name}: {e.Message}); please report it");
    }
}
