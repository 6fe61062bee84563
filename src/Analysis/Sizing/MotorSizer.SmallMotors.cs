using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Overloads of motors of 1 hp or less (430.32(B), (D)): the 430.32(A)(1) percentages under their
/// own rules, and the one case where no separate overload is needed — manually started, not
/// permanently installed and within sight from the controller (430.32(D)(2)(a)).
/// </summary>
internal sealed partial class MotorSizer
{
    private const string LargeMotorRule = "430.32(A)(1)";

    /// <summary>
    /// The rule that sets this motor's running overload limit, with its limits relabelled for a
    /// small motor, and for the 430.32(D)(2)(a) case the reason no separate overload is required.
    /// </summary>
    private (string Rule, Result<bool>? Exempt) SmallMotorOverload(MotorNode motor, MotorResult r)
    {
        var manual = Get(motor, m => m.ManualStart, out var owner);
        if (r.Horsepower > 1m)
        {
            if (manual is not null)
                Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, owner, manual.Range),
                    $"'manual-start' bears only on motors of 1 hp or less (NEC 430.32(D)); this motor is {Format.Number(r.Horsepower)} hp, so 430.32(A) applies and it is not used");
            return (LargeMotorRule, null);
        }

        var portable = manual is not null && LikeFlag(motor, m => m.Portable);
        var withinSight = manual is not null && LikeFlag(motor, m => m.WithinSight);
        string rule;
        string why;
        if (manual is null)
        {
            rule = "430.32(B)(1)";
            why = "1 hp or less, automatically started (no 'manual-start' written: the case that needs an overload device)";
        }
        else if (!portable)
        {
            rule = "430.32(D)(1), 430.32(B)(1)";
            why = "1 hp or less, manually started and permanently installed: protected as 430.32(B) says";
        }
        else if (!withinSight)
        {
            rule = "430.32(D)(2)(b), 430.32(B)(1)";
            why = "1 hp or less, manually started, not permanently installed and not within sight from the controller: protected as 430.32(B) says";
        }
        else
        {
            rule = "430.32(B)(1)";
            why = "1 hp or less, manually started, not permanently installed and within sight from the controller";
        }

        var context = new Step("Motor of 1 hp or less", $"{Format.Number(r.Horsepower)} hp", $"NEC {rule}", why);
        r.OverloadLimit = Relabel(r.OverloadLimit!, rule, context);
        r.OverloadAbsoluteLimit = Relabel(r.OverloadAbsoluteLimit!, rule, null);
        if (manual is null || !portable || !withinSight) return (rule, null);
        var exempt = Result<bool>.Of(true, new Step("Separate overload", "not required", "NEC 430.32(D)(2)(a)",
            "the branch short-circuit and ground-fault device may provide the overload protection, rated no larger than Article 430 Part IV (430.52) allows"));
        return (rule, exempt);
    }

    /// <summary>
    /// 430.32(D)(2)(a) Exception: a motor of 1 hp or less, manually started, not permanently installed and
    /// within sight from its controller, is permitted on a nominal 120 V branch circuit protected at not over
    /// 20 A, even where 430.52 would give less. Only for a circuit of 110–120 V, a fuse or inverse-time
    /// breaker and no drive maximum (which is never exceeded).
    /// </summary>
    private bool SmallMotorOnTwentyAmpCircuit(MotorNode motor, MotorResult r, decimal rating, bool driveCapped)
    {
        if (driveCapped || rating > 20m || r.Horsepower > 1m || r.Volts is < 110m or > 120m) return false;
        if (r.Device is not (ProtectiveDevice.InverseTimeBreaker or ProtectiveDevice.DualElementFuse or ProtectiveDevice.NonTimeDelayFuse)) return false;
        if (Get(motor, m => m.ManualStart) is null || !LikeFlag(motor, m => m.Portable) || !LikeFlag(motor, m => m.WithinSight)) return false;
        r.SmallMotorCircuitAllowance = Result<decimal>.Of(20m, Step.Amps("120 V branch circuit", 20m, "NEC 430.32(D)(2)(a) Exception",
            "1 hp or less, manually started, not permanently installed, within sight from the controller: permitted on a nominal 120 V branch circuit protected at not over 20 A"));
        return true;
    }

    /// <summary>A 'manual-start' word read along the like chain, from the motor whose 'manual-start' line is used.</summary>
    private bool LikeFlag(MotorNode motor, Func<MotorNode, bool> flag)
    {
        Get(motor, m => m.ManualStart, out var owner);
        return flag(owner ?? motor);
    }

    private static Result<decimal> Relabel(Result<decimal> limit, string rule, Step? first)
    {
        var steps = limit.Steps.Select(s => s.Rule == "NEC " + LargeMotorRule ? s with { Rule = "NEC " + rule } : s);
        return new Result<decimal>(limit.Value, first is null ? [.. steps] : [first, .. steps], limit.Unavailable);
    }
}
