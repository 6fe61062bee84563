using MotorLang.Analysis.Power;
using MotorLang.Parser.Model;
using MotorLang.Parser.Values;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules.Faults;

namespace MotorLang.Analysis.Editing;

/// <summary>The hover's fault-current sections: the value at a point step by step with the method, and each rating against it.</summary>
public static class FaultSections
{
    public const string Heading = "Available fault current";

    public static IEnumerable<BreakdownSection> ForFeeder(FeederFault fault)
    {
        var f = fault.Feeder;
        if (fault.Transformer is null && f.Interrupting is not null)
            yield return Point($"{Heading} at {fault.Supply.Name} (supply end, 110.9)", fault.Supply, f.Interrupting, "interrupting rating");
        yield return Point($"{Heading} at {fault.Bus.Name}", fault.Bus, f.Sccr, "bus SCCR",
            fault.Transformer is not null && f.Interrupting is { } ir ? (ir, "secondary device's interrupting rating") : null);
        if (fault.Transformer is not { } t) yield break;
        if (f.PrimaryInterrupting is not null)
            yield return Point($"{Heading} at the transformer's primary device", fault.Supply, f.PrimaryInterrupting, "primary interrupting rating");
        if (t.ProtectionNotChecked is { } why)
        {
            yield return new BreakdownSection("Transformer protection (Table 450.3(B))", [], why);
            yield break;
        }

        var rated = new Step("Rated currents", $"{Format.Amps(decimal.Round(t.PrimaryAmps, 2))} primary, {Format.Amps(decimal.Round(t.SecondaryAmps, 2))} secondary",
            "kVA × 1000 ÷ (√3 × V)", $"{Format.Number(t.Kva)} kVA at {Format.Number(t.PrimaryVolts)} V and {Format.Number(t.SecondaryVolts)} V");
        yield return new BreakdownSection($"Transformer primary protection (Table 450.3(B), {TransformerProtection.Name(t.Method!.Value)})",
            [rated, .. t.PrimaryMaximum!.Steps], AtMost(f.PrimaryProtectionRating?.Value.Value, t.PrimaryMaximum.Value));
        if (t.SecondaryMaximum is { } smax)
            yield return new BreakdownSection("Transformer secondary protection (Table 450.3(B))", [rated, .. smax.Steps], AtMost(f.ProtectionRating?.Value.Value, smax.Value));
        if (t.Secondary is { } sc)
            yield return new BreakdownSection($"Secondary conductors ({sc.Subsection ?? "240.21(C)"})", sc.MinimumAmpacity.Steps,
                sc.MinimumAmpacity.Unavailable ?? $"at least {Format.Amps(decimal.Round(sc.MinimumAmpacity.Value!.Value, 1))} ampacity");
    }

    public static IEnumerable<BreakdownSection> ForMotor(MotorNode motor, FaultPoint bus)
    {
        var note = new Step("Where the controller stands", bus.Name, "conservative reading",
            "the controller and branch device are taken to stand at the feeder's bus (in the MCC): branch conductors ahead of them would only lower the current");
        var section = Point($"{Heading} at the controller", bus, motor.Sccr, "controller SCCR",
            motor.Interrupting is { } ir ? (ir, "branch device's interrupting rating") : null);
        yield return section with { Steps = [note, .. section.Steps] };
    }

    public static BreakdownSection ForService(FaultPoint service) =>
        Point($"{Heading} at the service (to be documented, 110.24)", service, null, "");

    private static BreakdownSection Point(string heading, FaultPoint at, Located<Quantity>? rating, string what,
        (Located<Quantity> Rating, string What)? other = null)
    {
        if (at.WithMotors.Value is not { } available)
            return new BreakdownSection(heading, at.Bolted.Steps, $"not checked: {at.Bolted.Unavailable}");
        var verdicts = new List<string>();
        if (rating is { } r) verdicts.Add(Verdict(r.Value.Value, available, what));
        if (other is { } o) verdicts.Add(Verdict(o.Rating.Value.Value, available, o.What));
        var summary = $"{FaultCurrent.KiloAmps(at.Bolted.Value!.Value)} bolted, {FaultCurrent.KiloAmps(available)} with motors, X/R {(at.XOverR is { } k ? Format.Number(k) : "—")}";
        return new BreakdownSection(heading, at.WithMotors.Steps, string.Join("; ", verdicts.Prepend(summary)));
    }

    private static string Verdict(decimal kiloAmps, decimal available, string what) =>
        kiloAmps * 1000m >= available
            ? $"✓ {what} {Format.Number(kiloAmps)} kA ≥ {FaultCurrent.KiloAmps(available)}"
            : $"✗ {what} {Format.Number(kiloAmps)} kA < {FaultCurrent.KiloAmps(available)}";

    private static string? AtMost(decimal? written, decimal? limit) =>
        written is not { } w || limit is not { } l ? null
        : w <= l ? $"✓ {Format.Amps(w)} is at most {Format.Amps(l)}" : $"✗ {Format.Amps(w)} is above {Format.Amps(l)}";
}
