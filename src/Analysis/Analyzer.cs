using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Power;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Collections;
using MotorLang.Parser.Model;
using MotorLang.Parser;

namespace MotorLang.Analysis;

/// <summary>Joins the model to the sizing core. Pure: text in, results out; nothing here knows files or editors.</summary>
public static class Analyzer
{
    public static AnalysisResult Analyze(string text) => Analyze(DocumentParser.Parse(text));

    public static AnalysisResult Analyze(ParseResult parse)
    {
        var model = parse.Model;
        var run = new SizingPass(parse);
        var motors = LayeredMap<MotorNode, MotorResult>.Empty().ToBuilder();
        var likeUsers = new List<MotorNode>();
        foreach (var motor in model.Motors)
        {
            if (motor.Like is not null) likeUsers.Add(motor);
            if (Sized(motor)) motors[motor] = run.Size(motor);
        }

        run.ShareInheritedFixes(motors);
        var feeders = run.SizeFeeders(motors, previous: null, affected: null, sharedMotor: null);
        var parseFindings = parse.Diagnostics.Select(Finding.From).ToImmutableArray();
        var motorMap = motors.ToMap();
        var all = new List<RankedFinding>();
        AddParseFindings(all, parseFindings);
        foreach (var r in motorMap.Values) AddMotorFindings(all, r);
        foreach (var r in feeders.Values) AddFeederFindings(all, r);
        var power = FaultStudy.Run(model, motorMap, feeders);
        AddPowerFindings(all, power);
        all.Sort(FindingOrder.Instance);
        var result = new AnalysisResult(parse, motorMap, feeders, all, parseFindings, likeUsers, power);
        result.KeepCache(run.Cache);
        return result;
    }

    /// <summary>
    /// The analysis of a document re-read after edits inside lines (<see cref="ParseResult.Edit"/>,
    /// one edit or several chained), made from the previous analysis: only what the edits can
    /// affect is sized again — the edited motors and the motors written 'like' them (and every
    /// motor of an edited feeder), the feeders
    /// they are on and the feeders those are supplied from; feeders further down only get their
    /// drop from the source brought up to date. Everything else is kept. Null when
    /// <paramref name="parse"/> is not such a re-read of <paramref name="previous"/>'s document;
    /// then call <see cref="Analyze(ParseResult)"/>. The result equals a full analysis; tests
    /// check that on random edits.
    /// </summary>
    public static AnalysisResult? Update(AnalysisResult previous, ParseResult parse)
    {
        if (ReferenceEquals(previous.Parse.Model, parse.Model)) return Reuse(previous, parse);
        if (parse.Edit is not { } edit || !ReferenceEquals(edit.Before, previous.Parse.Model)) return null;

        var model = parse.Model;
        var likeUsers = previous.LikeUsers.Select(u => edit.Copies.TryGetValue(u, out var c) ? (MotorNode)c : u).ToList();
        var resize = UpdateScope.MotorsToResize(edit, model, likeUsers);

        var motors = previous.MotorTable.ToBuilder();
        var owned = new HashSet<MotorResult>(ReferenceEqualityComparer.Instance);
        var removed = new HashSet<Finding>(ReferenceEqualityComparer.Instance);
        var replacedBy = new Dictionary<FeederNode, FeederNode>(edit.Feeders.Count);
        foreach (var (oldFeeder, newFeeder) in edit.Feeders)
        {
            replacedBy[newFeeder] = oldFeeder;
            foreach (var old in oldFeeder.Motors)
            {
                var copy = (MotorNode)edit.Copies[old];
                if (!motors.Remove(old, out var earlier)) continue;
                if (resize.Contains(copy)) removed.UnionWith(earlier.Findings);
                else owned.Add(motors[copy] = earlier.Rebind(copy));
            }
        }

        var run = new SizingPass(parse, previous.TakeCache());
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

        var affected = UpdateScope.FeedersToResize(edit, resize, run);
        var feeders = run.SizeFeeders(motors, previous.Feeders, affected, sharedMotor: r => !owned.Contains(r));
        foreach (var feeder in model.Feeders)
        {
            var now = feeders[feeder];
            var before = previous.Feeders.GetValueOrDefault(replacedBy.GetValueOrDefault(feeder) ?? feeder);
            if (ReferenceEquals(now, before)) continue;
            if (before is not null)
            {
                removed.UnionWith(before.SizingFindings);
                removed.UnionWith(before.DropFindings);
            }

            AddFeederFindings(added, now);
        }

        var parseFindings = UpdateScope.SpliceLines(previous.ParseFindings, parse.Diagnostics, edit.Lines, removed, added);
        // The fault study spans the whole system (every motor feeds every fault), so it is worked out again in full: linear and cheap.
        var motorMap = motors.ToMap();
        var power = FaultStudy.Run(model, motorMap, feeders);
        removed.UnionWith(previous.Power.Findings);
        AddPowerFindings(added, power);
        added.Sort(FindingOrder.Instance);
        var kept = previous.Ranked.Where(f => !removed.Contains(f.Finding)).ToList();
        var result = new AnalysisResult(parse, motorMap, feeders, FindingOrder.Merge(kept, added), parseFindings, likeUsers, power);
        result.KeepCache(run.Cache);
        return result;
    }

    /// <summary>
    /// The previous analysis for a re-read document whose model is the very same object (an edit
    /// inside a comment or blank line): every result and finding still holds.
    /// </summary>
    private static AnalysisResult Reuse(AnalysisResult previous, ParseResult parse)
    {
        var result = new AnalysisResult(parse, previous.MotorTable, previous.Feeders, previous.Ranked, previous.ParseFindings, previous.LikeUsers, previous.Power);
        if (previous.TakeCache() is { } cache) result.KeepCache(cache);
        return result;
    }

    /// <summary>Motors whose header is unreadable and that give no power are left out rather than reported twice.</summary>
    private static bool Sized(MotorNode motor) => !motor.Header.Line.IsBroken || motor.Power is not null;

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

    private static void AddPowerFindings(List<RankedFinding> into, FaultStudy power)
    {
        for (var i = 0; i < power.Findings.Length; i++) into.Add(new RankedFinding(power.Findings[i], RankedFinding.PowerRank(i)));
    }

    private static void AddFeederFindings(List<RankedFinding> into, FeederResult r)
    {
        var line = r.Feeder.Header.Line.Index;
        for (var i = 0; i < r.SizingFindings.Length; i++) into.Add(new RankedFinding(r.SizingFindings[i], RankedFinding.FeederRank(line, i)));
        for (var i = 0; i < r.DropFindings.Length; i++)
            into.Add(new RankedFinding(r.DropFindings[i], RankedFinding.FeederRank(line, r.SizingFindings.Length + i)));
    }
}
