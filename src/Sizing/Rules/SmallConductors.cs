using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>Whether 430.22(G) lets a 16 or 18 AWG conductor supply a motor, and on what conditions.</summary>
public readonly record struct SmallConductorVerdict(bool Permitted, string Reason, string Rule);

/// <summary>
/// Conductors for small motors, 430.22(G): not smaller than 14 AWG, except 18 AWG copper up to a
/// 5 A and 16 AWG copper up to an 8 A full-load current (430.6(A)(1)), installed in a cabinet or
/// enclosure, with 430.52 short-circuit protection, overload protection of at most Class 10 or 10A
/// (Class 20 for the smaller currents: 3.5 A and less on 18 AWG, 5.5 A and less on 16 AWG) and
/// overcurrent protection per 240.4(D)(1)(2) or (D)(2)(2). Wording as printed in the 2017/2020
/// text seen; that 2023 kept these limits is from memory.
/// </summary>
public static class SmallConductors
{
    private static readonly ConductorSize Awg18 = ConductorSize.Parse("18");
    private static readonly ConductorSize Awg16 = ConductorSize.Parse("16");

    /// <summary>True for the sizes below 14 AWG, which Table 310.16 barely carries and 430.22(G) governs.</summary>
    public static bool Applies(ConductorSize size) => size <= Awg16;

    public static SmallConductorVerdict Check(ConductorSize size, ConductorMaterial material, decimal fullLoadAmps)
    {
        var is18 = size == Awg18;
        var rule = is18 ? "NEC 430.22(G)(1)" : "NEC 430.22(G)(2)";
        if (material != ConductorMaterial.Copper)
            return new(false, $"{rule} permits {size} in copper only; the smallest conductor otherwise is 14 AWG (430.22(G))", rule);
        var limit = is18 ? 5m : 8m;
        var class20Limit = is18 ? 3.5m : 5.5m;
        var protection = is18 ? "240.4(D)(1)(2)" : "240.4(D)(2)(2)";
        if (fullLoadAmps > limit)
            return new(false, $"{rule} permits {size} copper only up to {Format.Amps(limit)} full-load current, and this motor has {Format.Amps(fullLoadAmps)}", rule);
        var overloadClass = fullLoadAmps > class20Limit ? "Class 10 or 10A" : "Class 20";
        return new(true,
            $"in a cabinet or enclosure, with 430.52 short-circuit protection, overload protection of at most {overloadClass} (430.32) and overcurrent protection per {protection} ({rule})",
            rule);
    }
}
