using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Power-factor capacitors on a motor circuit, Article 460 Part I: the capacitor's rated current,
/// the ampacity of the conductors that connect it (460.8(A)), and the current the motor's overload
/// is selected from when the capacitor is on its load side (460.9).
/// </summary>
public static class Capacitors
{
    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    /// <summary>
    /// The capacitor's rated current: as written, or from its kvar at its rated voltage
    /// (I = kvar × 1000 / (√3 × V) three-phase, kvar × 1000 / V single-phase). Where both are
    /// written the larger is used, so the conductors are never sized from the smaller figure.
    /// </summary>
    public static Result<decimal> RatedCurrent(decimal? kvar, decimal? writtenAmps, decimal volts, Phases phases, string voltageNote)
    {
        if (phases == Phases.Dc)
            return Result<decimal>.Missing("a power-factor capacitor has no rated current on a dc circuit (Article 460 is for ac circuits)");
        var steps = new List<Step>();
        decimal? fromKvar = null;
        if (kvar is { } q)
        {
            var divisor = phases == Phases.Three ? volts * Sqrt3 : volts;
            fromKvar = q * 1000m / divisor;
            steps.Add(Step.Amps("Capacitor rated current from kvar", fromKvar.Value, "NEC 460.8(A)",
                phases == Phases.Three
                    ? $"{Format.Number(q)} kvar × 1000 / (√3 × {Format.Number(volts)} V), the three-phase current of a reactive power{voltageNote}"
                    : $"{Format.Number(q)} kvar × 1000 / {Format.Number(volts)} V, single-phase{voltageNote}"));
        }

        if (writtenAmps is { } a)
            steps.Add(Step.Amps("Capacitor rated current as written", a, "NEC 460.8(A)", "from the capacitor's nameplate"));
        var rated = Math.Max(fromKvar ?? 0m, writtenAmps ?? 0m);
        if (fromKvar is not null && writtenAmps is not null)
            steps.Add(Step.Amps("Capacitor rated current", rated, "NEC 460.8(A)", "the larger of the two, so the conductors are never sized from the smaller (conservative reading)"));
        return new Result<decimal>(rated, [.. steps]);
    }

    /// <summary>
    /// 460.8(A): at least 135 % of the capacitor's rated current, and for conductors that connect it to
    /// the motor terminals or the motor circuit conductors at least one third of those conductors' ampacity.
    /// </summary>
    public static Result<decimal> RequiredAmpacity(decimal ratedAmps, decimal? motorConductorAmpacity)
    {
        var percent = ratedAmps * 1.35m;
        var steps = new List<Step>
        {
            Step.Amps("Capacitor conductors, 135 % of rated current", percent, "NEC 460.8(A)", $"135 % × {Format.Amps(ratedAmps)}"),
        };
        var required = percent;
        if (motorConductorAmpacity is { } motor)
        {
            var third = motor / 3m;
            steps.Add(Step.Amps("Capacitor conductors, one third of the motor conductors", third, "NEC 460.8(A)",
                $"{Format.Amps(motor)} / 3 (the motor conductors' ampacity at their insulation rating, before the termination limit: the larger figure, conservative reading)"));
            required = Math.Max(percent, third);
        }

        steps.Add(Step.Amps("Capacitor conductors, required ampacity", required, "NEC 460.8(A)", "the larger of the two"));
        return new Result<decimal>(required, [.. steps]);
    }

    /// <summary>
    /// 460.9: the current the overload is selected from when the capacitor is on the load side of it.
    /// MotorLang cannot work out the improved-power-factor current (it depends on the motor's
    /// magnetizing current), so it needs the value written; the smaller of it and the nameplate is used.
    /// </summary>
    public static Result<decimal> OverloadBasis(decimal? improvedAmps, decimal? nameplateAmps)
    {
        if (improvedAmps is not { } improved)
            return Result<decimal>.Missing("the capacitor is on the load side of the overload, so the overload must be selected from the motor circuit's current at the improved power factor (NEC 460.9); MotorLang cannot compute that current without it: write 'improved-current …A' (from the capacitor or motor manufacturer's selection), or 'line-side' on the capacitor line if it is connected ahead of the overload");
        var basis = nameplateAmps is { } np && np < improved ? np : improved;
        var note = basis == improved
            ? $"the improved-power-factor current {Format.Amps(improved)} as written, not the nameplate"
            : $"the nameplate {Format.Amps(basis)}: the written improved current {Format.Amps(improved)} is larger, and a capacitor never raises the current (conservative reading)";
        return Result<decimal>.Of(basis, Step.Amps("Current the overload is selected from", basis, "NEC 460.9", note));
    }
}
