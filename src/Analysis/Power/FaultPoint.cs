using System.Collections.Immutable;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Analysis.Power;

/// <summary>
/// The available three-phase fault current at one point of the system: the impedance from the
/// source to it, the bolted fault current, and the same with the running motors' contribution.
/// Steps are written only when read (a hover), by walking back to the source, so a chain of n
/// feeders costs n to compute and nothing to explain until someone asks.
/// </summary>
public sealed class FaultPoint
{
    private readonly FaultPoint? _upstream;
    private readonly ImmutableArray<Step> _own;

    internal FaultPoint(string name, decimal volts, Impedance impedance, FaultPoint? upstream, ImmutableArray<Step> own, decimal runningMotorAmps,
        Impedance? dipImpedance = null, string? dipGap = null, bool singlePhase = false, bool belowSinglePhaseTransformer = false)
    {
        SinglePhase = singlePhase;
        BelowSinglePhaseTransformer = belowSinglePhaseTransformer;
        DipImpedance = dipImpedance ?? impedance;
        DipGap = dipGap;
        Name = name;
        Volts = volts;
        Impedance = impedance;
        _upstream = upstream;
        _own = own;
        Known = true;
        var bolted = singlePhase ? FaultCurrent.BoltedLineToLine(name, volts, impedance) : FaultCurrent.Bolted(name, volts, impedance);
        if (bolted.Value is not { } amps)
        {
            Bolted = new Result<decimal>(null, [.. Path(), .. bolted.Steps], bolted.Unavailable);
            WithMotors = Bolted;
            return;
        }

        Bolted = Result<decimal>.Deferred(amps, () => [.. Path(), .. bolted.Steps]);
        MotorAmps = FaultCurrent.MotorContributionMultiple * runningMotorAmps;
        var with = belowSinglePhaseTransformer
            ? FaultCurrent.MotorContributionBelowSinglePhase(runningMotorAmps, amps)
            : FaultCurrent.MotorContribution(runningMotorAmps, amps);
        WithMotors = Result<decimal>.Deferred(with.Value!.Value, () => [.. Bolted.Steps, .. with.Steps]);
    }

    /// <summary>A point where the fault current could not be worked out, with the reason.</summary>
    internal FaultPoint(string name, string unavailable)
    {
        Name = name;
        Bolted = Result<decimal>.Missing(unavailable);
        WithMotors = Bolted;
        _own = [];
    }

    public string Name { get; }

    /// <summary>A single-phase point: <see cref="Impedance"/> is the loop impedance and <see cref="Bolted"/> the line-to-line fault current.</summary>
    public bool SinglePhase { get; }

    /// <summary>Below a single-phase transformer: ratings are held to the line-to-neutral bound (1.5 × line to line) plus the motors.</summary>
    public bool BelowSinglePhaseTransformer { get; }
    public decimal Volts { get; }
    public Impedance Impedance { get; }

    /// <summary>The bolted three-phase fault current from the source alone.</summary>
    public Result<decimal> Bolted { get; }

    /// <summary>The bolted fault current plus ≈ 4 × FLC of the running motors (an approximation); the ratings are checked against this.</summary>
    public Result<decimal> WithMotors { get; }

    /// <summary>The motors' share (≈ 4 × FLC), null where nothing was computed.</summary>
    public decimal? MotorAmps { get; }

    public decimal? XOverR => Bolted.HasValue ? Impedance.XOverR : null;

    /// <summary>
    /// The impedance from the source read for a starting dip: the readings that overstate the fault
    /// current understate a dip, so EMT takes Table 9's steel column here, as the voltage-drop check does.
    /// </summary>
    public Impedance DipImpedance { get; }

    /// <summary>An element on the way taken as no impedance (a missing length or wire, a transformer's primary conductors): a dip worked out from here is then only a lower bound.</summary>
    public string? DipGap { get; }

    public bool Computed => Bolted.HasValue;

    /// <summary>The impedance from the source is known (it may still be zero: an infinite bus gives no current to check against).</summary>
    public bool Known { get; }

    /// <summary>Every element's step from the source to here, in order.</summary>
    private IEnumerable<Step> Path()
    {
        var chain = new List<FaultPoint>();
        for (var p = this; p is not null; p = p._upstream) chain.Add(p);
        chain.Reverse();
        return chain.SelectMany(p => p._own);
    }
}
