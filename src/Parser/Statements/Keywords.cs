using MotorLang.Domain;
using static MotorLang.Parser.Statements.ArgKind;
using static MotorLang.Parser.Statements.BlockKind;

namespace MotorLang.Parser.Statements;

/// <summary>
/// Every keyword of the format and every enumerated word, in one table. The parser, the formatter,
/// completion and docs/format.md all read from here, so a keyword is added in one place.
/// </summary>
public static class Keywords
{
    private static readonly BlockKind[] Settings = [Project, Feeder, Motor];

    public static readonly WordChoice[] Editions = [new("NEC-2023", "NEC-2023", "NFPA 70, 2023 edition")];

    public static readonly WordChoice[] Materials =
    [
        new("cu", ConductorMaterial.Copper, "copper", "copper"),
        new("al", ConductorMaterial.Aluminum, "aluminum", "aluminum", "aluminium"),
    ];

    /// <summary>Insulation types with their temperature rating from Table 310.4(A).</summary>
    public static readonly WordChoice[] Insulations =
    [
        new("TW", 60, "60 °C insulation"),
        new("THW", 75, "75 °C insulation"),
        new("THWN", 75, "75 °C insulation"),
        new("XHHW", 75, "75 °C insulation (wet locations); 90 °C dry"),
        new("THHN", 90, "90 °C insulation"),
        new("THWN-2", 90, "90 °C insulation"),
        new("XHHW-2", 90, "90 °C insulation"),
    ];

    public static readonly WordChoice[] Raceways =
    [
        new("EMT", RacewayType.Emt, "electrical metallic tubing (steel)"),
        new("RMC", RacewayType.Rmc, "rigid metal conduit (steel)"),
        new("PVC", RacewayType.Pvc, "rigid PVC conduit, schedule 40", "PVC-40"),
    ];

    public static readonly WordChoice[] Devices =
    [
        new("inverse-time-breaker", ProtectiveDevice.InverseTimeBreaker, "inverse-time circuit breaker"),
        new("instantaneous-trip-breaker", ProtectiveDevice.InstantaneousTripBreaker, "instantaneous-trip circuit breaker (motor circuit protector)"),
        new("dual-element-fuse", ProtectiveDevice.DualElementFuse, "dual-element (time-delay) fuse", "time-delay-fuse"),
        new("non-time-delay-fuse", ProtectiveDevice.NonTimeDelayFuse, "non-time-delay fuse"),
        new("motor-short-circuit-protector", ProtectiveDevice.MotorShortCircuitProtector,
            "motor short-circuit protector, part of a listed combination motor controller (430.52(C)(7))"),
        new("self-protected-controller", ProtectiveDevice.SelfProtectedController,
            "listed self-protected combination controller (430.52(C)(6))"),
        new("semiconductor-fuse", ProtectiveDevice.SemiconductorFuse,
            "fuses for the power electronic devices of a solid-state controller or drive, rated as marked beside them (430.52(C)(5))"),
    ];

    /// <summary>A word of our own on a protection line: the device is part of a listed combination motor controller.</summary>
    public static readonly WordChoice[] Combinations =
    [
        new("listed-combination", true, "part of a listed combination motor controller (430.52(C)(3), (C)(7))"),
    ];

    /// <summary>Fuse classes the code treats apart (the Table 430.52(C)(1) note: time-delay Class CC fuses take the non-time-delay column).</summary>
    public static readonly WordChoice[] FuseClasses =
    [
        new("class-cc", true, "a Class CC fuse: a time-delay one is sized by the non-time-delay column (Table 430.52(C)(1) note 1, 430.52(C)(1)(b)(1))"),
    ];

    public static readonly WordChoice[] MotorKinds =
    [
        new("induction", MotorKind.Induction, "squirrel-cage induction motor (the default)", "squirrel-cage"),
        new("wound-rotor", MotorKind.WoundRotor, "wound-rotor induction motor"),
        new("synchronous", MotorKind.Synchronous, "synchronous motor, unity power factor"),
        new("dc", MotorKind.Dc, "direct-current motor"),
    ];

    public static readonly WordChoice[] DesignLetters =
        Enum.GetValues<DesignLetter>().Select(d => new WordChoice(d.ToString(), d, $"NEMA design {d}")).ToArray();

    public static readonly WordChoice[] CodeLetters =
        Enum.GetValues<CodeLetter>().Select(c => new WordChoice(c.ToString(), c, $"locked-rotor code letter {c} (Table 430.7(B))")).ToArray();

