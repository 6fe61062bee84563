using System.Collections.Immutable;
using MotorLang.Analysis.Power;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;

namespace MotorLang.Analysis.Coverage;

/// <summary>Which circuits a rule MotorLang does not check concerns.</summary>
public enum Reach
{
    /// <summary>Every motor branch circuit and every feeder.</summary>
    EveryCircuit,
    /// <summary>Every motor and every motor-compressor.</summary>
    EveryMotor,
    /// <summary>Motors sized under Article 430 ('motor'), not motor-compressors.</summary>
    Motor,
    /// <summary>Motor-compressors and marked equipment ('compressor', Article 440).</summary>
    Compressor,
    /// <summary>Motors written with <c>starting drive</c>.</summary>
    DriveFedMotor,
    EveryFeeder,
    /// <summary>Motors and feeders whose running voltage drop was not worked out (no <c>length</c> written).</summary>
    NoLength,
    /// <summary>Motors and feeders whose written conduit's fill was not worked out (none written, or the tables cannot).</summary>
    NoConduit,
    /// <summary>Motors and feeders over 1000 V, which MotorLang does not size at all.</summary>
    OverThousandVolts,
    /// <summary>Fire pump motors (<c>fire-service pump</c>) and the feeders that supply them.</summary>
    FirePump,
    /// <summary>Circuits whose protective device's interrupting rating was not checked (no 'interrupting', or no fault current worked out there).</summary>
    NoInterruptingCheck,
    /// <summary>Circuits whose equipment short-circuit current rating was not checked (no 'sccr', or no fault current worked out there).</summary>
    NoSccrCheck,
    /// <summary>Feeders supplied at the service (no 'from'), when the project writes no 'source'.</summary>
    NoSource,
    /// <summary>Single-phase and dc circuits: only the three-phase fault current is worked out.</summary>
    NotThreePhase,
    /// <summary>Feeders with a 'transformer'.</summary>
    TransformerFeeder,
    /// <summary>Feeders with a 'transformer' whose protection could not be checked.</summary>
    TransformerNotChecked,
    /// <summary>Motors with a power-factor capacitor written (<c>capacitor</c>, Article 460).</summary>
    Capacitor,
    /// <summary>Motors and motor-compressors whose control circuit was not checked (no <c>control-wire</c> or <c>control-transformer</c>, a compressor, a fire pump).</summary>
    NoControlCheck,
    /// <summary>Motors with a control transformer (<c>control-transformer</c>).</summary>
    ControlTransformer,
    /// <summary>Motors whose number of overload units is not written (<c>overload-units</c>).</summary>
    NoOverloadUnits,
    /// <summary>Branch circuits supplying several motors (a feeder block with <c>branch-group</c>), and the motors on them.</summary>
    BranchGroup,
    /// <summary>Feeders with a <c>demand-factor</c> (430.26).</summary>
    DemandFactor,
    /// <summary>Motors that have overload protection: not motor-compressors (Article 440 Part VI is not checked) or fire pumps (695.6(D)).</summary>
    MotorWithOverload,
    /// <summary>Motors supplied through a feeder tap (<c>tap</c>, 430.28).</summary>
    Tap,
}

/// <summary>A rule that bears on a circuit but that MotorLang does not check: the rule, what it covers (one line), and why it is left out.</summary>
public sealed record NotCheckedRule(string Rule, string Text, string Reason, Reach Reach);

/// <summary>
/// The one table of what MotorLang does not check, filtered by what applies to a circuit. docs/checks.md
/// ("What MotorLang does not check") lists every row; a test keeps the two the same.
/// </summary>
public static class NotChecked
{
    private const string NoFaultCurrent = "no rating written, or no available fault current worked out where it stands (no 'source', or the hover's fault-current section says why)";

