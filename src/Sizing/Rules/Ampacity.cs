using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Conductor ampacity from Table 310.16, corrected for ambient and adjusted for bundling, then
/// limited by the terminations (110.14(C)). Corrections start from the insulation's own column,
/// as 310.15(B) allows; the result may not exceed the termination column's value.
/// </summary>
public static class Ampacity
{
    /// <summary>The ampacity a wire may carry under these conditions, with each factor as a step.</summary>
    public static Result<decimal> Allowable(WireSpec wire, InstallationConditions c, bool designBcdMotor = false) =>
        Compute(wire, c, designBcdMotor, new List<Step>());

    /// <summary>
    /// The allowable ampacity as a number only (null where <see cref="Allowable"/> has none): the
    /// same computation without writing its steps, for searching many sizes.
    /// </summary>
    public static decimal? AllowableAmps(WireSpec wire, InstallationConditions c, bool designBcdMotor = false) =>
        Compute(wire, c, designBcdMotor, null).Value;

    /// <summary>One computation for both: steps are written only when a list is given to write them to.</summary>
    private static Result<decimal> Compute(WireSpec wire, InstallationConditions c, bool designBcdMotor, List<Step>? steps)
    {
        var material = c.Material == ConductorMaterial.Copper ? "cu" : "al";
        var row = CodeTables.RowFor(CodeTables.Ampacity, wire.Size);
        var insulation = Math.Clamp(c.InsulationRating, 60, 90) switch { < 75 => 60, < 90 => 75, _ => 90 };
        var baseAmps = row is null ? null : CsvTable.Number(row[CodeTables.Ampacity.Column($"{material}{insulation}")]);
        if (baseAmps is null)
            return steps is null ? Result<decimal>.Missing("") : Result<decimal>.Missing($"Table 310.16 has no {insulation} °C {(material == "cu" ? "copper" : "aluminum")} ampacity for {wire.Size}");
        steps?.Add(Step.Amps("Table ampacity", baseAmps.Value, "NEC Table 310.16",
            $"{wire.Size} {(material == "cu" ? "copper" : "aluminum")}, {insulation} °C column"));

        var ambient = AmbientFactor(c.AmbientCelsius, insulation);
        if (ambient is null)
            return steps is null ? Result<decimal>.Missing("") : Result<decimal>.Missing($"{insulation} °C conductors may not be used at {Format.Number(c.AmbientCelsius)} °C ambient (Table 310.15(B)(1)(1))", [.. steps]);
        if (ambient != 1m)
            steps?.Add(new Step("Ambient correction", $"× {Format.Number(ambient.Value)}", "NEC Table 310.15(B)(1)(1)",
                $"{Format.Number(c.AmbientCelsius)} °C ambient, {insulation} °C conductor"));

        var adjustment = AdjustmentFactor(c.CurrentCarrying);
        if (adjustment != 1m)
            steps?.Add(new Step("Bundling adjustment", $"× {Format.Number(adjustment)}", "NEC Table 310.15(C)(1)",
                $"{c.CurrentCarrying} current-carrying conductors in the raceway"));

        var corrected = baseAmps.Value * ambient.Value * adjustment;
        var termination = TerminationRating(wire.Size, c, designBcdMotor, out var terminationRule);
        // A written termination rating that is no column of the table (8 °C, 105 °C) names no limit
        // the code gives: nothing is worked out rather than a column guessed.
        if (termination is not (60 or 75 or 90))
            return steps is null ? Result<decimal>.Missing("") : Result<decimal>.Missing(
                $"a termination rating of {termination} °C is not a column of Table 310.16 (60, 75 or 90 °C), so the 110.14(C) limit is unknown", [.. steps]);
        var limitColumn = Math.Min(termination, insulation);
        var limit = CsvTable.Number(row![CodeTables.Ampacity.Column($"{material}{limitColumn}")]);
        var perSet = limit is { } l && l < corrected ? l : corrected;
        if (steps is null) return new Result<decimal>(perSet * wire.Sets, []);
        if (limit is { } lim && lim < corrected)
            steps.Add(Step.Amps("Termination limit", lim, terminationRule, $"{termination} °C terminations: the {limitColumn} °C column limits the corrected {Format.Amps(corrected)}"));
        else if (corrected != baseAmps)
            steps.Add(Step.Amps("Corrected ampacity", corrected, "NEC 310.15(B), 310.15(C)", "table ampacity × factors"));

        var total = perSet * wire.Sets;
        if (wire.Sets > 1)
            steps.Add(Step.Amps("Parallel sets", total, "NEC 310.10(G)", $"{wire.Sets} sets × {Format.Amps(perSet)}"));
        steps.Add(Step.Amps("Allowable ampacity", total, "NEC 310.14", $"{wire}"));
        return new Result<decimal>(total, [.. steps]);
    }

