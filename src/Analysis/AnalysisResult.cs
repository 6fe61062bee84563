using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Collections;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;
using MotorLang.Parser;

namespace MotorLang.Analysis;

/// <summary>The analysis of one document: per-motor and per-feeder results, and every finding in line order.</summary>
public sealed class AnalysisResult
{
    private readonly LayeredMap<MotorNode, MotorResult> _motors;

    internal AnalysisResult(ParseResult parse, LayeredMap<MotorNode, MotorResult> motors, IReadOnlyDictionary<FeederNode, FeederResult> feeders,
        IReadOnlyList<RankedFinding> ranked, ImmutableArray<Finding> parseFindings, IReadOnlyList<MotorNode> likeUsers, Power.FaultStudy power)
    {
        Power = power;
        Ranked = ranked;
        var findings = ImmutableArray.CreateBuilder<Finding>(ranked.Count);
        foreach (var r in ranked) findings.Add(r.Finding);
        Parse = parse;
        _motors = motors;
        Feeders = feeders;
        // Acknowledgements are read from the comments on every analysis, full or updated, so an
        // edit to a directive (which leaves the model as it was) takes effect as well.
        (Findings, Acknowledged) = Acknowledgements.Apply(parse, findings.MoveToImmutable());
        ParseFindings = parseFindings;
        LikeUsers = likeUsers;
    }

    public ParseResult Parse { get; }
    public IReadOnlyDictionary<MotorNode, MotorResult> Motors => _motors;
    public IReadOnlyDictionary<FeederNode, FeederResult> Feeders { get; }

    /// <summary>The available fault current at the service, every feeder's bus and every motor's controller, and the checks against it.</summary>
    public Power.FaultStudy Power { get; }

    /// <summary>Syntax diagnostics and sizing findings together, ordered by position; those acknowledged in the list are left out.</summary>
    public ImmutableArray<Finding> Findings { get; }

    /// <summary>Findings the list acknowledges (`# acknowledge CODE: reason`), each with its reason; not in <see cref="Findings"/>.</summary>
    public ImmutableArray<Acknowledgement> Acknowledged { get; }

    public bool HasErrors => Findings.Any(f => f.Severity == Severity.Error);

    // The parts Findings is made of, kept so that an update after a one-line edit replaces only
    // the parts the edit can have changed.
    internal LayeredMap<MotorNode, MotorResult> MotorTable => _motors;

    /// <summary>Every finding with its rank, before acknowledgements are applied, for merging in an update.</summary>
    internal IReadOnlyList<RankedFinding> Ranked { get; }

    /// <summary>The parser's diagnostics as findings, in line order.</summary>
    internal ImmutableArray<Finding> ParseFindings { get; }

    /// <summary>Motors written 'like' another, whose results depend on that other motor's statements.</summary>
    internal IReadOnlyList<MotorNode> LikeUsers { get; }

    private SizingCache? _cache;

    /// <summary>Hands the sizing cache to the one update that continues from this analysis; later callers get null.</summary>
    internal SizingCache? TakeCache() => Interlocked.Exchange(ref _cache, null);

    internal void KeepCache(SizingCache cache) => _cache = cache.Count <= SizingCache.Limit ? cache : null;

    /// <summary>
    /// Every sizing fix at once ("size everything"): edits that do not overlap, joined into one
    /// change. A stale acknowledgement's removal is left to its own code action: sizing changes
    /// values, never the engineer's written reasons.
    /// </summary>
    public ImmutableArray<TextEdit> SizeEverything() =>
        EditBuilder.Combine(Findings.Where(f => f.Fix is not null && f.Code != FindingCodes.AcknowledgementStale).SelectMany(f => f.Fix!.Edits));
}
