using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Branch devices beyond the four columns of Table 430.52(C)(1): instantaneous-trip breakers and
/// motor short-circuit protectors only in a listed combination motor controller, self-protected
/// combination controllers, semiconductor fuses, and the Class CC fuse the table's note treats apart.
/// </summary>
internal sealed partial class MotorSizer
{
    /// <summary>
    /// Whether the device may be checked against a maximum at all. An instantaneous-trip breaker
    /// (430.52(C)(3)) or a motor short-circuit protector (430.52(C)(7)) not stated to be part of a
    /// listed combination motor controller is not permitted: an error, and no maximum is offered,
    /// since none applies to a device the code does not allow there. Semiconductor fuses are rated
    /// as marked (430.52(C)(5)): said, not checked.
    /// </summary>
    private bool DeviceInLieuPermitted(MotorNode motor, MotorResult r, Located<ProtectiveDevice>? device, MotorNode? deviceOwner, Located<Quantity>? rating)
    {
        if (device is null) return true;
        if (r.Device is ProtectiveDevice.InstantaneousTripBreaker or ProtectiveDevice.MotorShortCircuitProtector
            && Get(motor, m => m.ProtectionCombination) is null)
        {
            var (name, rule) = r.Device == ProtectiveDevice.InstantaneousTripBreaker
                ? ("an instantaneous-trip breaker", "NEC 430.52(C)(3)")
                : ("a motor short-circuit protector", "NEC 430.52(C)(7)");
            r.MaximumProtection = Result<decimal>.Missing($"{name} is permitted only as part of a listed combination motor controller ({rule})",
                new Step("Device permitted", "no", rule, $"{name} only as part of a listed combination motor controller; the protection line does not say 'listed-combination'"));
            Add(FindingCodes.NotInListedCombination, Severity.Error, RangeOn(motor, deviceOwner, device.Range),
                $"{name} is permitted as motor branch protection only as part of a listed combination motor controller ({rule}): "
                + "if it is one, write 'listed-combination' on the protection line; otherwise use an inverse-time breaker or fuses");
            return false;
        }

        if (r.Device == ProtectiveDevice.SemiconductorFuse)
        {
            Add(FindingCodes.SemiconductorFuseNotChecked, Severity.Warning, RangeOn(motor, deviceOwner, device.Range),
                "semiconductor fuses are permitted for the power electronic devices of a solid-state controller with the replacement fuses marked beside them (NEC 430.52(C)(5)); the code gives them no percentage, so their rating is not checked against one: use the rating marked on the equipment (110.3(B))"
                + (rating is null ? "; write the rating so the grounding conductor can be sized (250.122(D)(1))" : ""));
            return false;
        }

        return true;
    }

    /// <summary>Reads 'class-cc'; on a device that is not a fuse it means nothing, and the list is told so.</summary>
    private bool ClassCcFuse(MotorNode motor, ProtectiveDevice device)
    {
        if (Get(motor, m => m.ProtectionClassCc, out var owner) is not { } written) return false;
        if (device is ProtectiveDevice.DualElementFuse or ProtectiveDevice.NonTimeDelayFuse) return true;
        Add(FindingCodes.ClassCcNotAFuse, Severity.Warning, RangeOn(motor, owner, written.Range),
            $"'class-cc' describes a fuse; on this {ShortCircuitProtection.DeviceName(device)} it is ignored");
        return false;
    }

    /// <summary>The rule a device's maximum comes from, for messages.</summary>
    private static string MaximumRule(ProtectiveDevice device, bool hardStart) => device switch
    {
        ProtectiveDevice.MotorShortCircuitProtector => "NEC 430.52(C)(7)",
        ProtectiveDevice.SelfProtectedController => "NEC 430.52(C)(6)",
        ProtectiveDevice.InstantaneousTripBreaker => hardStart ? "NEC 430.52(C)(3)(b)(2)" : "NEC 430.52(C)(3)",
        _ => hardStart ? "NEC 430.52(C)(1)(b)" : "NEC 430.52(C)(1)",
    };

    /// <summary>
    /// 430.52(C)(3)(b)(3): for a full-load current of 8 A or less, an instantaneous-trip breaker of
    /// 15 A or less in a listed combination motor controller may be set up to the value marked on the
    /// controller. The list carries no marking, so the table limit stands and the message says so.
    /// </summary>
    private static string SmallMotorCombinationNote(ProtectiveDevice device, decimal flc) =>
        device == ProtectiveDevice.InstantaneousTripBreaker && flc <= 8m
            ? "; NEC 430.52(C)(3)(b)(3) permits a higher setting, up to the value marked on the listed combination motor controller, for a breaker of 15 A or less continuous rating on a motor of 8 A or less: the list carries no such marking, so it is not assumed"
            : "";
}
