using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// 695.7: the voltage a fire pump gets, from the source through its feeders and branch. Starting
/// (locked-rotor current at the starting power factor) the controller's line terminals may be at
/// most 15 % below the controller's rated voltage; running at 115 % of full-load current the motor
/// terminals at most 5 % below the motor's rated voltage. These are requirements, not notes.
/// </summary>
internal static class FirePumpVoltageCheck
{
    /// <summary>The drops and their limits, with findings for those broken or not fully checked; null for a motor that is not a fire pump.</summary>
    public static Result<FirePumpVoltage>? Check(MotorResult r, IReadOnlyList<FeederResult> chain, ref List<Finding>? findings)
    {
        if (r.FirePumpBranch is not { } branch) return null;
        var at = r.Motor.Header.KeywordToken.Range;
        if (branch.Starting is not { } start || branch.Running is not { } run)
        {
            (findings ??= []).Add(new Finding(FindingCodes.FirePumpDropPartlyChecked, Severity.Warning, at,
                $"the fire pump's voltage at starting and running (NEC 695.7) is not checked: {branch.Missing}"));
            return Result<FirePumpVoltage>.Missing($"not checked: {branch.Missing}");
        }

        var steps = new List<Step>
        {
            new("Branch, starting", $"{start.Percent:0.##} %", "NEC 695.7(A)", $"{Format.Amps(branch.LockedRotorAmps)} locked-rotor current at power factor {Format.Number(VoltageDrop.StartingPowerFactor)} (common practice, no source)"),
            new("Branch, running", $"{run.Percent:0.##} %", "NEC 695.7(B)", "115 % of full-load current"),
        };
        var startPercent = start.Percent;
        var runPercent = run.Percent;
        var unmeasured = new List<string>();
        foreach (var f in chain)
        {
            if (f.DropBasis is not { } basis || f.Drop?.Value is not { } running)
            {
                unmeasured.Add(f.Tag);
                continue;
            }

            // The feeder's running load already holds the fire pump's full-load current; adding its
            // locked-rotor current on top counts that current twice, which errs on the safe side.
            var starting = running.Percent + (basis.Percent(branch.LockedRotorAmps, VoltageDrop.StartingPowerFactor) ?? 0);
            var atOverload = running.Percent + (basis.Percent(branch.ExtraRunningAmps, basis.PowerFactor) ?? 0);
            startPercent += starting;
            runPercent += atOverload;
            steps.Add(new Step($"Feeder {f.Tag}", $"{starting:0.##} % starting, {atOverload:0.##} % running", "NEC 695.7",
                "its running load plus the fire pump's locked-rotor current (starting) or the extra 15 % of full-load current (running), percentages added (conservative)"));
        }

        var startLimit = FirePump.StartingDropLimitPercent;
        // The supply is taken to be at its nominal voltage, and the 5 % is of the motor's rating.
        var runLimit = r.Volts > 0 ? FirePump.RunningDropLimitPercent * r.RatedVolts / r.Volts : FirePump.RunningDropLimitPercent;
        steps.Add(new Step("Starting drop to the controller", $"{startPercent:0.##} % (limit {startLimit:0.##} %)", "NEC 695.7(A)",
            $"the controller's rated voltage is taken as the system's {Format.Number(r.Volts)} V, and the controller as at the motor (conservative reading)"));
        steps.Add(new Step("Running drop to the motor", $"{runPercent:0.##} % (limit {runLimit:0.##} %)", "NEC 695.7(B)",
            $"5 % of the motor's {Format.Number(r.RatedVolts)} V rating, as a share of the {Format.Number(r.Volts)} V system, from a source at its nominal voltage"));
        if (startPercent > startLimit)
            (findings ??= []).Add(new Finding(FindingCodes.FirePumpStartingDrop, Severity.Error, at,
                $"while the fire pump starts, the voltage at its controller drops {startPercent:0.##} %, more than the 15 % NEC 695.7(A) allows"));
        if (runPercent > runLimit)
            (findings ??= []).Add(new Finding(FindingCodes.FirePumpRunningDrop, Severity.Error, at,
                $"at 115 % of full-load current the fire pump's terminals are {runPercent:0.##} % below the system voltage, more than the {runLimit:0.##} % (5 % of the motor's {Format.Number(r.RatedVolts)} V rating) NEC 695.7(B) allows"));
        if (unmeasured.Count > 0)
            (findings ??= []).Add(new Finding(FindingCodes.FirePumpDropPartlyChecked, Severity.Warning, at,
                $"the fire pump's voltage (NEC 695.7) is checked without the drop in {string.Join(", ", unmeasured)}: give {(unmeasured.Count == 1 ? "that feeder" : "those feeders")} a length"));
        return new Result<FirePumpVoltage>(new FirePumpVoltage(startPercent, startLimit, runPercent, runLimit), [.. steps]);
    }
}
