using MotorLang.Domain;

namespace MotorLang.Sizing.Rules.Faults;

/// <summary>The voltage dip while a motor starts: at its feeder's bus and at its terminals, in percent of the system voltage.</summary>
public readonly record struct Dip(decimal BusPercent, decimal MotorPercent, decimal StartingAmps);

/// <summary>
/// The starting dip by the impedance method: the starting motor is a constant impedance drawing its
/// locked-rotor current (times its starter's factor) at rated voltage, at the low power factor of a
/// stalled motor, in series with its branch conductors and the system's impedance up to its bus
/// (source, transformers, feeders: the fault study's impedance). The voltages are then those of a
/// divider: V_motor ÷ V = |Zm| ÷ |Zs + Zb + Zm|, V_bus ÷ V = |Zb + Zm| ÷ |Zs + Zb + Zm|. The load
/// already running is left out (its own running drop is the voltage-drop check's). With a generator
/// source its impedance is X"d, so this is the initial dip, before its regulator acts.
/// </summary>
public static class StartingDip
{
    public const string Method = "impedance method (the motor at locked rotor as a constant impedance)";

    /// <summary>Where the method comes from; the textbook statement we recall, not looked up.</summary>
    public const string MethodReference = "impedance method, IEEE Std 399 ch. 9 (from memory)";

    private static readonly decimal Sqrt3 = 1.7320508075688772935274463415m;

    /// <summary>
    /// The share of full-voltage locked-rotor current a starter lets through, with where the figure
    /// comes from. A soft starter's current limit is a setting the list does not carry, so none is
    /// assumed (the larger dip); a drive draws about its overload rating, not locked-rotor current.
    /// </summary>
    public static (decimal Factor, string Source, string Why) StarterFactor(StartingMethod method) => method switch
    {
        StartingMethod.WyeDelta => (1m / 3m, "circuit relation (a delta winding connected in wye draws one third of the line current)",
            "wye-delta: one third of the full-voltage locked-rotor current"),
        StartingMethod.PartWinding => (0.7m, "common practice, no source",
            "part-winding: about 60-70 % of the full-voltage locked-rotor current; the upper end is taken (the larger dip)"),
        StartingMethod.SoftStart => (1m, "conservative reading",
            "soft start: its current limit is a setting the list does not carry, so the full locked-rotor current is taken (the larger dip)"),
        _ => (1m, "NFPA 70-2023 430.7(B), Table 430.251", "full-voltage: the whole locked-rotor current"),
    };

    /// <summary>A drive starts its motor at about 150 % of the drive's rated input current (its usual overload rating): common practice, no source.</summary>
    public const decimal DriveStartingMultiple = 1.5m;

    /// <param name="system">Impedance from the source to the motor's bus, referred to <paramref name="volts"/>.</param>
    /// <param name="branch">The branch conductors' impedance (zero when no length or wire is written).</param>
    /// <param name="startingAmps">The motor's starting line current at <paramref name="ratedVolts"/> (locked-rotor current × the starter's factor).</param>
    /// <param name="volts">The system voltage at the bus.</param>
    /// <param name="ratedVolts">The motor's rated voltage, at which the locked-rotor current is stated.</param>
    public static Result<Dip> Of(Impedance system, Impedance branch, decimal startingAmps, decimal volts, decimal ratedVolts, Phases phases)
    {
        if (phases != Phases.Three)
            return Result<Dip>.Missing("only three-phase starting dips are worked out");
        if (startingAmps <= 0 || volts <= 0 || ratedVolts <= 0)
            return Result<Dip>.Missing("no starting current is known");
        var pf = VoltageDrop.StartingPowerFactor;
        var zm = ratedVolts / (Sqrt3 * startingAmps);
        var sin = Impedance.Root(1 - pf * pf);
        var motor = new Impedance(zm * pf, zm * sin);
        var total = system + branch + motor;
        var atMotor = motor.Magnitude / total.Magnitude;
        var atBus = (branch + motor).Magnitude / total.Magnitude;
        var dip = new Dip(100m * (1 - atBus), 100m * (1 - atMotor), volts / (Sqrt3 * total.Magnitude));
        return Result<Dip>.Of(dip,
            new Step("Starting power factor", Format.Number(pf), "common practice, no source", "a motor at locked rotor draws mostly reactive current"),
            new Step("Motor impedance at start", motor.ToString(), MethodReference,
                $"|Zm| = {Format.Number(ratedVolts)} V ÷ (√3 × {Format.Amps(decimal.Round(startingAmps, 1))}) = {Impedance.Ohms(zm)} Ω at power factor {Format.Number(pf)}"),
            new Step("System impedance to the bus", system.ToString(), MethodReference, "source, transformers and feeders, as in the fault study"),
            new Step("Branch conductors", branch.ToString(), "NFPA 70-2023 Chapter 9 Table 9", branch == Impedance.Zero ? "none written: taken as none (at the motor the dip is then that of the bus)" : "as for voltage drop, R and X per phase"),
            new Step("Dip at the bus", $"{dip.BusPercent:0.##} %", MethodReference,
                $"{Method}: 1 − |Zb + Zm| ÷ |Zs + Zb + Zm| = 1 − {Impedance.Ohms((branch + motor).Magnitude)} ÷ {Impedance.Ohms(total.Magnitude)}"),
            new Step("Dip at the motor", $"{dip.MotorPercent:0.##} %", MethodReference,
                $"1 − |Zm| ÷ |Zs + Zb + Zm| = 1 − {Impedance.Ohms(zm)} ÷ {Impedance.Ohms(total.Magnitude)}; {Format.Amps(decimal.Round(dip.StartingAmps))} drawn while it starts"));
    }
}
