using MotorLang.Sizing.Domain;
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
    public static Result<decimal> Allowable(WireSpec wire, InstallationConditions c, bool designBcdMotor = false)
    {
        var steps = new List<Step>();
        var material = c.Material == ConductorMaterial.Copper ? "cu" : "al";
        var row = CodeTables.RowFor(CodeTables.Ampacity, wire.Size);
        var insulation = Math.Clamp(c.InsulationRating, 60, 90) switch { < 75 => 60, < 90 => 75, _ => 90 };
        var baseAmps = row is null ? null : CsvTable.Number(row[CodeTables.Ampacity.Column($"{material}{insulation}")]);
        if (baseAmps is null)
            return Result<decimal>.Missing($"Table 310.16 has no {insulation} °C {(material == "cu" ? "copper" : "aluminum")} ampacity for {wire.Size}");
        steps.Add(Step.Amps("Table ampacity", baseAmps.Value, "NEC Table 310.16",
            $"{wire.Size} {(material == "cu" ? "copper" : "aluminum")}, {insulation} °C column"));

        var ambient = AmbientFactor(c.AmbientCelsius, insulation);
        if (ambient is null)
            return Result<decimal>.Missing($"{insulation} °C conductors may not be used at {Format.Number(c.AmbientCelsius)} °C ambient (Table 310.15(B)(1)(1))", [.. steps]);
        if (ambient != 1m)
            steps.Add(new Step("Ambient correction", $"× {Format.Number(ambient.Value)}", "NEC Table 310.15(B)(1)(1)",
                $"{Format.Number(c.AmbientCelsius)} °C ambient, {insulation} °C conductor"));

        var adjustment = AdjustmentFactor(c.CurrentCarrying);
        if (adjustment != 1m)
            steps.Add(new Step("Bundling adjustment", $"× {Format.Number(adjustment)}", "NEC Table 310.15(C)(1)",
                $"{c.CurrentCarrying} current-carrying conductors in the raceway"));

        var corrected = baseAmps.Value * ambient.Value * adjustment;
        var termination = TerminationRating(wire.Size, c, designBcdMotor, out var terminationRule);
        var limitColumn = Math.Min(termination, insulation);
        var limit = CsvTable.Number(row![CodeTables.Ampacity.Column($"{material}{limitColumn}")]);
        var perSet = limit is { } l && l < corrected ? l : corrected;
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

        if (size <= ConductorSize.Parse("1"))
        {
            rule = designBcdMotor ? "NEC 110.14(C)(1)(a)(4)" : "NEC 110.14(C)(1)(a)";
            return designBcdMotor ? 75 : 60;
        }

        rule = "NEC 110.14(C)(1)(b)";
        return 75;
    }

    /// <summary>Largest single conductor chosen before going to parallel sets: common practice, no source.</summary>
    public static readonly ConductorSize LargestSingle = ConductorSize.Parse("500");

    /// <summary>
    /// The smallest wire whose allowable ampacity is at least <paramref name="required"/>: one conductor per
    /// phase up to 500 kcmil, then parallel sets (1/0 and larger, 310.10(G)) of up to 500 kcmil each, as most
    /// designers would install them; conductors above 500 kcmil only when ten sets would not do.
    /// </summary>
    public static Result<WireSpec> Minimum(decimal required, InstallationConditions c, bool designBcdMotor = false, ConductorSize? smallest = null)
    {
        var start = smallest ?? ConductorSize.Parse(c.Material == ConductorMaterial.Copper ? "14" : "12");
        var candidates = ConductorSize.All.Where(s => s >= start && s <= LargestSingle).Select(WireSpec.Single)
            .Concat(Enumerable.Range(2, 9).SelectMany(sets => ConductorSize.All
                .Where(s => s >= ConductorSize.Parse("1/0") && s >= start && s <= LargestSingle).Select(s => new WireSpec(sets, s))))
            .Concat(ConductorSize.All.Where(s => s > LargestSingle).Select(WireSpec.Single));
        foreach (var wire in candidates)
        {
            var r = Allowable(wire, c, designBcdMotor);
            if (r.Value >= required) return Chosen(wire, required, r);
        }

        return Result<WireSpec>.Missing($"no conductor arrangement up to 10 parallel sets carries {Format.Amps(required)}");
    }

    private static Result<WireSpec> Chosen(WireSpec wire, decimal required, Result<decimal> allowable) =>
        new(wire, [.. allowable.Steps, new Step("Minimum conductor", wire.ToString(), "NEC 310.14",
            $"smallest size whose allowable {Format.Amps(allowable.Value!.Value)} ≥ required {Format.Amps(required)}")]);
}
