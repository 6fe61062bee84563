using System.Collections.Immutable;
using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules.Faults;

/// <summary>
/// The three-phase bolted fault current by the ohmic (R + jX, point-by-point impedance) method:
/// the impedance of everything between the source and a point is added per phase, referred to
/// the point's voltage, and I = V ÷ (√3 × |Z|). Each function returns one element's impedance
/// with the step that explains it. Pure: values in, values out.
/// </summary>
public static class FaultCurrent
{
    /// <summary>Named in every step, so a reviewer knows which textbook method to check against.</summary>
    public const string Method = "ohmic (R + jX) method";

    /// <summary>Where the formulas come from: Ohm's law per phase; the textbook statement we recall, not looked up.</summary>
    public const string MethodReference = "ohmic method, IEEE Std 141 ch. 4 (from memory)";

    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    /// <summary>A utility's impedance from its available fault current and X/R at the service voltage: |Z| = V ÷ (√3 × I).</summary>
    public static Result<Impedance> Utility(decimal kiloAmps, decimal xOverR, decimal volts)
    {
        var z = volts / (Sqrt3 * kiloAmps * 1000m);
        var zz = Impedance.FromMagnitude(z, xOverR);
        return Result<Impedance>.Of(zz, new Step("Source impedance", zz.ToString(), MethodReference,
            $"utility {Format.Number(kiloAmps)} kA at {Format.Number(volts)} V: |Z| = {Format.Number(volts)} V ÷ (√3 × {Format.Number(kiloAmps * 1000)} A) = {Impedance.Ohms(z)} Ω, split by X/R {Format.Number(xOverR)}"));
    }

    /// <summary>
    /// A generator's impedance from its subtransient reactance: X = X"d × V² ÷ (kVA × 1000). Without
    /// an X/R it is taken as a pure reactance, which can only overstate the current.
    /// </summary>
    public static Result<Impedance> Generator(decimal kva, decimal reactancePercent, decimal? xOverR, decimal volts)
    {
        var x = reactancePercent / 100m * volts * volts / (kva * 1000m);
        var r = xOverR is { } k ? x / k : 0m;
        var z = new Impedance(r, x);
        return Result<Impedance>.Of(z, new Step("Source impedance", z.ToString(), MethodReference,
            $"generator {Format.Number(kva)} kVA, X\"d {Format.Number(reactancePercent)} %: X = {Format.Number(reactancePercent)} % × {Format.Number(volts)}² ÷ {Format.Number(kva * 1000)} VA = {Impedance.Ohms(x)} Ω; "
            + (xOverR is { } given ? $"R = X ÷ {Format.Number(given)}" : "no X/R given, so R = 0 (a pure reactance: the largest current)")));
    }

    /// <summary>A transformer's impedance referred to its secondary: |Z| = %Z/100 × Vs² ÷ (kVA × 1000), split by its X/R.</summary>
    public static Result<Impedance> Transformer(decimal kva, decimal impedancePercent, decimal xOverR, decimal secondaryVolts)
    {
        var z = impedancePercent / 100m * secondaryVolts * secondaryVolts / (kva * 1000m);
        var zz = Impedance.FromMagnitude(z, xOverR);
        return Result<Impedance>.Of(zz, new Step("Transformer impedance", zz.ToString(), MethodReference,
            $"{Format.Number(kva)} kVA, {Format.Number(impedancePercent)} %Z: |Z| = {Format.Number(impedancePercent)} % × {Format.Number(secondaryVolts)}² ÷ {Format.Number(kva * 1000)} VA = {Impedance.Ohms(z)} Ω at the secondary, split by X/R {Format.Number(xOverR)}"));
    }

    /// <summary>Which Table 9 columns stand for the raceway when working out fault current.</summary>
    /// <remarks>
    /// Table 9 has columns for PVC, aluminum and steel conduit, not for EMT. For fault current the
    /// lower impedance is the safe side, so EMT takes the PVC column (the lowest R and X): it can
    /// only overstate the fault current. RMC is steel conduit.
    /// </remarks>
    public static bool UsesPvcColumns(RacewayType raceway) => raceway != RacewayType.Rmc;

    /// <summary>
    /// A run of conductors: Chapter 9 Table 9 R and X (ohms to neutral per 1000 ft) × length ÷
    /// 1000, divided by the number of parallel sets.
    /// </summary>
    public static Result<Impedance> Conductor(WireSpec wire, decimal lengthFeet, ConductorMaterial material, RacewayType raceway)
    {
        var t = CodeTables.Impedance;
        var row = CodeTables.RowFor(t, wire.Size);
        var pvc = UsesPvcColumns(raceway);
        var rColumn = material == ConductorMaterial.Copper ? (pvc ? "r_cu_pvc" : "r_cu_steel") : (pvc ? "r_al_pvc" : "r_al_steel");
        var r = row is null ? null : CsvTable.Number(row[t.Column(rColumn)]);
        var x = row is null ? null : CsvTable.Number(row[t.Column(pvc ? "xl_pvc" : "xl_steel")]);
        if (r is null || x is null)
            return Result<Impedance>.Missing($"Chapter 9 Table 9 has no {wire.Size} {(material == ConductorMaterial.Copper ? "copper" : "aluminum")} row");
        var z = new Impedance(r.Value * lengthFeet / 1000m / wire.Sets, x.Value * lengthFeet / 1000m / wire.Sets);
        var column = pvc ? (raceway == RacewayType.Emt ? "PVC column (EMT: the lowest-impedance column, see docs/checks.md)" : "PVC column") : "steel conduit column";
        return Result<Impedance>.Of(z, new Step("Conductor impedance", z.ToString(), "NFPA 70-2023 Chapter 9 Table 9",
            $"{wire}: R {Format.Number(r.Value)} Ω, X {Format.Number(x.Value)} Ω per 1000 ft ({column}) × {Format.Number(lengthFeet)} ft ÷ 1000{(wire.Sets > 1 ? $" ÷ {wire.Sets} sets" : "")}"));
    }

