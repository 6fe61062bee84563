using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// The conductors between the controller (or drive) and the motor, where the rules size them apart
/// from the branch conductors: wye-delta leads (430.22(C)), part-winding winding sets (430.22(D)) and a
/// drive's output conductors (430.122(B)). Not written, they are taken to be the branch wire.
/// </summary>
internal sealed partial class MotorSizer
{
    private void CheckLeads(MotorNode motor, MotorResult r, decimal flc, StartingMethod starting, InstallationConditions conditions, bool designBcd)
    {
        var written = Get(motor, m => m.MotorLeads, out var owner);
        if (BranchConductors.LeadAmpacity(flc, starting) is not { } need)
        {
            if (written is not null)
                Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, owner, written.Range),
                    "'motor-leads' is used only for a wye-delta, part-winding or drive-fed motor (430.22(C), 430.22(D), 430.122(B)); on this motor the branch wire runs to the motor, so it is not checked");
            return;
        }

        r.LeadAmpacity = need;
        var required = need.Value!.Value;
        var rule = need.Steps[0].Rule;
        r.MinimumLeads = cache.MinimumWire(required, conditions, designBcd);
        // Not written: the conductors to the motor are taken to be the branch wire (the wire its fix writes when it is too small).
        var leads = written?.Value ?? (WireToBeReplaced(r) ? r.MinimumWire?.Value : r.Wire);
        if (leads is not { } wire) return;
        r.Leads = wire;
        r.LeadsWritten = written is not null;
        var place = written is not null ? RangeOn(motor, owner, written.Range) : (Place)(Get(motor, m => m.Wire)?.Range ?? motor.Header.KeywordToken.Range);
        if (SmallConductors.Applies(wire.Size))
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, place,
                $"conductors of {wire} between the controller and the motor are not checked: 16 and 18 AWG have no Table 310.16 ampacity (430.22(G)); {rule} requires {Format.Amps(required)}");
            return;
        }

        r.LeadsAmpacity = cache.Allowable(wire, conditions, designBcd);
        if (r.LeadsAmpacity.Value is not { } allowable)
        {
            Add(FindingCodes.CannotCheck, Severity.Warning, place,
                $"the conductors between the controller and the motor ({wire}) cannot be checked against the {Format.Amps(required)} {rule} requires: {r.LeadsAmpacity.Unavailable}");
            return;
        }

        if (allowable >= required) return;
        var minimum = r.MinimumLeads.Value;
        var use = minimum is { } m ? $": use {m}" : $", and {r.MinimumLeads.Unavailable}";
        if (written is not null)
            Add(FindingCodes.MotorLeadsUndersized, Severity.Error, place,
                $"motor leads {wire} carry {Format.Amps(allowable)} here; {rule} requires {Format.Amps(required)}{use}",
                minimum is { } fix ? ReplaceOrOverride(motor, owner, "motor-leads", "size", fix.ToString(), $"Change the motor leads to {fix}") : null);
        else
            Add(FindingCodes.MotorLeadsUndersized, Severity.Error, place,
                $"no 'motor-leads' written, so the conductors between the {(starting == StartingMethod.Drive ? "drive" : "controller")} and the motor are taken to be the branch wire {wire}, which carries {Format.Amps(allowable)} here; {rule} requires {Format.Amps(required)}{use}",
                minimum is { } fix ? Insert(motor, $"motor-leads {fix}", $"Add motor leads of {fix}") : null);
    }
}