    public static readonly ImmutableArray<NotCheckedRule> All =
    [
        new("110.10, 409.22, 430.8", "equipment short-circuit current ratings against the available fault current", NoFaultCurrent, Reach.NoSccrCheck),
        new("110.9", "interrupting ratings of the breakers and fuses", NoFaultCurrent, Reach.NoInterruptingCheck),
        new("110.24", "the available fault current documented at the service", "no 'source' is written in the project block, so no fault current is worked out anywhere", Reach.NoSource),
        new("110.9, 110.10", "line-to-neutral fault current of single-phase circuits, and fault current of dc circuits",
            "single-phase circuits are worked out line to line (below a single-phase transformer ratings are held to 1.5 × that as a line-to-neutral bound); dc is not implemented", Reach.NotThreePhase),
        new("110.3(B)", "listing and labeling instructions, such as the largest fuse or breaker a starter or drive is listed with",
            "MotorLang holds no product data; a listing may set tighter limits than the code tables", Reach.EveryCircuit),
        new("90.4", "local amendments and the rulings of the authority having jurisdiction",
            "MotorLang knows only NFPA 70-2023 as published", Reach.EveryCircuit),
        new("310.10", "whether the insulation suits the location (dry, damp, wet, sunlight)",
            "the list does not say where the wiring runs", Reach.EveryCircuit),
        new("Articles 500–516", "equipment and wiring in hazardous (classified) locations",
            "the list does not say where the equipment is", Reach.EveryCircuit),
        new("430.72", "motor control circuit conductors and their protection, and a control transformer's protection",
            "no 'control-wire' or 'control-transformer' is written (the control circuits of motor-compressors and fire pumps are not checked)", Reach.NoControlCheck),
        new("430.73–430.75", "mechanical protection of control conductors, the control circuit's arrangement (grounding, 430.74) and its disconnection (430.75)",
            "the list does not record how control wiring is run, grounded or disconnected", Reach.EveryMotor),
        new("430.72(B)", "the conductors between the motor branch and the control transformer's primary",
            "the list records the transformer's primary device, not its primary conductors", Reach.ControlTransformer),
        new("430.72(B) Exception No. 2", "that a control transformer whose secondary conductors are protected by its primary device alone has a single-phase, 2-wire secondary",
            "the list does not record how the secondary is wired; it is taken to be 2-wire", Reach.ControlTransformer),
        new("Article 440", "a hermetic refrigerant motor-compressor written as a 'motor'",
            "a 'motor' is sized under Article 430 from its horsepower; write 'compressor' for the Article 440 rules", Reach.Motor),
        new("440.51–440.55", "motor-compressor overload protection (Article 440 Part VI)",
            "MotorLang does not check it; listed equipment usually carries it inside", Reach.Compressor),
        new("440.41", "the controller's continuous and locked-rotor current ratings",
            "the list records a controller's horsepower only", Reach.Compressor),
        new("440.12(B), 440.22(B)", "the disconnect and the device for equipment with several compressors or other loads when no minimum circuit ampacity and maximum protection are marked",
            "MotorLang sizes the written compressor alone; a multimotor unit is checked against its marking", Reach.Compressor),
        new("440.14", "where the disconnect is (within sight of and readily accessible from the equipment)",
            "the list does not record where equipment is mounted", Reach.Compressor),
        new("Article 440 Part VII", "room air conditioners (cord-and-plug connected, 440.60–440.65)",
            "they are not modelled; a 'compressor' is a permanently connected circuit", Reach.Compressor),
        new("430.52(C)(1)(b), 430.32(C)", "whether the motor actually starts with the device and overload chosen",
            "that needs the motor's acceleration and the devices' trip curves; MotorLang checks only the code limits", Reach.Motor),
        new("430.102", "where the disconnect is (in sight of the controller and of the motor)",
            "the list does not record where equipment is mounted", Reach.Motor),
        new("430.37", "the number of overload units",
            "no 'overload-units' is written", Reach.NoOverloadUnits),
        new("Table 430.37", "which conductors the overload units are in (for example the ungrounded conductor of a single-phase circuit)",
            "the list does not say which conductors the units are in", Reach.MotorWithOverload),
        new("430.126", "motor overtemperature protection when the drive runs the motor at reduced speed",
            "it depends on the drive's and the motor's own protection features, which the list does not carry", Reach.DriveFedMotor),
        new("430.130, 110.3(B)", "the branch device type the drive calls for, and its largest rating unless 'drive-max-protection' is written",
            "MotorLang holds no drive data; it checks the 430.52 limit and a written drive maximum", Reach.DriveFedMotor),
        new("430.131", "several motors supplied by one drive",
            "MotorLang sizes each motor as if it had its own drive", Reach.DriveFedMotor),
        new("430.53(A)(2), 430.53(B), 430.53(C)(1)–(3)", "a circuit supplying several motors: the device marked on the controllers, that the device does not open in the most severe normal service, controllers and overloads listed for group installation (lettering from memory)",
            "the list records no listings, markings or service conditions; the device limit of the permission written is checked", Reach.BranchGroup),
        new("430.53(D)(2), 430.53(D)(3)", "a tap's protection from physical damage, and taps to a listed manual motor controller marked for tap conductor protection",
            "the list does not say how a tap is run or what a controller is marked; taps are held to (D)(1), or (D)(2)'s one third when 25 ft or less", Reach.BranchGroup),
        new("430.26", "that feeder conductors taken at a demand factor carry the maximum load of the motors' duties",
            "the permission is the authority's; MotorLang applies the factor written and shows the permission", Reach.DemandFactor),

        new("210.19 IN No. 4, 215.2(A)(2) IN No. 2", "running voltage drop against the drop limit",
            "no 'length' is written (or no wire could be chosen), so there is nothing to work it out from", Reach.NoLength),
        new("Chapter 9 Table 1", "fill of the conduit as installed",
            "no 'conduit' is written, or its fill cannot be worked out (the hover shows the smallest that fits, where it can)", Reach.NoConduit),
        new("Article 430 Part XI", "motors and feeders over 1000 V: their conductors, protection and controllers",
            "MotorLang carries only the low-voltage rules and tables, so nothing on such a circuit is sized (M210)", Reach.OverThousandVolts),
        new("240.21(B)", "feeder taps that supply a feeder or panel rather than a motor's branch device (the 10 ft, 25 ft, transformer, outside and high-bay rules)",
            "a 'tap' is written on a motor, where 430.28 is checked; taps from feeder to feeder are not written in the list", Reach.EveryFeeder),
        new("430.28(1), (2), Exception", "how a feeder tap is enclosed (an enclosed controller or raceway) or protected from physical damage, and the high-bay Exception for taps over 25 ft",
            "the tap is taken to run in the list's raceway, as every conductor in it; its ampacity and length are checked", Reach.Tap),
        new("450.3", "transformer overcurrent protection beyond the limits of Table 450.3(B): its Notes 2 and 3, and Table 450.3(A) over 1000 V",
            "MotorLang checks the table's percentages and its Note 1 only", Reach.EveryFeeder),
        new("240.21(C)(1), (C)(3), (C)(4)", "secondary conductors protected by the primary device, in industrial installations, or run outside",
            "they depend on the transformer's connection, the kind of installation and where the conductors run, which the list does not say; the 10 ft and 25 ft rules are checked", Reach.TransformerFeeder),
        new("450.3(B), 240.21(C)", "the transformer's protection and its secondary conductors",
            "no 'primary-protection' is written, or a winding is over 1000 V", Reach.TransformerNotChecked),
        new("215.10, 240.13", "ground-fault protection of equipment for feeder devices of 1000 A or more",
            "the list does not say whether the feeder device has ground-fault protection", Reach.EveryFeeder),
        new("Article 220", "load calculation and demand factors for the non-motor loads",
            "loads are added at the amperes or kVA written", Reach.EveryFeeder),
        new("Article 230", "service conductors and service equipment",
            "every feeder is sized as a feeder, including one written without 'from'", Reach.EveryFeeder),
        new("695.3", "whether the fire pump's power source is reliable and of a kind 695.3 permits",
            "the list does not say what the source is", Reach.FirePump),
        new("695.4(B)(3)", "the fire pump disconnecting means (lockable closed, marked, supervised, located apart from others)",
            "the list does not record the disconnect's construction or location", Reach.FirePump),
        new("695.6(A), 695.6(B)", "routing and fire protection of the supply conductors (outside the building, or under fire-rated protection)",
            "the list does not say where the wiring runs", Reach.FirePump),
        new("695.6(E)", "the wiring method from the controller to the fire pump motor (lettering from memory)",
            "the list records conductors, not wiring methods", Reach.FirePump),
        new("695.10", "listing of the fire pump controller and transfer switch for fire pump service",
            "MotorLang holds no product data", Reach.FirePump),
        new("695.14", "fire pump control wiring", "control wiring is not part of the list", Reach.FirePump),
        new("460.8(B)", "the capacitor's overcurrent device (none is required for a capacitor on the load side of the motor overload, 460.8(B) Exception)",
            "the list records no device for the capacitor; its rating depends on the capacitor's own data", Reach.Capacitor),
        new("460.8(C)", "the capacitor's disconnecting means (at least 135 % of its rated current; none is required on the load side of the motor controller, 460.8(C) Exception)",
            "the list records no disconnect for the capacitor", Reach.Capacitor),
        new("460.7", "that the kvar on the load side of the controller does not exceed what raises the motor's no-load power factor to unity (lettering from memory)",
            "it needs the motor's no-load current, which the list does not carry", Reach.Capacitor),
    ];