    /// <summary>The three-phase bolted fault current at a point: I = V ÷ (√3 × |Z|), with the X/R there.</summary>
    public static Result<decimal> Bolted(string point, decimal volts, Impedance total)
    {
        var magnitude = total.Magnitude;
        if (magnitude == 0)
            return Result<decimal>.Missing("no impedance between an infinite bus and this point: the fault current is unbounded; write the transformer or the utility's kA");
        var amps = volts / (Sqrt3 * magnitude);
        var xr = total.XOverR is { } k ? Format.Number(k) : "no resistance (pure reactance)";
        return Result<decimal>.Of(amps,
            new Step("Impedance to the fault", $"{total} (|Z| {Impedance.Ohms(magnitude)} Ω, X/R {xr})", MethodReference, $"everything between the source and {point}, referred to {Format.Number(volts)} V"),
            new Step("Three-phase bolted fault current", KiloAmps(amps), MethodReference,
                $"{Method}: I = {Format.Number(volts)} V ÷ (√3 × {Impedance.Ohms(magnitude)} Ω) = {Format.Amps(decimal.Round(amps))}"));
    }

    /// <summary>
    /// The single-phase line-to-line bolted fault current at a point: I = V ÷ |Z|, where Z is the
    /// loop impedance (out and back) from the source to the point, referred to the point's voltage.
    /// </summary>
    public static Result<decimal> BoltedLineToLine(string point, decimal volts, Impedance loop)
    {
        var magnitude = loop.Magnitude;
        if (magnitude == 0)
            return Result<decimal>.Missing("no impedance between an infinite bus and this point: the fault current is unbounded; write the transformer or the utility's kA");
        var amps = volts / magnitude;
        var xr = loop.XOverR is { } k ? Format.Number(k) : "no resistance (pure reactance)";
        return Result<decimal>.Of(amps,
            new Step("Loop impedance to the fault", $"{loop} (|Z| {Impedance.Ohms(magnitude)} Ω, X/R {xr})", MethodReference,
                $"out and back: everything between the source and {point}, referred to {Format.Number(volts)} V"),
            new Step("Single-phase line-to-line bolted fault current", KiloAmps(amps), MethodReference,
                $"{Method}: I = {Format.Number(volts)} V ÷ {Impedance.Ohms(magnitude)} Ω = {Format.Amps(decimal.Round(amps))}"));
    }

    /// <summary>
    /// A single-phase transformer's secondary may be center-tapped, and its line-to-neutral fault at the
    /// terminals can reach about 1.5 × the line-to-line value (the point-to-point method's multiplier,
    /// from memory). The list does not say whether there is a neutral, so ratings below a single-phase
    /// transformer are held to this bound: the conservative reading.
    /// </summary>
    public const decimal LineToNeutralMultiple = 1.5m;

    /// <summary>Induction motors feed a fault for the first cycles: about 4 × their full-load current. An approximation (common practice, no source).</summary>
    public const decimal MotorContributionMultiple = 4m;

    /// <summary>Below a single-phase transformer: the motors' share on top of the line-to-neutral bound (1.5 × the line-to-line value).</summary>
    public static Result<decimal> MotorContributionBelowSinglePhase(decimal runningFullLoadAmps, decimal lineToLineAmps)
    {
        var bound = LineToNeutralMultiple * lineToLineAmps;
        var motors = MotorContributionMultiple * runningFullLoadAmps;
        return Result<decimal>.Of(bound + motors,
            new Step("Line-to-neutral bound", KiloAmps(bound), "point-to-point method (from memory); conservative reading",
                $"{Format.Number(LineToNeutralMultiple)} × {KiloAmps(lineToLineAmps)}: a center-tapped secondary's line-to-neutral fault can reach this, and the list does not say whether there is a neutral"),
            new Step("Motor contribution (approximation)", KiloAmps(motors), "common practice, no source",
                $"≈ 4 × {Format.Amps(runningFullLoadAmps)} full-load current of the running motors; an approximation, shown apart"),
            new Step("Fault current the ratings are held to", KiloAmps(bound + motors), "conservative reading",
                $"{KiloAmps(bound)} + {KiloAmps(motors)} from the motors"));
    }

    public static Result<decimal> MotorContribution(decimal runningFullLoadAmps, decimal boltedAmps)
    {
        var motors = MotorContributionMultiple * runningFullLoadAmps;
        return Result<decimal>.Of(boltedAmps + motors,
            new Step("Motor contribution (approximation)", KiloAmps(motors), "common practice, no source",
                $"≈ 4 × {Format.Amps(runningFullLoadAmps)} full-load current of the running motors; an approximation, shown apart"),
            new Step("Fault current with motor contribution", KiloAmps(boltedAmps + motors), "common practice, no source",
                $"{KiloAmps(boltedAmps)} from the source + {KiloAmps(motors)} from the motors; the ratings are checked against this larger value"));
    }

    public static string KiloAmps(decimal amps) => (amps / 1000m).ToString("0.##", System.Globalization.CultureInfo.InvariantCulture) + " kA";

    /// <summary>The rated full-load current of a three-phase transformer winding: kVA × 1000 ÷ (√3 × V).</summary>
    public static decimal RatedCurrent(decimal kva, decimal volts) => kva * 1000m / (Sqrt3 * volts);

    internal static ImmutableArray<Step> Join(params IEnumerable<Step>[] parts) => [.. parts.SelectMany(p => p)];
}