    public static readonly WordChoice[] Efficiencies =
    [
        new("standard", Efficiency.Standard, "not marked energy-efficient or premium efficiency"),
        new("premium", Efficiency.Premium, "design B premium efficiency or energy-efficient", "energy-efficient"),
    ];

    public static readonly WordChoice[] DutyKinds =
    [
        new("continuous", DutyKind.Continuous, "continuous duty (the default)"),
        new("short-time", DutyKind.ShortTime, "short-time duty, e.g. operating valves or raising rolls"),
        new("intermittent", DutyKind.Intermittent, "intermittent duty, e.g. freight elevators, tool heads, pumps"),
        new("periodic", DutyKind.Periodic, "periodic duty, e.g. rolls, ore- and coal-handling machines"),
        new("varying", DutyKind.Varying, "varying duty"),
    ];

    public static readonly WordChoice[] StartingMethods =
    [
        new("full-voltage", StartingMethod.FullVoltage, "across-the-line starting (the default)"),
        new("wye-delta", StartingMethod.WyeDelta, "wye-start, delta-run"),
        new("part-winding", StartingMethod.PartWinding, "part-winding start"),
        new("soft-start", StartingMethod.SoftStart, "solid-state reduced-voltage starter"),
        new("drive", StartingMethod.Drive, "adjustable-speed drive; give its rated input current"),
    ];

    public static readonly WordChoice[] Applications =
    [
        new("low-speed", NameplateBasis.LowSpeed, "built for low speed (under 1200 rpm): size from nameplate current"),
        new("high-torque", NameplateBasis.HighTorque, "high-torque motor: size from nameplate current"),
        new("multispeed", NameplateBasis.Multispeed, "multispeed motor: size from nameplate current"),
        new("canned-pump", NameplateBasis.CannedPump, "canned pump: size from nameplate current"),
        new("shaded-pole-fan", NameplateBasis.ShadedPoleFan, "shaded-pole fan or blower motor: size from nameplate current"),
        new("psc-fan", NameplateBasis.PscFan, "permanent-split-capacitor fan or blower motor: size from nameplate current"),
    ];

    public static readonly WordChoice[] FireServiceRoles =
    [
        new("pump", FireServiceRole.FirePump, "drives a fire pump (Article 695): sized to carry locked-rotor current, no overload"),
        new("pressure-maintenance", FireServiceRole.PressureMaintenance, "pressure maintenance (jockey) pump on the fire pump's supply", "jockey"),
        new("accessory", FireServiceRole.Accessory, "fire pump accessory equipment on the fire pump's supply"),
    ];

    /// <summary>A word of our own on a protection line: the device is listed for fire pump service.</summary>
    public static readonly WordChoice[] DeviceListings =
    [
        new("fire-pump-listed", true, "listed for fire pump service (695.4(B)(2)): accepted without the locked-rotor minimum"),
    ];

    public static readonly WordChoice[] WindingScopes =
    [
        new("per-winding", WindingScope.PerWinding, "one device for each winding connection of a part-winding motor (430.4)"),
        new("both-windings", WindingScope.BothWindings, "one device for both windings of a part-winding motor (430.4 Exception)"),
    ];

    public static readonly WordChoice[] CapacitorPositions =
    [
        new("load-side", CapacitorPosition.LoadSide, "connected on the load side of the motor's overload device: the overload is set from the improved-power-factor current (460.9); the default"),
        new("line-side", CapacitorPosition.LineSide, "connected on the line side of the motor's overload device: the overload is set from the nameplate as usual"),
    ];

    public static readonly WordChoice[] OverloadLocations =
    [
        new("delta-leads", OverloadLocation.DeltaLeads, "a wye-delta motor's overload sits in the motor leads (the delta circuit), which carry 1/√3 of the line current; the default"),
        new("line-leads", OverloadLocation.LineLeads, "a wye-delta motor's overload sits in the line conductors ahead of the wye-delta contactors"),
    ];

    public static readonly WordChoice[] ControlRoutes =
    [
        new("leaves-enclosure", ControlRoute.LeavesEnclosure, "the control conductors extend beyond the motor control equipment enclosure (Table 430.72(B) Column C); the default, the stricter case"),
        new("in-enclosure", ControlRoute.WithinEnclosure, "the control conductors stay within the motor control equipment enclosure (Table 430.72(B) Column B)"),
    ];

