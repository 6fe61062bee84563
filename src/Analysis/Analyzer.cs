using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Sizing;

namespace MotorLang.Analysis;

/// <summary>The analysis of one document: per-motor and per-feeder results, and every finding in line order.</summary>
public sealed class AnalysisResult
{
    internal AnalysisResult(ParseResult parse, IReadOnlyDictionary<MotorNode, MotorResult> motors,
        IReadOnlyDictionary<FeederNode, FeederResult> feeders, ImmutableArray<Finding> findings)
    {
        Parse = parse;
        Motors = motors;
        Feeders = feeders;
        Findings = findings;
    }

    public ParseResult Parse { get; }
    public IReadOnlyDictionary<MotorNode, MotorResult> Motors { get; }
    public IReadOnlyDictionary<FeederNode, FeederResult> Feeders { get; }

    /// <summary>Syntax diagnostics and sizing findings together, ordered by position.</summary>
    public ImmutableArray<Finding> Findings { get; }

    public bool HasErrors => Findings.Any(f => f.Severity == Severity.Error);

    /// <summary>Every fix at once ("size everything"): edits that do not overlap, joined into one change.</summary>
    public ImmutableArray<TextEdit> SizeEverything() =>
        EditBuilder.Combine(Findings.Where(f => f.Fix is not null).SelectMany(f => f.Fix!.Edits));
}

/// <summary>Joins the model to the sizing core. Pure: text in, results out; nothing here knows files or editors.</summary>
public static class Analyzer
{
    public static AnalysisResult Analyze(string text) => Analyze(DocumentParser.Parse(text));

    /// <summary>
    /// The previous analysis for a re-read document whose model is the very same object (an edit
    /// inside a comment or blank line): every result and finding still holds. Null otherwise.
    /// </summary>
    public static AnalysisResult? Reuse(AnalysisResult previous, ParseResult parse) =>
        ReferenceEquals(previous.Parse.Model, parse.Model) ? new AnalysisResult(parse, previous.Motors, previous.Feeders, previous.Findings) : null;

    public static AnalysisResult Analyze(ParseResult parse)
    {
        var findings = parse.Diagnostics.Select(Finding.From).ToList();
        var edits = new EditBuilder(parse.Tree);
        var model = parse.Model;
        var cache = new SizingCache();
        var motorSizer = new MotorSizer(edits, findings, cache);
        var motors = new Dictionary<MotorNode, MotorResult>();
        foreach (var motor in model.Motors.Where(m => !m.Header.Line.IsBroken || m.Power is not null))
        {
            motors[motor] = Guard(() => motorSizer.Size(motor), motor.Header.KeywordToken.Range, findings) ?? new MotorResult(motor);
        }

        ShareInheritedFixes(motorSizer.Inherited, findings);
        var feederSizer = new FeederSizer(model, motors, edits, findings, cache);
        var feeders = new Dictionary<FeederNode, FeederResult>();
        foreach (var feeder in model.Feeders)
        {
            feeders[feeder] = Guard(() => feederSizer.Size(feeder), feeder.Header.KeywordToken.Range, findings) ?? new FeederResult(feeder);
        }

        feederSizer.Drops(feeders);
        TotalDrops(motors, feeders, findings);
        var ordered = findings.OrderBy(f => f.Range.Start).ThenBy(f => f.Code, StringComparer.Ordinal).ToImmutableArray();
        return new AnalysisResult(parse, motors, feeders, ordered);
    }

    /// <summary>
    /// A motor written "like" another shares that motor's mistakes. Where the other motor reports the
    /// same problem, the fix belongs there, so this one keeps its finding but loses its own fix.
    /// </summary>
    private static void ShareInheritedFixes(List<(Finding Finding, MotorNode Owner)> inherited, List<Finding> findings)
    {
        foreach (var (finding, owner) in inherited)
        {
            var atSource = findings.Any(f => f.Code == finding.Code && f != finding
                                             && f.Range.Start.Line >= owner.Header.Line.Index && f.Range.Start.Line <= owner.LastLine);
            if (!atSource) continue;
            var i = findings.IndexOf(finding);
            findings[i] = finding with { Fix = null, Message = $"{finding.Message} (inherited from {owner.Tag?.Value}; fix it there)" };
        }
    }

    private static void TotalDrops(Dictionary<MotorNode, MotorResult> motors, Dictionary<FeederNode, FeederResult> feeders, List<Finding> findings)
    {
        foreach (var r in motors.Values)
        {
            if (r.BranchDrop?.Value is not { } branch) continue;
            var upstream = feeders.GetValueOrDefault(r.Motor.Feeder)?.CumulativeDropPercent ?? 0;
            r.TotalDropPercent = upstream + branch.Percent;
            var limit = (r.Settings ?? Resolution.Settings.For(r.Motor)).TotalDropLimit;
            if (upstream > 0 && r.TotalDropPercent > limit)
                findings.Add(new Finding(FindingCodes.VoltageDropHigh, Severity.Warning, r.Motor.Header.KeywordToken.Range,
                    $"total voltage drop to {r.Tag} is {r.TotalDropPercent:0.##} % (feeders {upstream:0.##} % + branch {branch.Percent:0.##} %), above the {Format.Percent(limit)} limit (NEC 215.2(A)(2) Informational Note No. 2)"));
        }
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
