using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Equipment grounding conductors, 250.122.</summary>
public static class Grounding
{
    /// <summary>
    /// Table 250.122 from the rating of the overcurrent device ahead of the circuit (for a motor
    /// circuit, the branch short-circuit and ground-fault device, 250.122(D)(1)); never larger than
    /// the circuit conductors (250.122(A)); increased in proportion to circular-mil area where the
    /// phase conductors were upsized beyond what ampacity needs (250.122(B)).
    /// </summary>
    public static Result<ConductorSize> Minimum(decimal deviceAmps, ConductorMaterial material, WireSpec? phase = null,
        WireSpec? phaseMinimum = null, string deviceRule = "NEC 250.122(D)(1)")
    {
        var t = CodeTables.GroundingConductors;
        var row = t.Rows.FirstOrDefault(r => deviceAmps <= CsvTable.Number(r[0]));
        if (row is null) return Result<ConductorSize>.Missing($"Table 250.122 stops at 6000 A; {Format.Amps(deviceAmps)} is beyond it");
        var size = ConductorSize.Parse(row[material == ConductorMaterial.Copper ? 1 : 2]);
        var steps = new List<Step>
        {
            new("Grounding conductor", size.ToString(), "NEC Table 250.122", $"device rated {Format.Amps(deviceAmps)} (row {row[0]} A); {deviceRule}"),
        };

        if (phase is { } p && phaseMinimum is { } min && Area(p) > Area(min))
        {
            var ratio = Area(p) / Area(min);
            var needed = Area(WireSpec.Single(size)) * ratio;
            // (18 AWG is the default size, so "none found" is told apart by nullable, not by default.)
            var found = ConductorSize.All.Where(s => s >= size && Cmil(s) >= needed).Cast<ConductorSize?>().FirstOrDefault();
            // No size is large enough for the increase: never fall back to the unincreased size in silence.
            // A single set is capped at its phase conductor anyway (250.122(A), below).
            ConductorSize upsized;
            if (found is { } f) upsized = f;
            else if (phase is { Sets: 1 }) upsized = ConductorSize.Largest;
            else
                return Result<ConductorSize>.Missing(
                    $"the 250.122(B) increase needs {Format.Number(needed)} cmil, more than the largest conductor size carried", [.. steps]);
            if (upsized > size)
            {
                size = upsized;
                steps.Add(new Step("Upsized grounding conductor", size.ToString(), "NEC 250.122(B)",
                    $"phase conductors are {Format.Number(ratio)} × the minimum area, so the grounding conductor grows in proportion"));
            }
        }

        if (phase is { Sets: 1 } single && size > single.Size)
        {
            size = single.Size;
            steps.Add(new Step("Grounding conductor", size.ToString(), "NEC 250.122(A)", "need not be larger than the circuit conductors"));
        }

        return new Result<ConductorSize>(size, [.. steps]);
    }

    /// <summary>250.122(D)(2): for an instantaneous-trip breaker or a motor short-circuit protector, size from the dual-element fuse the table would allow.</summary>
    public static Result<ConductorSize> ForInstantaneousTrip(ProtectionInput p, ConductorMaterial material, WireSpec? phase = null, WireSpec? phaseMinimum = null)
    {
        var fuse = ShortCircuitProtection.Maximum(p with { Device = ProtectiveDevice.DualElementFuse, HardStart = false, ClassCc = false });
        if (fuse.Value is not { } amps) return Result<ConductorSize>.Missing(fuse.Unavailable ?? "no fuse rating");
        return Minimum(amps, material, phase, phaseMinimum, "NEC 250.122(D)(2): the dual-element fuse rating 430.52(C)(1) would allow");
    }

    /// <summary>Conductor area in circular mils (Chapter 9 Table 8).</summary>
    public static decimal Cmil(ConductorSize size) =>
        CsvTable.Number(CodeTables.RowFor(CodeTables.DcResistance, size)![CodeTables.DcResistance.Column("cmil")])!.Value;

    private static decimal Area(WireSpec w) => Cmil(w.Size) * w.Sets;
}
