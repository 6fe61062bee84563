using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Collections;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser;
using MotorLang.Sizing;

namespace MotorLang.Analysis;

/// <summary>One pass of sizing over a parse: the shared pieces the motor and feeder sizers need.</summary>
internal sealed class SizingPass(ParseResult parse, SizingCache? cache = null)
{
    private readonly EditBuilder _edits = new(parse.Tree);
    private readonly SizingCache _cache = cache ?? new SizingCache();
    private readonly List<Finding> _scratch = [];
    private readonly List<(Finding Finding, MotorNode Owner, MotorNode Motor)> _inherited = [];
    private MotorSizer? _motorSizer;

    public SizingCache Cache => _cache;

    /// <summary>Feeders visited by the drop-from-source and cycle walks of this pass; tests check it grows linearly.</summary>
    internal long FeederSteps { get; private set; }

    private MotorSizer MotorSizer => _motorSizer ??= new MotorSizer(parse.Model, _edits, _scratch, _cache);

    private Func<MotorNode, MotorResult>? _sizeMotor;

    /// <summary>
    /// Sizes one motor or feeder into a cleared scratch list of findings. A defect in one item's
    /// sizing becomes a finding on that item, never a crash of the whole analysis.
    /// </summary>
    private T Guarded<TNode, T>(TNode node, Func<TNode, T> size, Func<TNode, T> empty) where TNode : BlockNode
    {
        _scratch.Clear();
        try
        {
            return size(node);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            _scratch.Add(new Finding(FindingCodes.CannotCheck, Severity.Warning, node.Header.KeywordToken.Range,
                $"internal error while sizing this item ({e.GetType().Name}: {e.Message}); please report it"));
            return empty(node);
        }
    }

    public MotorResult Size(MotorNode motor)
    {
        var sizer = MotorSizer;
        var r = Guarded(motor, _sizeMotor ??= sizer.Size, static m => new MotorResult(m));
        r.Findings = [.. _scratch];
        foreach (var (finding, owner) in sizer.Inherited) _inherited.Add((finding, owner, motor));
        sizer.Inherited.Clear();
        return r;
    }

    /// <summary>
    /// A motor written "like" another shares that motor's mistakes. Where the other motor reports the
    /// same problem, the fix belongs there, so this one keeps its finding but loses its own fix.
    /// </summary>
    public void ShareInheritedFixes(LayeredMap<MotorNode, MotorResult>.Builder motors)
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
    public Dictionary<FeederNode, FeederResult> SizeFeeders(LayeredMap<MotorNode, MotorResult>.Builder motors,
        IReadOnlyDictionary<FeederNode, FeederResult>? previous, HashSet<FeederNode>? affected, Func<MotorResult, bool>? sharedMotor)
    {
        var model = parse.Model;
        var sizer = new FeederSizer(model, motors, _edits, _scratch, _cache);
        Func<FeederNode, FeederResult> sizeFeeder = sizer.Size;
        var feeders = new Dictionary<FeederNode, FeederResult>(model.Feeders.Count);
        var fresh = new HashSet<FeederResult>(ReferenceEqualityComparer.Instance);
        foreach (var feeder in model.Feeders)
        {
            if (affected is not null && !affected.Contains(feeder) && previous?.GetValueOrDefault(feeder) is { } kept)
            {
                feeders[feeder] = kept;
                continue;
            }

            var r = Guarded(feeder, sizeFeeder, static f => new FeederResult(f));
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
            if (feeders[feeder] is var r && fresh.Contains(r)) r.DropFindings = TotalDrops(model, feeder, r, motors, sharedMotor, feeders);
        }

        FeederSteps += sizer.Steps;

        return feeders;
    }

    /// <summary>The feeder and those it is supplied from, nearest first.</summary>
    private static List<FeederResult> SupplyChain(MotorList model, FeederNode feeder, Dictionary<FeederNode, FeederResult> feeders)
    {
        var chain = new List<FeederResult>();
        var seen = new HashSet<FeederNode>();
        for (FeederNode? f = feeder; f is not null && seen.Add(f); f = Sizing.FeederSizer.Supplier(f, model))
        {
            if (feeders.GetValueOrDefault(f) is { } r) chain.Add(r);
        }

        return chain;
    }

    /// <summary>Each motor's drop from the source (its feeder's plus its branch) against the total limit.</summary>
    private static Finding[] TotalDrops(MotorList model, FeederNode feeder, FeederResult fr, LayeredMap<MotorNode, MotorResult>.Builder motors,
        Func<MotorResult, bool>? sharedMotor, Dictionary<FeederNode, FeederResult> feeders)
    {
        List<Finding>? findings = null;
        var upstream = fr.CumulativeDropPercent ?? 0;
        foreach (var motor in feeder.Motors)
        {
            if (motors.GetValueOrDefault(motor) is { FirePumpBranch: not null } pump)
            {
                var voltage = FirePumpVoltageCheck.Check(pump, SupplyChain(model, feeder, feeders), ref findings);
                if (sharedMotor?.Invoke(pump) == true) motors[motor] = pump.Rebind(motor);
                motors[motor]!.FirePumpVoltage = voltage;
            }

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
}
