using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// A power-factor capacitor on a motor circuit (Article 460): the conductors that connect it
/// (460.8(A)) and the current the overload is selected from when it is on the overload's load side
/// (460.9). Its own overcurrent device and disconnect (460.8(B), (C)) are listed as not checked.
/// </summary>
internal sealed partial class MotorSizer
{
    /// <summary>
    /// 460.9: the overload's basis when a capacitor is on its load side (the default when the list does
    /// not say, the stricter case); null when there is no capacitor or it is on the line side.
    /// </summary>
    private Result<decimal>? CapacitorOverloadBasis(MotorNode motor, MotorResult r, decimal? nameplate)
    {
        var improved = Get(motor, m => m.ImprovedCurrent);
        if (!HasCapacitor(motor))
        {
            if (improved is not null)
                Add(FindingCodes.NotUsedHere, Severity.Warning, improved.Range,
                    "'improved-current' is used only with a 'capacitor' on the load side of the overload (NEC 460.9); there is none on this motor");
            return null;
        }

        r.HasCapacitor = true;
        var position = Get(motor, m => m.CapacitorPosition);
        if (position?.Value == CapacitorPosition.LineSide)
        {
            if (improved is not null)
                Add(FindingCodes.NotUsedHere, Severity.Warning, improved.Range,
                    "the capacitor is on the line side of the overload, so the overload is selected from the nameplate as usual; 'improved-current' is not used (NEC 460.9)");
            return null;
        }

        r.CapacitorOnLoadSide = true;
        var basis = Capacitors.OverloadBasis(improved?.Value.Value, nameplate);
        if (position is null && basis.Value is not null)
            basis = new Result<decimal>(basis.Value, [new Step("Capacitor position", "load side of the overload", "NEC 460.9",
                "not written: taken to be on the load side, the case where the overload must be set lower (conservative reading)"), .. basis.Steps]);
        return basis;
    }

    private bool HasCapacitor(MotorNode motor) => Get(motor, m => m.CapacitorKvar) is not null || Get(motor, m => m.CapacitorCurrent) is not null;

    /// <summary>460.8(A): the conductors that connect the capacitor to the motor terminals or the motor circuit conductors.</summary>
    private void CheckCapacitor(MotorNode motor, MotorResult r, Settings settings)
    {
        var written = Get(motor, m => m.CapacitorWire, out var owner);
        if (!HasCapacitor(motor))
        {
            if (written is not null)
                Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, owner, written.Range),
                    "'capacitor-wire' is used only with a 'capacitor' on this motor; there is none, so it is not checked");
            return;
        }

        r.HasCapacitor = true;
        var kvar = Get(motor, m => m.CapacitorKvar)?.Value.Value;
        var amps = Get(motor, m => m.CapacitorCurrent)?.Value.Value;
        var volts = Get(motor, m => m.CapacitorVoltage)?.Value.Value;
        var lower = Math.Min(r.Volts, r.RatedVolts == 0 ? r.Volts : r.RatedVolts);
        var note = volts is not null
            ? ", the capacitor's rated voltage as written"
            : $", no capacitor voltage written: the lower of the system and motor voltages, giving the larger current (conservative reading)";
        r.CapacitorRatedCurrent = Capacitors.RatedCurrent(kvar, amps, volts ?? lower, r.Phases, note);
        if (r.CapacitorRatedCurrent.Value is not { } rated)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, Get(motor, m => m.CapacitorKvar)?.Range ?? motor.Header.KeywordToken.Range,
                $"the capacitor's conductors cannot be sized: {r.CapacitorRatedCurrent.Unavailable}");
            return;
        }

        // One third of the motor circuit conductors' ampacity: the wire the check and the fixes agree on,
        // at its insulation's ampacity before the termination limit (the larger figure).
        var conditions = settings.Conditions;
        var motorWire = WireToBeReplaced(r) ? r.MinimumWire?.Value : r.Wire ?? r.MinimumWire?.Value;
        decimal? motorAmpacity = motorWire is { } mw && !SmallConductors.Applies(mw.Size)
            ? cache.Allowable(mw, conditions with { TerminationRating = conditions.InsulationRating }, designBcd: false).Value
            : null;
        r.CapacitorRequiredAmpacity = Capacitors.RequiredAmpacity(rated, motorAmpacity);
        var required = r.CapacitorRequiredAmpacity.Value!.Value;
        // The capacitor's terminals are not a motor's: 110.14(C)(1)(a)(4) does not apply to them.
        r.MinimumCapacitorWire = cache.MinimumWire(required, conditions, designBcd: false);
        var minimum = r.MinimumCapacitorWire.Value;
        if (written is null)
        {
            if (minimum is { } min)
                Add(FindingCodes.NotWritten, Severity.Information, motor.Header.KeywordToken.Range,
                    $"no capacitor conductors given; NEC 460.8(A) needs {Format.Amps(required)}: {min}", Insert(motor, $"capacitor-wire {min}", "Add the capacitor conductors"));
            return;
        }

        r.CapacitorWire = written.Value;
        r.CapacitorWireAmpacity = cache.Allowable(written.Value, conditions, designBcd: false);
        if (r.CapacitorWireAmpacity.Value is not { } allowable)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, RangeOn(motor, owner, written.Range),
                $"capacitor wire {written.Value} cannot be checked against the {Format.Amps(required)} NEC 460.8(A) requires: {r.CapacitorWireAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        Add(FindingCodes.CapacitorWireUndersized, Severity.Error, RangeOn(motor, owner, written.Range),
            $"capacitor wire {written.Value} carries {Format.Amps(allowable)} here; NEC 460.8(A) requires {Format.Amps(required)} (135 % of the capacitor's {Format.Amps(rated)}, and at least one third of the motor conductors)"
            + (minimum is { } m ? $": use {m}" : $", and {r.MinimumCapacitorWire.Unavailable}"),
            minimum is { } fix ? ReplaceOrOverride(motor, owner, "capacitor-wire", "size", fix.ToString(), $"Change the capacitor wire to {fix}") : null);
    }
}