    /// <summary>What is not checked on a motor's branch circuit.</summary>
    public static IReadOnlyList<NotCheckedRule> For(MotorResult motor, FaultStudy? power = null)
    {
        var fault = power?.AtController(motor.Motor);
        var computed = fault?.Computed == true;
        return All.Where(r => r.Reach switch
    {
        Reach.EveryCircuit or Reach.EveryMotor => true,
        Reach.NoInterruptingCheck => !computed || motor.Motor.Interrupting is null && motor.Motor.Like is null,
        Reach.NoSccrCheck => !computed || motor.Motor.Sccr is null && motor.Motor.Like is null,
        Reach.NoSource => false,
        Reach.NotThreePhase => motor.Phases != Phases.Three,
        Reach.Motor => !motor.IsCompressor,
        Reach.Compressor => motor.IsCompressor,
        Reach.DriveFedMotor => motor.StartingMethod == StartingMethod.Drive,
        Reach.NoLength => motor.BranchDrop?.HasValue != true,
        Reach.NoConduit => motor.ConduitFillPercent is null,
        Reach.OverThousandVolts => Math.Max(motor.RatedVolts, motor.Volts) > SystemVoltages.LowVoltageLimit,
        Reach.FirePump => motor.FireService == FireServiceRole.FirePump,
        Reach.Capacitor => motor.HasCapacitor,
        Reach.NoControlCheck => !motor.ControlCircuitChecked,
        Reach.ControlTransformer => motor.HasControlTransformer,
        Reach.NoOverloadUnits => !motor.IsCompressor && motor.OverloadUnitsRequired is null && motor.FireService != FireServiceRole.FirePump,
        Reach.BranchGroup => motor.Motor.Feeder.BranchGroup is not null,
        Reach.MotorWithOverload => !motor.IsCompressor && motor.FireService != FireServiceRole.FirePump,
        Reach.Tap => power?.Taps.ContainsKey(motor.Motor) == true,
        _ => false,
    }).ToList();
    }

