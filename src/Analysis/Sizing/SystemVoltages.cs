using MotorLang.Domain;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Motors are rated at the utilization voltage, a little below the nominal system voltage that
/// supplies them. Within the headnote ranges of Tables 430.248 and 430.250 (110–120, 220–240,
/// 440–480, 550–600 V) any pair works; these are the usual pairs outside those ranges.
/// </summary>
internal static class SystemVoltages
{
    // Nominal system voltage → the motor rating made for it. 208 V systems take 200 V motors, 2400 V
    // and 4160 V systems 2300 V and 4000 V motors (ANSI C84.1 nominal system voltages with the NEMA
    // MG 1 motor utilization voltages, from memory), and a 250 V dc bus 240 V dc motors (common
    // practice, no source).
    private static readonly (decimal System, decimal Motor, bool Dc)[] Pairs =
    [
        (208m, 200m, false),
        (2400m, 2300m, false),
        (4160m, 4000m, false),
        (250m, 240m, true),
    ];

    public static bool IsUsualPair(decimal system, decimal motor, Phases phases) =>
        Pairs.Any(p => p.System == system && p.Motor == motor && p.Dc == (phases == Phases.Dc));

    /// <summary>Above this, Article 430 Part XI governs and MotorLang sizes nothing.</summary>
    public const decimal LowVoltageLimit = 1000m;
}