    public static readonly WordChoice[] Installations =
    [
        new("portable", Installation.Portable, "not permanently installed (430.32(D)(2))"),
    ];

    public static readonly WordChoice[] Sights =
    [
        new("within-sight", SightOfController.WithinSight, "within sight from the controller location (430.32(D)(2)(a))"),
    ];

    public static readonly WordChoice[] LoadDuties =
    [
        new("continuous", true, "runs three hours or more at a time: counted at 125 %"),
        new("non-continuous", false, "counted at 100 % (the default)", "noncontinuous"),
    ];

    /// <summary>The 430.53 permission a branch circuit supplying several motors is installed under.</summary>
    public static readonly WordChoice[] BranchGroupKinds =
    [
        new("small-motors", BranchGroupKind.SmallMotors,
            "430.53(A): motors of 1 hp or less, each of 6 A or less, on a 120 V circuit protected at 20 A or less, or a circuit of 1000 V or less protected at 15 A or less"),
        new("smallest-protected", BranchGroupKind.SmallestProtected,
            "430.53(B): the branch device is no larger than 430.52 allows for the smallest motor"),
        new("listed-group", BranchGroupKind.ListedGroup,
            "430.53(C): controllers and overloads listed for group installation; the device up to 430.52 for the largest motor plus the others' full-load currents"),
    ];

    /// <summary>A word of our own on a protection line: the device is also the motor's overload protection (430.55).</summary>
    public static readonly WordChoice[] CombinedProtection =
    [
        new("combined-overload", true, "the device also provides the motor's overload protection (430.55): rated or set as 430.32 requires of an overload"),
    ];

    public static readonly WordChoice[] SourceKinds =
    [
        new("utility", SourceKind.Utility, "a utility supply: give its available fault current at the service (kA) and its X/R"),
        new("infinite-bus", SourceKind.InfiniteBus, "no impedance ahead of the first transformer: the transformer alone limits the fault current"),
        new("generator", SourceKind.Generator, "a generator: give its kVA and its subtransient reactance X\"d in %"),
    ];

    private static string? Positive(decimal v) => v > 0 ? null : "must be greater than zero";
    private static string? NotNegative(decimal v) => v >= 0 ? null : "must not be negative";

