using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Analysis.Power;

/// <summary>
/// A motor's starting dip at its bus and at its terminals, with the limits it is held to. <c>Gap</c>
/// names an element on the way taken as no impedance: the dip is then at least the value shown.
/// </summary>
public sealed record StartingDipResult(MotorNode Motor, Result<Dip> Dip, string? Gap, decimal MotorLimit, decimal BusLimit, ImmutableArray<Step> Current);

/// <summary>
/// The starting dip of every three-phase motor from the system's impedance (the fault study's, read
/// for a dip) and its locked-rotor current (docs/checks.md, Motor starting dip). One pass over the
/// motors once the fault study is done; only a list with a 'source' has a system impedance.
/// </summary>
internal static class StartingDips
{
    public static Dictionary<MotorNode, StartingDipResult> Run(MotorList model, LikeResolver likes, IReadOnlyDictionary<MotorNode, MotorResult> motors,
        Func<MotorNode, FaultPoint?> bus, List<Finding> findings)
    {
        var dips = new Dictionary<MotorNode, StartingDipResult>();
        foreach (var m in motors.Values)
        {
            if (m.Phases != Phases.Three || bus(m.Motor) is not { Known: true, Volts: > 0 } at) continue;
            if (StartingCurrent(m, likes) is not { } start) continue;
            var settings = Settings.For(m.Motor, model, likes);
            var (branch, gap) = Branch(m, likes, settings);
            gap = at.DipGap ?? gap;
            var ratedVolts = m.RatedVolts > 0 ? m.RatedVolts : m.Volts;
            var dip = StartingDip.Of(at.DipImpedance, branch, start.Amps, at.Volts, ratedVolts, m.Phases);
            var result = new StartingDipResult(m.Motor, dip, gap, settings.MotorDipLimit, settings.BusDipLimit, start.Steps);
            dips[m.Motor] = result;
            Check(result, m, at, findings);
        }

        return dips;
    }

    /// <summary>The starting line current: the nameplate locked-rotor current, else the code letter's upper end (Table 430.7(B)), else the Table 430.251 maximum, times the starter's factor; a drive's about 150 % of its input.</summary>
    private static (decimal Amps, ImmutableArray<Step> Steps)? StartingCurrent(MotorResult m, LikeResolver likes)
    {
        if (m.StartingMethod == StartingMethod.Drive)
        {
            var written = likes.Get(m.Motor, static n => n.DriveInputCurrent);
            var input = written?.Value.Value.Value ?? m.FullLoadCurrent.Value;
            if (input is not { } i) return null;
            var amps = StartingDip.DriveStartingMultiple * i;
            return (amps, [Step.Amps("Starting current", amps, "common practice, no source",
                $"a drive starts its motor at about {Format.Number(StartingDip.DriveStartingMultiple * 100)} % of {Format.Amps(i)} ({(written is null ? "the motor's full-load current: no drive input current is written" : "the drive's rated input current")}), not at locked-rotor current")]);
        }

        decimal? lra = null;
        var source = "";
        if (likes.Get(m.Motor, static n => n.LockedRotorCurrent) is { } nameplate)
            (lra, source) = (nameplate.Value.Value.Value, "the nameplate locked-rotor current ('locked-rotor')");
        else if (m.LockedRotorFromCodeLetter?.Value is { } range)
            (lra, source) = (range.Maximum ?? range.Minimum, "the upper end of the code letter's kVA per horsepower at rated voltage, NFPA 70-2023 Table 430.7(B)");
        else if (m.LockedRotorTableMaximum?.Value is { } table)
            (lra, source) = (table, "the Table 430.251 maximum for the motor's design letter (NFPA 70-2023)");
        if (lra is not { } full) return null;
        var (factor, rule, why) = StartingDip.StarterFactor(m.StartingMethod);
        var start = full * factor;
        return (start, [
            Step.Amps("Locked-rotor current", full, source.Contains("430.7(B)") ? "NFPA 70-2023 430.7(B)" : source.Contains("430.251") ? "NFPA 70-2023 Table 430.251" : "nameplate", $"{source}; the largest value known"),
            Step.Amps("Starting current", start, rule, why),
        ]);
    }

    /// <summary>The branch conductors as the voltage-drop check reads them (EMT as steel conduit), or why they count as none.</summary>
    private static (Impedance, string?) Branch(MotorResult m, LikeResolver likes, Settings settings)
    {
        var length = likes.Get(m.Motor, static n => n.Length)?.Value.Value;
        var wire = m.Wire ?? m.MinimumWire?.Value;
        if (length is null || wire is null) return (Impedance.Zero, $"{m.Tag} writes no {(length is null ? "'length'" : "'wire'")}");
        var raceway = settings.Raceway == RacewayType.Emt ? RacewayType.Rmc : settings.Raceway;
        var z = FaultCurrent.Conductor(wire.Value, Conversions.Feet(length.Value), settings.Material, raceway);
        return z.Value is { } zz ? (zz, null) : (Impedance.Zero, $"{m.Tag}'s branch conductors: {z.Unavailable}");
    }

    private static void Check(StartingDipResult r, MotorResult m, FaultPoint at, List<Finding> findings)
    {
        if (r.Dip.Value is not { } dip) return;
        // A lower bound above the limit is above it; one under it says nothing, so only the first is reported.
        var atLeast = r.Gap is null ? "" : "at least ";
        var why = r.Gap is null ? "" : $" ({r.Gap}, taken as no impedance)";
        if (dip.MotorPercent > r.MotorLimit)
            findings.Add(new Finding(FindingCodes.StartingDipAtMotorHigh, Severity.Warning, m.Motor.Header.KeywordToken.Range,
                $"starting {m.Tag} dips its terminals {atLeast}{dip.MotorPercent:0.#} %, above the {Format.Percent(r.MotorLimit)} limit ('dip-limit'){why}"));
        if (dip.BusPercent > r.BusLimit)
            findings.Add(new Finding(FindingCodes.StartingDipAtBusHigh, Severity.Warning, m.Motor.Header.KeywordToken.Range,
                $"starting {m.Tag} dips {at.Name} {atLeast}{dip.BusPercent:0.#} %, above the {Format.Percent(r.BusLimit)} limit ('dip-limit'){why}"));
    }
}