    /// <summary>What is not checked on a feeder.</summary>
    public static IReadOnlyList<NotCheckedRule> For(FeederResult feeder, FaultStudy? power = null)
    {
        var fault = power?.Feeders.GetValueOrDefault(feeder.Feeder);
        var f = feeder.Feeder;
        return All.Where(r => r.Reach switch
    {
        Reach.EveryCircuit or Reach.EveryFeeder => true,
        Reach.NoInterruptingCheck => fault?.ProtectionPoint.Computed != true || f.Interrupting is null,
        Reach.NoSccrCheck => fault?.Bus.Computed != true || f.Sccr is null,
        Reach.NoSource => f.From is null && power is not { HasSource: true },
        Reach.NotThreePhase => feeder.Phases != Phases.Three,
        Reach.TransformerFeeder => f.Transformer is not null,
        Reach.TransformerNotChecked => f.Transformer is not null && fault?.Transformer?.Method is null,
        Reach.NoLength => feeder.Drop?.HasValue != true,
        Reach.NoConduit => feeder.ConduitFillPercent is null,
        Reach.OverThousandVolts => feeder.Volts > SystemVoltages.LowVoltageLimit,
        Reach.FirePump => feeder.SuppliesFirePump,
        Reach.BranchGroup => f.BranchGroup is not null,
        Reach.DemandFactor => f.DemandFactor is not null,
        _ => false,
    }).ToList();
    }

    /// <summary>How docs/checks.md names a reach.</summary>
    public static string Describe(Reach reach) => reach switch
    {
        Reach.EveryCircuit => "every motor and feeder",
        Reach.EveryMotor => "every motor and motor-compressor",
        Reach.Motor => "every motor (not motor-compressors)",
        Reach.Compressor => "motor-compressors",
        Reach.DriveFedMotor => "motors fed by a drive",
        Reach.NoLength => "motors and feeders with no `length`",
        Reach.NoConduit => "motors and feeders with no `conduit`",
        Reach.OverThousandVolts => "motors and feeders over 1000 V",
        Reach.FirePump => "fire pumps and their feeders",
        Reach.NoInterruptingCheck => "motors and feeders with no `interrupting`, or no fault current where the device stands",
        Reach.NoSccrCheck => "motors and feeders with no `sccr`, or no fault current where the equipment stands",
        Reach.NoSource => "feeders supplied at the service (no `from`) when no `source` is written",
        Reach.NotThreePhase => "single-phase and dc motors and feeders",
        Reach.TransformerFeeder => "feeders with a `transformer`",
        Reach.TransformerNotChecked => "feeders with a `transformer` and no `primary-protection` (or over 1000 V)",
        Reach.Capacitor => "motors with a `capacitor`",
        Reach.NoControlCheck => "motors with no `control-wire` or `control-transformer`, motor-compressors and fire pumps",
        Reach.ControlTransformer => "motors with a `control-transformer`",
        Reach.NoOverloadUnits => "motors with no `overload-units` (not motor-compressors or fire pumps)",
        Reach.BranchGroup => "circuits with `branch-group` and the motors on them",
        Reach.DemandFactor => "feeders with a `demand-factor`",
        Reach.MotorWithOverload => "every motor (not motor-compressors or fire pumps)",
        Reach.Tap => "motors with a `tap`",
        _ => "every feeder",
    };
}
