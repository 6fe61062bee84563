using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>Adjustable-speed drives beyond their input conductors: a bypass device (430.122(C)) and the drive's marked maximum branch device (430.130(A)(2)).</summary>
internal sealed partial class MotorSizer
{
    /// <summary>Whether the drive has a bypass; 'drive-bypass' on a motor not written 'starting drive' is said to be unused.</summary>
    private bool DriveBypass(MotorNode motor, StartingMethod starting)
    {
        if (!_likes.Has(motor, static m => m.DriveBypass)) return false;
        if (starting == StartingMethod.Drive) return true;
        if (motor.Statement("drive-bypass") is { } s)
            Add(FindingCodes.NotUsedHere, Severity.Warning, s.KeywordToken.Range,
                "'drive-bypass' means something only for a motor written 'starting drive …A' (NEC 430.122(C)); it is not used here");
        return false;
    }

    /// <summary>
    /// 430.130(A)(2): where the drive's instructions or marking state a maximum branch device, it is not
    /// exceeded even where 430.52 permits more. Returns whether it lowered the maximum.
    /// </summary>
    private bool DriveMaximum(MotorNode motor, MotorResult r, StartingMethod starting)
    {
        if (Get(motor, m => m.DriveMaximumProtection, out var owner) is not { } marked) return false;
        if (starting != StartingMethod.Drive)
        {
            Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, owner, marked.Range),
                "'drive-max-protection' means something only for a motor written 'starting drive …A' (NEC 430.130(A)(2)); it is not used here");
            return false;
        }

        r.DriveMaximumProtection = marked.Value.Value;
        r.MaximumProtection = DriveCircuits.MarkedMaximum(r.MaximumProtection!, marked.Value.Value);
        return r.MaximumProtection.Value == marked.Value.Value && r.MaximumProtection.Steps[^1].Rule == "NEC 430.130(A)(2)";
    }
}