    /// <summary>Table 310.15(B)(1)(1); null when the conductor is not usable at that ambient.</summary>
    public static decimal? AmbientFactor(decimal celsius, int insulation)
    {
        var t = CodeTables.AmbientCorrection;
        // Rows are whole degrees; a fraction above a row's upper end belongs to the next, hotter row.
        var row = t.Rows.FirstOrDefault(r => celsius <= CsvTable.Number(r[1]));
        return row is null ? null : CsvTable.Number(row[t.Column($"t{insulation}")]);
    }

    /// <summary>Table 310.15(C)(1): 1 for three or fewer current-carrying conductors.</summary>
    public static decimal AdjustmentFactor(int currentCarrying)
    {
        var t = CodeTables.CccAdjustment;
        var row = t.Rows.First(r => currentCarrying <= CsvTable.Number(r[1]));
        return CsvTable.Number(row[2])!.Value / 100m;
    }

    /// <summary>
    /// 110.14(C)(1): the marked rating when given; otherwise 60 °C for 14 through 1 AWG (circuits of
    /// 100 A or less), 75 °C for larger, and 75 °C for design B, C and D motors (110.14(C)(1)(a)(4)).
    /// </summary>
    public static int TerminationRating(ConductorSize size, InstallationConditions c, bool designBcdMotor, out string rule)
    {
        if (c.TerminationRating is { } marked)
        {
            rule = "NEC 110.14(C)";
            return marked;
        }

        if (size <= OneAwg)
        {
            rule = designBcdMotor ? "NEC 110.14(C)(1)(a)(4)" : "NEC 110.14(C)(1)(a)";
            return designBcdMotor ? 75 : 60;
        }

        rule = "NEC 110.14(C)(1)(b)";
        return 75;
    }

    private static readonly ConductorSize OneAwg = ConductorSize.Parse("1");
    private static readonly ConductorSize SmallestCopper = ConductorSize.Parse("14");
    private static readonly ConductorSize SmallestAluminum = ConductorSize.Parse("12");

    /// <summary>Largest single conductor chosen before going to parallel sets: common practice, no source.</summary>
    public static readonly ConductorSize LargestSingle = ConductorSize.Parse("500");

    /// <summary>Smallest conductor that may be run in parallel (310.10(G)(1)).</summary>
    private static readonly ConductorSize SmallestParallel = ConductorSize.Parse("1/0");

    /// <summary>Every arrangement <see cref="Minimum"/> tries, in the order it tries them (before the smallest size is applied).</summary>
    private static readonly WireSpec[] Arrangements =
    [
        .. ConductorSize.All.Where(s => s <= LargestSingle).Select(WireSpec.Single),
        .. Enumerable.Range(2, 9).SelectMany(sets => ConductorSize.All.Where(s => s >= SmallestParallel && s <= LargestSingle).Select(s => new WireSpec(sets, s))),
        .. ConductorSize.All.Where(s => s > LargestSingle).Select(WireSpec.Single),
    ];

    /// <summary>
    /// The smallest wire whose allowable ampacity is at least <paramref name="required"/>: one conductor per
    /// phase up to 500 kcmil, then parallel sets (1/0 and larger, 310.10(G)) of up to 500 kcmil each, as most
    /// designers would install them; conductors above 500 kcmil only when ten sets would not do.
    /// </summary>
    public static Result<WireSpec> Minimum(decimal required, InstallationConditions c, bool designBcdMotor = false, ConductorSize? smallest = null)
    {
        var start = smallest ?? (c.Material == ConductorMaterial.Copper ? SmallestCopper : SmallestAluminum);
        foreach (var wire in Arrangements)
        {
            if (wire.Size < start) continue;
            if (AllowableAmps(wire, c, designBcdMotor) >= required) return Chosen(wire, required, Allowable(wire, c, designBcdMotor));
        }

        // Say why when no wire has an ampacity at all here (too hot an ambient for the insulation).
        var why = Allowable(WireSpec.Single(start), c, designBcdMotor).Unavailable;
        return Result<WireSpec>.Missing(string.IsNullOrEmpty(why) ? $"no conductor arrangement up to 10 parallel sets carries {Format.Amps(required)}" : why);
    }

    private static Result<WireSpec> Chosen(WireSpec wire, decimal required, Result<decimal> allowable) =>
        new(wire, [.. allowable.Steps, new Step("Minimum conductor", wire.ToString(), "NEC 310.14",
            $"smallest size whose allowable {Format.Amps(allowable.Value!.Value)} ≥ required {Format.Amps(required)}")]);
}
