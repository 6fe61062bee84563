using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Feeder rules that look at motors together: a branch circuit supplying several motors
/// (430.53), a disconnect serving several (430.110(C)), interlocked motors (430.24 Exception No. 3)
/// and a demand factor granted by the authority (430.26).
/// </summary>
internal sealed partial class FeederSizer
{
    /// <summary>The 430.24 ampacity with only the motors that can run together counted, and a written 430.26 demand factor applied.</summary>
    private Result<decimal> Running(FeederNode feeder, Carried carried, FeederSummary totals, Result<decimal> required)
    {
        // 430.26 asks for the authority's permission: a factor without it written is not applied (the line is also P002).
        var demand = feeder.DemandPermission is { Value.Length: > 0 } ? feeder.DemandFactor : null;
        var interlocked = carried.Interlocked is { } list && list.GroupBy(m => m.Interlock, StringComparer.OrdinalIgnoreCase)
            .Any(g => g.Select(m => m.Set).Distinct(StringComparer.OrdinalIgnoreCase).Count() > 1) ? list : null;
        if ((interlocked is null && demand is null) || required.Value is not { } total) return required;
        if (carried.FirePump)
        {
            // A fire pump's supply is sized for everything it carries (695.6(C), 695.4(B)): no motor is left out of it.
            Add(FindingCodes.CannotCheck, Severity.Warning, (demand?.Range ?? feeder.Header.KeywordToken.Range),
                "the feeder supplies a fire pump: interlocks (NEC 430.24 Exception No. 3) and demand factors (430.26) are not applied to it, and every motor is counted");
            return required;
        }

        var loads = totals.NonContinuousLoadAmps + totals.ContinuousLoadAmps * 1.25m;
        var motorsAll = total - loads;
        var motors = motorsAll;
        IReadOnlyList<Step> steps = [];
        if (interlocked is not null && carried.DutyCycle)
            steps = [new Step("Interlocked motors", "not applied", "NEC 430.24 Exception No. 3",
                "a duty-cycle motor is on the feeder (Exception No. 1): every motor is counted, the conservative reading")];
        else if (interlocked is not null)
        {
            var free = totals.FullLoadAmps - interlocked.Sum(m => m.FullLoadAmps * m.Count);
            (motors, steps) = RunningSets.MotorShare(free, carried.FreeLargest, interlocked);
            motors = Math.Min(motors, motorsAll);
        }

        if (demand is not null)
            Add(FindingCodes.DemandFactorApplied, Severity.Information, demand.Range,
                $"the motors' share of the feeder ampacity is taken at {Format.Percent(demand.Value.Value)} by the permission written (NEC 430.26): \"{feeder.DemandPermission?.Value}\"; MotorLang does not check that the conductors carry the maximum load of the motors' duties");
        return RunningSets.Adjusted(required, motorsAll, motors, steps, demand?.Value.Value, feeder.DemandPermission?.Value);
    }

