using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Wye-start, delta-run motors: the conductors between the controller and the motor (430.22(C)) and
/// an overload relay in those leads, which carry the phase current of the delta, 1/√3 of the line
/// current (the 430.22(C) Informational Note rounds it to 58 %).
/// </summary>
public static class WyeDelta
{
    /// <summary>1/√3: the share of the line current a delta's phase (each motor lead) carries.</summary>
    public static readonly decimal LeadShare = 0.57735026918962576450914878050m;

    /// <summary>
    /// The 430.32 limit for an overload in the delta leads: the line-current limit × 1/√3. The code has
    /// no percentage of its own for it; the exact 1/√3, not the note's rounded 58 %, gives the smaller
    /// limit (conservative reading, docs/checks.md).
    /// </summary>
    public static Result<decimal> OverloadInDeltaLeads(Result<decimal> lineLimit, bool locationWritten, string label)
    {
        if (lineLimit.Value is not { } limit) return lineLimit;
        var lead = limit * LeadShare;
        var where = locationWritten
            ? "the overload is in the motor leads (delta-leads)"
            : "no location written: taken to be in the motor leads, the smaller limit (write 'line-leads' if it is in the line conductors)";
        return new Result<decimal>(lead, [.. lineLimit.Steps,
            Step.Amps(label, lead, "NEC 430.32, 430.22(C) Informational Note", $"{Format.Amps(limit)} × 1/√3: {where}, which carry the delta's phase current (58 % in the note; 1/√3 = 57.7 % exactly, conservative reading)")]);
    }
}
