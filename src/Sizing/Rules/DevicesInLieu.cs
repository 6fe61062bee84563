using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Branch devices 430.52(C) permits in lieu of the four columns of Table 430.52(C)(1): motor
/// short-circuit protectors ((C)(7)), self-protected combination controllers ((C)(6)) and fuses
/// for power electronic devices ((C)(5)).
/// </summary>
public static class DevicesInLieu
{
    public static Result<decimal> Maximum(ProtectionInput p) => p.Device switch
    {
        ProtectiveDevice.MotorShortCircuitProtector => Setting(p, "NEC 430.52(C)(7)",
            "motor short-circuit protector, permitted only as part of a listed combination motor controller with coordinated overload and short-circuit and ground-fault protection in each conductor"),
        ProtectiveDevice.SelfProtectedController => Setting(p, "NEC 430.52(C)(6)",
            "listed self-protected combination controller, permitted in lieu of the Table 430.52(C)(1) devices"),
        ProtectiveDevice.SemiconductorFuse => Result<decimal>.Missing(
            "NEC 430.52(C)(5) permits suitable fuses for the power electronic devices of a solid-state controller where the replacement fuses are marked beside them; the code gives no percentage, so their rating is the one the manufacturer marks (110.3(B)), which the list does not carry",
            new Step("Semiconductor fuses", "as marked", "NEC 430.52(C)(5)", "rating as marked beside the fuses for replacement; no code percentage")),
        _ => throw new ArgumentOutOfRangeException(nameof(p), p.Device, "a Table 430.52(C)(1) device"),
    };

    /// <summary>The 1300 % limit, 1700 % for design B energy-efficient and premium efficiency motors: a setting, not rounded to a standard rating.</summary>
    private static Result<decimal> Setting(ProtectionInput p, string rule, string what)
    {
        var (row, rowName) = ShortCircuitProtection.Row(p);
        var percent = row == "design-b-premium" ? 1700m : 1300m;
        var limit = p.FullLoadAmps * percent / 100m;
        return Result<decimal>.Of(limit,
            new Step("Device", ShortCircuitProtection.DeviceName(p.Device), rule, what),
            new Step("Limit", Format.Percent(percent), rule, $"{rowName}: {(percent == 1700m ? "design B energy-efficient and premium efficiency motors" : "motors other than design B energy-efficient or premium efficiency")}"),
            Step.Amps("Maximum setting", limit, rule, $"{Format.Percent(percent)} × {Format.Amps(p.FullLoadAmps)}; a setting, not rounded to a standard rating"));
    }
}