    public static readonly KeywordSpec[] All =
    [
        new("project", [Root], Project, [new("name", ArgKind.Text, true)], "Starts the project block: installation settings for the whole file."),
        new("feeder", [Root], Feeder,
            [new("tag", Tag, true), new("description", ArgKind.Text, false), new("voltage", Voltage, true, Check: Positive), new("phases", ArgKind.Phases, true)],
            "Starts a feeder: its tag, description, system voltage and phases (1ph, 3ph or dc)."),
        new("motor", [Feeder], Motor,
            [new("tag", Tag, true), new("description", ArgKind.Text, false), new("power", Power, true, Check: Positive),
             new("voltage", Voltage, false, Check: Positive), new("phases", ArgKind.Phases, false)],
            "Starts a motor on the feeder above: tag, description, rated power, and optionally its rated voltage and phases."),
        new("compressor", [Feeder], Motor,
            [new("tag", Tag, true), new("description", ArgKind.Text, false),
             new("voltage", Voltage, false, Check: Positive), new("phases", ArgKind.Phases, false)],
            "Starts a hermetic refrigerant motor-compressor, or equipment marked as one (Article 440), on the feeder above: tag, description, and optionally its rated voltage and phases."),
        new("load", [Feeder], Load,
            [new("tag", Tag, true), new("description", ArgKind.Text, false), new("current", Current, false, Check: Positive),
             new("apparent-power", ApparentPower, false, Check: Positive), new("duty", Word, false, LoadDuties)],
            "A non-motor load on the feeder above: its current or kVA, continuous or not."),

        new("plant", [Project], null, [],
            "This project is a plant: every .motors file in this file's folder and the folders below it is analysed together with it."),
        // The title block of issued deliverables (schedule, report): free text, printed as written.
        new("job-number", [Project], null, [new("number", ArgKind.Text, true)], "Title block: the project or job number the deliverables are filed under."),
        new("revision", [Project], null, [new("revision", ArgKind.Text, true)], "Title block: the revision of the motor list, as issued (\"A\", \"2\", \"IFC-1\")."),
        new("dated", [Project], null, [new("date", ArgKind.Text, true)], "Title block: the date of this revision, as printed (ISO 8601, \"2026-12-03\", reads the same everywhere)."),
        new("prepared-by", [Project], null, [new("name", ArgKind.Text, true)], "Title block: who prepared this revision."),
        new("checked-by", [Project], null, [new("name", ArgKind.Text, true)], "Title block: the qualified person who checked it."),
        new("source", [Project], null,
            [new("kind", Word, true, SourceKinds), new("fault-current", FaultCurrent, false, Check: Positive),
             new("x-r", Ratio, false, Check: Positive), new("rating", ApparentPower, false, Check: Positive),
             new("reactance", Percent, false, Check: Positive)],
            "What supplies the plant: utility with its available fault current (kA) and X/R, infinite-bus, or generator with its kVA and subtransient reactance (%)."),
        new("code", [Project, Feeder], null, [new("edition", Word, true, Editions)], "The code edition the file is checked against."),
        new("ambient", Settings, null, [new("temperature", Temperature, true)], "Ambient temperature for conductor correction (Table 310.15(B)(1)(1))."),
        new("conductor", Settings, null,
            [new("material", Word, true, Materials), new("insulation", Word, false, Insulations), new("termination", Temperature, false)],
            "Conductor material, insulation type and the terminations' temperature rating (110.14(C))."),
        new("raceway", Settings, null, [new("type", Word, true, Raceways)], "Raceway type, for conduit fill and reactance."),
        new("ccc", Settings, null, [new("count", Integer, true, Check: Positive)], "Current-carrying conductors in the raceway (Table 310.15(C)(1))."),
        new("drop-limit", Settings, null,
            [new("branch", Percent, true, Check: Positive), new("total", Percent, false, Check: Positive)],
            "Voltage-drop limits that trigger a warning: branch, and feeder plus branch."),
        new("dip-limit", Settings, null,
            [new("motor", Percent, true, Check: Positive), new("bus", Percent, false, Check: Positive)],
            "Starting-dip limits that trigger a warning: at the motor's terminals, and at its feeder's bus (15 % and 10 % when not written)."),
        new("power-factor", Settings, null,
            [new("value", Number, true, Check: v => v is > 0 and <= 1 ? null : "must be above 0 and at most 1")],
            "Running power factor used for voltage drop (Chapter 9 Table 9, note 2)."),

        new("from", [Feeder], null, [new("source", Tag, true)], "The feeder or switchboard this feeder is supplied from."),
        new("length", [Feeder, Motor], null, [new("length", Length, true, Check: NotNegative)], "One-way circuit length, for voltage drop."),
        new("wire", [Feeder, Motor], null, [new("size", Wire, true)], "Phase conductor size as installed: 10 AWG, 4/0 AWG, 250 kcmil, 2x 250 kcmil."),
        new("ground", [Feeder, Motor], null, [new("size", Wire, true)], "Equipment grounding conductor size as installed."),
        new("conduit", [Feeder, Motor], null, [new("trade-size", TradeSize, true, Check: Positive)],
            "Raceway trade size as installed, for the conduit-fill check (Chapter 9 Table 4)."),
        new("protection", [Feeder, Motor], null,
            [new("device", Word, true, Devices), new("rating", Current, false, Check: Positive),
             new("listing", Word, false, DeviceListings), new("windings", Word, false, WindingScopes),
             new("combination", Word, false, Combinations), new("class", Word, false, FuseClasses),
             new("combined", Word, false, CombinedProtection)],
            "Short-circuit and ground-fault protective device and its rating; optionally fire-pump-listed, per-winding or both-windings, listed-combination, class-cc, combined-overload."),
        new("branch-group", [Feeder], null, [new("permission", Word, true, BranchGroupKinds)],
            "This block is one branch circuit supplying several motors (430.53): small-motors (A), smallest-protected (B) or listed-group (C)."),
        new("demand-factor", [Feeder], null,
            [new("factor", Percent, true, Check: v => v is > 0 and <= 100 ? null : "must be above 0 % and at most 100 %"),
             new("permission", ArgKind.Text, true)],
            "A demand factor on the motors' share of the 430.24 ampacity, granted by the authority having jurisdiction (430.26): the factor and the permission, quoted."),

        new("transformer", [Feeder], null,
            [new("rating", ApparentPower, true, Check: Positive), new("primary", Voltage, true, Check: Positive),
             new("secondary", Voltage, true, Check: Positive), new("impedance", Percent, false, Check: Positive),
             new("x-r", Ratio, false, Check: Positive)],
            "A transformer at the head of this feeder: kVA, primary and secondary voltage, %Z and X/R. The feeder's wire is its secondary conductors."),
        new("primary-protection", [Feeder], null,
            [new("device", Word, true, Devices), new("rating", Current, true, Check: Positive), new("interrupting", FaultCurrent, false, Check: Positive)],
            "The transformer's primary protective device, its rating and optionally its interrupting rating (kA)."),
        new("sccr", [Feeder, Motor], null, [new("rating", FaultCurrent, true, Check: Positive)],
            "Short-circuit current rating (kA) of the feeder's bus equipment, or of a motor's controller or drive."),
        new("interrupting", [Feeder, Motor], null, [new("rating", FaultCurrent, true, Check: Positive)],
            "Interrupting rating (kA) of this circuit's protective device."),

        new("tap", [Motor], null, [new("length", Length, true, Check: Positive), new("size", Wire, true)],
            "Feeder tap conductors from the feeder to this motor's branch-circuit protective device (430.28): their length and size, e.g. 'tap 8ft 6 AWG'."),
        new("nameplate", [Motor], null, [new("current", Current, true, Check: Positive)], "Nameplate full-load amperes (FLA), used for overloads."),
        new("service-factor", [Motor], null,
            [new("value", Number, true, Check: v => v >= 1.0m ? null : "must be at least 1.0")], "Marked service factor."),
        new("temp-rise", [Motor], null, [new("temperature", Temperature, true, Check: Positive)], "Marked temperature rise."),
        new("design", [Motor], null, [new("letter", Word, true, DesignLetters)], "NEMA design letter."),
        new("code-letter", [Motor], null, [new("letter", Word, true, CodeLetters)], "Locked-rotor code letter (Table 430.7(B))."),
        new("kind", [Motor], null, [new("kind", Word, true, MotorKinds)], "Motor construction; induction when not given."),
        new("rated-pf", [Motor], null,
            [new("value", Number, true, Check: v => v is 1.0m or 0.9m or 0.8m ? null : "must be 1.0, 0.9 or 0.8 (the Table 430.250 columns and note)")],
            "A synchronous motor's rated power factor: 1.0, 0.9 or 0.8."),
        new("efficiency", [Motor], null, [new("class", Word, true, Efficiencies)], "Design B premium efficiency motors take other instantaneous-trip limits."),
        new("duty", [Motor], null, [new("duty", Word, true, DutyKinds), new("rating", Duration, false)],
            "Duty and, for non-continuous duty, the motor's time rating (5, 15, 30 or 60 min; none = continuous rated)."),
        new("starting", [Motor], null, [new("method", Word, true, StartingMethods), new("input-current", Current, false, Check: Positive)],
            "Starting method; for a drive, its rated input current."),
        new("overload", [Motor], null,
            [new("setting", Current, true, Check: Positive), new("windings", Word, false, WindingScopes), new("location", Word, false, OverloadLocations)],
            "Overload relay setting or heater rating; for a part-winding motor, per-winding or both-windings; for a wye-delta motor, delta-leads or line-leads."),
        new("disconnect", [Feeder, Motor], null,
            [new("rating", Current, false, Check: Positive), new("power", Power, false, Check: Positive)],
            "Disconnecting means: ampere rating and horsepower rating; on a feeder, one disconnect for everything it supplies (430.110(C))."),
        new("interlock", [Motor], null,
            [new("name", Tag, true), new("set", Integer, false, Check: Positive)],
            "Motors of one interlock never run at the same time as those of another set of it (430.24 Exception No. 3): the interlock's name and this motor's set (its own when not given)."),
        new("controller", [Motor], null, [new("power", Power, true, Check: Positive)], "Controller horsepower rating."),
        new("quantity", [Motor], null, [new("count", Integer, true, Check: Positive)], "Number of identical motors this line stands for."),
        new("like", [Motor], null, [new("motor", Tag, true)], "Take every attribute not given here from another motor."),
        new("application", [Motor], null, [new("kind", Word, true, Applications)],
            "Motors that 430.6(A) sizes from the nameplate current instead of the tables."),
        new("fire-service", [Motor, Load], null, [new("role", Word, true, FireServiceRoles)],
            "Part of a fire pump installation (Article 695): the fire pump, a pressure-maintenance pump or accessory equipment."),
        new("locked-rotor", [Motor], null, [new("current", Current, true, Check: Positive)], "Nameplate locked-rotor amperes."),
        new("rated-load", [Motor], null, [new("current", Current, true, Check: Positive)],
            "A motor-compressor's rated-load current (RLA) as marked (440.6(A)); only under 'compressor'."),
        new("selection-current", [Motor], null, [new("current", Current, true, Check: Positive)],
            "A motor-compressor's branch-circuit selection current where marked (440.4(C)); used instead of RLA when larger."),
        new("min-ampacity", [Motor], null, [new("current", Current, true, Check: Positive)],
            "The equipment's marked minimum circuit ampacity (440.4(B)): its branch conductors are sized from it."),
        new("max-protection", [Motor], null, [new("current", Current, true, Check: Positive)],
            "The equipment's marked maximum branch short-circuit and ground-fault device rating (440.4(B)): never exceeded."),
        new("drive-overload", [Motor], null, [],
            "The drive is marked as providing the motor's overload protection (430.124(A)): no separate overload needed."),
        new("capacitor", [Motor], null,
            [new("reactive-power", ReactivePower, false, Check: Positive), new("current", Current, false, Check: Positive),
             new("voltage", Voltage, false, Check: Positive), new("position", Word, false, CapacitorPositions)],
            "A power-factor capacitor on the motor circuit (Article 460): its kvar or rated current, its rated voltage, load-side or line-side of the overload."),
        new("capacitor-wire", [Motor], null, [new("size", Wire, true)],
            "The conductors that connect the capacitor to the motor terminals or the motor circuit conductors (460.8(A))."),
        new("improved-current", [Motor], null, [new("current", Current, true, Check: Positive)],
            "The motor circuit's current at the improved power factor, with the capacitor connected: the overload is selected from it (460.9)."),
        new("motor-leads", [Motor], null, [new("size", Wire, true)],
            "The conductors between the controller (or drive) and the motor, where they are not the branch wire: wye-delta 430.22(C), part-winding 430.22(D), drive output 430.122(B)."),
        new("drive-bypass", [Motor], null, [],
            "The drive has a bypass device: the line conductors carry the larger of the drive's input and the motor's current (430.122(C))."),
        new("drive-max-protection", [Motor], null, [new("current", Current, true, Check: Positive)],
            "The largest branch short-circuit and ground-fault device the drive's instructions or marking permit (430.130(A)(2)): never exceeded."),
        new("control-wire", [Motor], null,
            [new("size", Wire, true), new("material", Word, false, Materials), new("route", Word, false, ControlRoutes)],
            "The motor control circuit's conductors (430.72): size, material (the block's conductor material when not written), and whether they leave the control enclosure."),
        new("control-protection", [Motor], null, [new("rating", Current, true, Check: Positive)],
            "The overcurrent device in the control circuit that protects its conductors (the control transformer's secondary device where there is one): Table 430.72(B) Column A."),
        new("control-transformer", [Motor], null,
            [new("rating", VoltAmperes, true, Check: Positive), new("primary", Voltage, true, Check: Positive), new("secondary", Voltage, true, Check: Positive)],
            "A control circuit transformer: its rating (VA) and primary and secondary voltages (430.72(C))."),
        new("control-primary-protection", [Motor], null, [new("rating", Current, true, Check: Positive)],
            "The control transformer's primary overcurrent device (430.72(C))."),
        new("overload-units", [Motor], null, [new("count", Integer, true, Check: v => v is >= 1 and <= 6 ? null : "must be between 1 and 6")],
            "The number of overload units (sensing elements, trip coils or heaters) the motor's overload device has (430.37)."),
        new("manual-start", [Motor], null,
            [new("installation", Word, false, Installations), new("sight", Word, false, Sights)],
            "A motor of 1 hp or less that is started by hand (430.32(D)); portable if not permanently installed, within-sight if within sight from the controller."),
        new("hard-start", [Motor], null, [],
            "The motor will not start on the Table 430.52(C)(1) rating: allow the 430.52(C)(1)(b) maximums."),
    ];

    private static readonly Dictionary<string, KeywordSpec> ByName =
        All.ToDictionary(k => k.Keyword, StringComparer.OrdinalIgnoreCase);

    /// <summary>Tags are letters, digits, '-', '_', '.' and '/', starting with a letter or digit.</summary>
    public static bool IsValidTag(string text) => StatementParser.IsValidTag(text);

    public static KeywordSpec? Find(string keyword) => ByName.GetValueOrDefault(keyword);

    public static IEnumerable<KeywordSpec> AllowedIn(BlockKind block) => All.Where(k => k.AllowedIn.Contains(block));
}