    /// <summary>430.53: the device of a branch circuit supplying several motors, under the permission written.</summary>
    private void CheckGroup(FeederNode feeder, FeederResult r, BranchGroupKind kind, ProtectiveDevice device, bool fuse)
    {
        var line = feeder.BranchGroup!;
        if (_suppliedFrom!.TryGetValue(feeder, out var below) && below.Count > 0)
        {
            Add(FindingCodes.GroupNotPermitted, Severity.Error, line.Range,
                $"a branch circuit supplies motors and loads, not feeders: {string.Join(", ", below.Select(f => f.Tag?.Value))} is supplied from it; its device is not checked (NEC 430.53)");
            return;
        }

        if (feeder.Protection is { } written && !GroupCircuits.DevicePermitted(written.Value))
        {
            Add(FindingCodes.GroupNotPermitted, Severity.Error, written.Range,
                $"a branch circuit supplying several motors is protected by fuses or an inverse-time breaker (NEC 430.53); a {ShortCircuitProtection.DeviceName(written.Value)} is not permitted");
            return;
        }

        if (feeder.Motors.FirstOrDefault(m => m.IsCompressor) is { } compressor)
        {
            Add(FindingCodes.OutsideScope, Severity.Warning, line.Range,
                $"a motor-compressor ({compressor.Tag?.Value}) is on the circuit: Article 440 sets the rules for compressors sharing a circuit (440.22(B)), which MotorLang does not work out, so the branch device is not checked");
            r.MaximumProtection = Result<decimal>.Missing("a motor-compressor is on the circuit (440.22(B) is not worked out)");
            return;
        }

        var members = new List<GroupMotor>();
        foreach (var motor in feeder.Motors)
        {
            if (motors.GetValueOrDefault(motor) is not { FullLoadCurrent.Value: { } flc } m) return; // the feeder already said it cannot be sized
            members.Add(new GroupMotor(m.Tag, m.Horsepower, flc, motor.Nameplate?.Value.Value, m.MaximumProtection?.Value, m.Quantity));
        }

        var loads = feeder.Loads.Select(l => LoadOf(l, r.Volts, r.Phases)).OfType<FeederLoad>().ToList();
        var limit = GroupCircuits.MaximumProtection(kind, members, loads, r.Volts, r.WireAmpacity?.Value, fuse);
        var rule = kind switch { BranchGroupKind.SmallMotors => "430.53(A)", BranchGroupKind.SmallestProtected => "430.53(B)", _ => "430.53(C)(4)" };
        r.MaximumProtection = limit.Value is { } v ? new Result<decimal>(v.Maximum, limit.Steps) : new Result<decimal>(null, limit.Steps, limit.Unavailable);
        if (limit.Value is { Broken: { } broken })
            Add(FindingCodes.GroupNotPermitted, Severity.Error, line.Range, $"{broken}; the circuit does not meet NEC {rule}");
        if (limit.Value is not { Maximum: var max })
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, line.Range, $"the branch device cannot be checked: {limit.Unavailable} (NEC {rule})");
            return;
        }

        var text = $"{Format.Number(max)}A";
        if (feeder.Protection is null)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Header.KeywordToken.Range,
                $"no branch circuit protection given; NEC {rule} allows up to {Format.Amps(max)}",
                new Fix("Add the maximum branch device", [edits.Insert(feeder, $"protection inverse-time-breaker {text}")]));
            return;
        }

        if (feeder.ProtectionRating is not { } rating)
        {
            Add(FindingCodes.NotWritten, Severity.Information, feeder.Protection.Range,
                $"no rating given; NEC {rule} allows up to {Format.Amps(max)}",
                new Fix("Add the maximum rating", [EditBuilder.Append(feeder.Statement("protection")!, text)]));
            return;
        }

        if (rating.Value.Value > max)
            Add(FindingCodes.GroupProtectionTooLarge, Severity.Error, rating.Range,
                $"the branch device {Format.Amps(rating.Value.Value)} is above the {Format.Amps(max)} NEC {rule} allows for these motors together",
                new Fix($"Change the rating to {text}", [EditBuilder.Replace(feeder.Statement("protection")!.Arg("rating")!, text)]));
    }

    /// <summary>
    /// 430.110(C): a disconnect for several motors and other loads: at least 115 % of the summed
    /// full-load currents ((C)(2)), and rated in horsepower at least the equivalent horsepower of
    /// the summed full-load and Table 430.251 locked-rotor currents ((C)(1)), every load counted as
    /// running at once (interlocks and demand factors are not applied to it: the conservative reading).
    /// </summary>
    private void CheckDisconnect(FeederNode feeder, FeederResult r, Carried carried, FeederSummary totals)
    {
        if (feeder.Statement("disconnect") is not { } line) return;
        var fullLoad = totals.FullLoadAmps + totals.LoadAmps;
        if (r.Phases == Phases.Dc)
            r.Disconnect = Result<DisconnectRating>.Missing("430.110(C)(1) converts with the ac tables only: a dc group disconnect is not sized");
        else if (carried.Compressors is { Count: > 0 })
            r.Disconnect = Result<DisconnectRating>.Missing($"a motor-compressor ({carried.Compressors[0].Tag}) is carried: its equivalent horsepower is 440.12(B)'s, which MotorLang does not work out for a group");
        else if (carried.LockedRotorAmps is not { } lockedRotor)
            r.Disconnect = Result<DisconnectRating>.Missing($"a locked-rotor current is not known ({carried.LockedRotorMissing})");
        else
            r.Disconnect = Disconnects.ForGroup(fullLoad, lockedRotor, r.Volts, r.Phases);
        if (r.Disconnect.Value is not { } need)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, line.KeywordToken.Range, $"the disconnect cannot be checked: {r.Disconnect.Unavailable} (NEC 430.110(C))");
            return;
        }

        var amps = StandardRatings.AtOrAbove(need.MinimumAmps, fuse: false);
        if (feeder.DisconnectRating is { } rating && rating.Value.Value < need.MinimumAmps)
            Add(FindingCodes.GroupDisconnectTooSmall, Severity.Error, rating.Range,
                $"the disconnect's {Format.Amps(rating.Value.Value)} is under the {Format.Amps(need.MinimumAmps)} NEC 430.110(C)(2) asks (115 % of the summed {Format.Amps(fullLoad)})",
                amps is { } a ? new Fix($"Change the rating to {Format.Number(a)}A", [EditBuilder.Replace(line.Arg("rating")!, $"{Format.Number(a)}A")]) : null);
        // A kW rating is compared at 0.746 kW per hp (common practice, no source), as a motor's disconnect is.
        if (feeder.DisconnectPower is { } power && HorsepowerOf(power.Value) < need.MinimumHorsepower)
            Add(FindingCodes.GroupDisconnectTooSmall, Severity.Error, power.Range,
                $"the disconnect's {Parser.Values.Quantity.Number(power.Value.Value)} {(power.Value.Unit == Parser.Values.Unit.Kw ? "kW" : "hp")} is under the {Numbers.Horsepower(need.MinimumHorsepower)} hp equivalent of the combined load (NEC 430.110(C)(1), Table 430.251)",
                new Fix($"Change the rating to {Numbers.Horsepower(need.MinimumHorsepower)}hp", [EditBuilder.Replace(line.Arg("power")!, $"{Numbers.Horsepower(need.MinimumHorsepower)}hp")]));
    }

    private static decimal HorsepowerOf(Parser.Values.Quantity q) => q.Unit == Parser.Values.Unit.Kw ? q.Value / MotorCurrent.KilowattsPerHorsepower : q.Value;
}
