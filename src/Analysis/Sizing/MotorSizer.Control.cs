using MotorLang.Analysis.Findings;
using MotorLang.Domain;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// A motor's control circuit, tapped from the load side of its branch device (430.72): the
/// control conductors' protection against Table 430.72(B), and a control transformer's primary
/// protection (430.72(C)). The number of overload units (430.37) is checked here too.
/// </summary>
internal sealed partial class MotorSizer
{
    private void CheckControlCircuit(MotorNode motor, MotorResult r, Resolution.Settings settings)
    {
        var wire = Get(motor, m => m.ControlWire, out var wireOwner);
        var protection = Get(motor, m => m.ControlProtection, out var protectionOwner);
        var rating = Get(motor, m => m.ControlTransformerRating, out var transformerOwner);
        var primaryVolts = Get(motor, m => m.ControlTransformerPrimary)?.Value.Value;
        var secondaryVolts = Get(motor, m => m.ControlTransformerSecondary)?.Value.Value;
        var primaryDevice = Get(motor, m => m.ControlPrimaryProtection, out var primaryOwner);
        if (wire is null && protection is null && rating is null && primaryDevice is null) return;
        var first = wire?.Range ?? protection?.Range ?? rating?.Range ?? primaryDevice!.Range;
        var firstOwner = wire is not null ? wireOwner : protection is not null ? protectionOwner : rating is not null ? transformerOwner : primaryOwner;
        if (r.FireService == FireServiceRole.FirePump)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, firstOwner, first),
                "a fire pump's control circuit is not checked: where opening it would create a hazard, 430.72(B) Exception No. 1 and 430.72(C) Exception call for short-circuit protection only, and 695.14 governs its wiring");
            return;
        }

        var material = Get(motor, m => m.ControlWireMaterial)?.Value ?? settings.Conditions.Material;
        var materialStep = Get(motor, m => m.ControlWireMaterial) is null
            ? new Step("Control conductor material", material == ConductorMaterial.Copper ? "copper" : "aluminum", "NEC 430.72(B)",
                "not written on 'control-wire': taken from the block's conductor setting")
            : null;

        if (rating is not null && primaryVolts is { } vp && secondaryVolts is { } vs)
        {
            CheckControlTransformer(motor, r, wire, wireOwner, protection, protectionOwner, rating, primaryDevice, primaryOwner, vp, vs, material, materialStep);
            return;
        }

        if (primaryDevice is not null)
            Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, primaryOwner, primaryDevice.Range),
                "'control-primary-protection' is the control transformer's primary device (NEC 430.72(C)); there is no 'control-transformer' on this motor, so it is not used");
        if (wire is null)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, protectionOwner, protection!.Range),
                "the control circuit's protection cannot be checked without its conductors: write 'control-wire' (NEC 430.72(B))");
            return;
        }

        r.ControlCircuitChecked = true;
        if (protection is not null)
        {
            // 430.72(B)(1): a separate device in the control circuit, Column A.
            var limit = WithMaterial(ControlCircuits.Maximum(wire.Value, material, ControlColumn.Separate), materialStep);
            r.ControlConductorLimit = limit;
            r.ControlConductorDevice = protection.Value.Value;
            CheckSeparateControlProtection(motor, protection, protectionOwner, wire, wireOwner, limit, "NEC 430.72(B)(1), Table 430.72(B) Column A");
            return;
        }

        // 430.72(B)(2): protected by the motor branch device alone, Column B or C.
        var route = Get(motor, m => m.ControlRoute)?.Value;
        var column = route == ControlRoute.WithinEnclosure ? ControlColumn.BranchWithinEnclosure : ControlColumn.BranchBeyondEnclosure;
        var routeStep = route is null
            ? new Step("Control conductors' route", "leave the enclosure", "NEC 430.72(B)(2)",
                "not written: taken to extend beyond the motor control equipment enclosure, the smaller Column C (conservative reading)")
            : null;
        var branchLimit = WithMaterial(ControlCircuits.Maximum(wire.Value, material, column), materialStep, routeStep);
        var device = r.ProtectionRating;
        var deviceStep = device is { } d
            ? Step.Amps("Motor branch device", d, "NEC 430.72(B)(2)", "the control conductors' only protection: no 'control-protection' is written")
            : r.MaximumProtection?.Value is { } most
                ? Step.Amps("Motor branch device", most, "NEC 430.72(B)(2), 430.52", "no rating written: the largest 430.52 permits")
                : null;
        device ??= r.MaximumProtection?.Value;
        r.ControlConductorLimit = deviceStep is null || branchLimit.Value is null ? branchLimit
            : new Result<decimal>(branchLimit.Value, [.. branchLimit.Steps, deviceStep]);
        r.ControlConductorDevice = device;
        if (branchLimit.Value is not { } max)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, wireOwner, wire.Range),
                $"the control conductors' protection by the motor branch device cannot be checked: {branchLimit.Unavailable}");
            return;
        }

        if (device is not { } branch)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, wireOwner, wire.Range),
                $"the control conductors may be protected by the motor branch device only up to {Format.Amps(max)} (NEC 430.72(B)(2)); the branch device has no rating to compare");
            return;
        }

        if (branch <= max) return;
        var separate = ControlCircuits.Maximum(wire.Value, material, ControlColumn.Separate).Value;
        Add(FindingCodes.ControlBranchDeviceTooLarge, Severity.Error, RangeOn(motor, wireOwner, wire.Range),
            $"control wire {wire.Value} is protected only by the {Format.Amps(branch)} motor branch device; NEC 430.72(B)(2) allows at most {Format.Amps(max)} ({ControlCircuits.Name(column)})"
            + (separate is { } a ? $": add a control circuit device of at most {Format.Amps(a)} (Column A)" : ""),
            separate is { } amps ? Insert(motor, $"control-protection {Format.Number(amps)}A", $"Add control circuit protection of {Format.Amps(amps)}") : null);
    }

    private void CheckControlTransformer(MotorNode motor, MotorResult r, Located<WireSpec>? wire, MotorNode? wireOwner,
        Located<Quantity>? protection, MotorNode? protectionOwner, Located<Quantity> rating, Located<Quantity>? primaryDevice, MotorNode? primaryOwner,
        decimal vp, decimal vs, ConductorMaterial material, Step? materialStep)
    {
        r.ControlCircuitChecked = true;
        r.HasControlTransformer = true;
        var va = rating.Value.Unit == Unit.Kva ? rating.Value.Value * 1000m : rating.Value.Value;

        // 450.3(B)'s 250 % primary needs a secondary device within its own limit (430.72(C)(2)).
        var secondaryWithinLimit = false;
        if (protection is not null)
        {
            r.ControlSecondaryLimit = ControlCircuits.SecondaryMaximum(va, vs);
            secondaryWithinLimit = r.ControlSecondaryLimit.Value is { } secondaryMax && protection.Value.Value <= secondaryMax;
            if (!secondaryWithinLimit && r.ControlSecondaryLimit.Value is { } over)
                r.ControlSecondaryLimit = new Result<decimal>(over, [.. r.ControlSecondaryLimit.Steps,
                    Step.Amps("Secondary device", protection.Value.Value, "NEC 430.72(C)(2), Table 450.3(B)",
                        "above the secondary limit, so the primary is held to the primary-only column")]);
        }

        r.ControlPrimaryLimit = ControlCircuits.PrimaryMaximum(va, vp, secondaryWithinLimit);
        r.ControlPrimaryDevice = primaryDevice?.Value.Value;
        var primaryMax = r.ControlPrimaryLimit.Value!.Value;
        if (primaryDevice is null)
        {
            Add(FindingCodes.ControlTransformerUnprotected, Severity.Warning, RangeOn(motor, null, rating.Range),
                va < 50m
                    ? $"no primary device given for the {Format.Number(va)} VA control transformer: under 50 VA, NEC 430.72(C)(3) permits primary devices, impedance limiting or other inherent means if it is part of the controller and inside its enclosure; a primary device may be at most {Format.Amps(primaryMax)} (430.72(C))"
                    : $"no primary device given for the {Format.Number(va)} VA control transformer; NEC 430.72(C) requires protection, a primary device of at most {Format.Amps(primaryMax)} (or other approved means, 430.72(C)(5))");
        }
        else if (primaryDevice.Value.Value > primaryMax)
        {
            Add(FindingCodes.ControlTransformerPrimaryTooLarge, Severity.Error, RangeOn(motor, primaryOwner, primaryDevice.Range),
                $"control transformer primary device {Format.Amps(primaryDevice.Value.Value)} is above the {Format.Amps(primaryMax)} NEC 430.72(C) allows for {Format.Number(va)} VA at {Format.Number(vp)} V"
                + (secondaryWithinLimit ? "" : protection is null ? " with no secondary device" : " with a secondary device above its Table 450.3(B) limit"));
        }

        if (wire is null)
        {
            if (protection is not null)
                Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, protectionOwner, protection.Range),
                    "the control circuit's protection cannot be checked against its conductors without 'control-wire' (NEC 430.72(B)); the transformer's protection is checked");
            return;
        }

        if (protection is not null)
        {
            var limit = WithMaterial(ControlCircuits.Maximum(wire.Value, material, ControlColumn.Separate), materialStep);
            r.ControlConductorLimit = limit;
            r.ControlConductorDevice = protection.Value.Value;
            CheckSeparateControlProtection(motor, protection, protectionOwner, wire, wireOwner, limit, "NEC 430.72(B)(1), Table 430.72(B) Column A");
            return;
        }

        // 430.72(B) Exception No. 2: the secondary conductors protected by the primary device alone.
        var throughPrimary = WithMaterial(ControlCircuits.PrimaryProtectingSecondary(wire.Value, material, vp, vs), materialStep);
        r.ControlConductorLimit = throughPrimary;
        r.ControlConductorDevice = primaryDevice?.Value.Value;
        if (throughPrimary.Value is not { } max)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, wireOwner, wire.Range),
                $"the control transformer's secondary conductors cannot be checked: {throughPrimary.Unavailable}");
            return;
        }

        if (primaryDevice is null || primaryDevice.Value.Value <= max) return;
        var columnA = ControlCircuits.Maximum(wire.Value, material, ControlColumn.Separate).Value;
        Add(FindingCodes.ControlSecondaryUnprotected, Severity.Error, RangeOn(motor, primaryOwner, primaryDevice.Range),
            $"the secondary conductors ({wire.Value}) have no device of their own, and the {Format.Amps(primaryDevice.Value.Value)} primary device is above the {Format.Amps(max)} that NEC 430.72(B) Exception No. 2 allows ({Format.Number(vs)} V / {Format.Number(vp)} V of their Column A value)"
            + (columnA is { } a ? $": add a secondary device of at most {Format.Amps(a)}" : ""),
            columnA is { } amps ? Insert(motor, $"control-protection {Format.Number(amps)}A", $"Add secondary protection of {Format.Amps(amps)}") : null);
    }

    private void CheckSeparateControlProtection(MotorNode motor, Located<Quantity> protection, MotorNode? protectionOwner,
        Located<WireSpec> wire, MotorNode? wireOwner, Result<decimal> limit, string rule)
    {
        if (limit.Value is not { } max)
        {
            Add(FindingCodes.ControlCircuitNotChecked, Severity.Warning, RangeOn(motor, wireOwner, wire.Range),
                $"the control circuit's protection cannot be checked: {limit.Unavailable}");
            return;
        }

        var value = protection.Value.Value;
        if (value <= max) return;
        Add(FindingCodes.ControlProtectionTooLarge, Severity.Error, RangeOn(motor, protectionOwner, protection.Range),
            $"control circuit device {Format.Amps(value)} is above the {Format.Amps(max)} that {rule} allows for {wire.Value}",
            ReplaceOrOverride(motor, protectionOwner, "control-protection", "rating", $"{Format.Number(max)}A", $"Change the control circuit device to {Format.Amps(max)}"));
    }

    /// <summary>Puts the steps that say how the material and route were taken before the limit's own.</summary>
    private static Result<decimal> WithMaterial(Result<decimal> limit, params Step?[] before)
    {
        var extra = before.OfType<Step>().ToArray();
        return extra.Length == 0 ? limit : new Result<decimal>(limit.Value, [.. extra, .. limit.Steps], limit.Unavailable);
    }

    /// <summary>430.37: the overload device has at least as many units as Table 430.37 requires.</summary>
    private void CheckOverloadUnits(MotorNode motor, MotorResult r)
    {
        var units = Get(motor, m => m.OverloadUnits, out var owner);
        if (units is null) return;
        if (r.FireService == FireServiceRole.FirePump)
        {
            Add(FindingCodes.NotUsedHere, Severity.Warning, RangeOn(motor, owner, units.Range),
                "'overload-units' is not used on a fire pump, which has no overload protection (NEC 695.6(D))");
            return;
        }

        r.OverloadUnits = units.Value;
        r.OverloadUnitsRequired = OverloadUnits.Required(r.Phases);
        var required = r.OverloadUnitsRequired.Value!.Value;
        if (units.Value >= required) return;
        Add(FindingCodes.TooFewOverloadUnits, Severity.Error, RangeOn(motor, owner, units.Range),
            $"{units.Value} overload unit{(units.Value == 1 ? "" : "s")}; NEC Table 430.37 requires {required} for a {Describe(r.Phases)} motor"
            + (r.Phases == Phases.Three ? ", one in each phase (fewer only where other approved means protect against overload)" : ""),
            ReplaceOrOverride(motor, owner, "overload-units", "count", required.ToString(System.Globalization.CultureInfo.InvariantCulture), $"Change to {required} overload units"));
    }
}
