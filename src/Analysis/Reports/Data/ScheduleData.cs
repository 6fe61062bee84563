using MotorLang.Analysis.Coverage;

namespace MotorLang.Analysis.Reports.Data;

/// <summary>
/// The motor schedule as typed data: what the JSON, CSV and spreadsheet outputs and the report all
/// read. Numbers are <see cref="Measure"/>s (value and unit); a value that could not be worked out is
/// null and its reason is in the row's <c>NotComputed</c>; conductor and raceway sizes are
/// designations ("10 AWG", "2x 250 kcmil", "3/4"), so they stay text.
/// </summary>
public sealed record ScheduleData(int FormatVersion, TitleBlock Title, IReadOnlyList<MotorData> Motors, IReadOnlyList<FeederData> Feeders)
{
    /// <summary>Raised when a field is renamed, removed or changes meaning; adding a field keeps the version.</summary>
    public const int CurrentFormatVersion = 1;
}

/// <summary>The project's title block: what identifies the issued schedule. Null where the list does not say.</summary>
public sealed record TitleBlock(
    string? Project, string? Number, string? Revision, string? Date, string? PreparedBy, string? CheckedBy);

/// <summary>A finding on a schedule row: its code, severity (error, warning, information), 1-based line and message.</summary>
public sealed record RowFinding(string Code, string Severity, int Line, string Message);

/// <summary>A value of the row that was not worked out, and why (in words, never a guess).</summary>
public sealed record NotComputed(string Field, string Reason);

/// <summary>One motor: as written, as computed, and what was found. Field names are those of the JSON (camelCase).</summary>
public sealed record MotorData
{
    /// <summary>The file the motor is written in, as the caller named it (null when the text came from elsewhere).</summary>
    public string? File { get; init; }
    /// <summary>1-based line of the motor's header.</summary>
    public int Line { get; init; }
    public string Feeder { get; init; } = "";
    public string Tag { get; init; } = "";
    public string Description { get; init; } = "";
    /// <summary>How many identical motors the row stands for (<c>quantity</c>).</summary>
    public int Quantity { get; init; } = 1;
    /// <summary>"motor" (sized under Article 430) or "compressor" (a motor-compressor or marked equipment, Article 440).</summary>
    public string Kind { get; init; } = "motor";
    /// <summary>Rated power as written (hp or kW); null for a compressor.</summary>
    public Measure? Power { get; init; }
    /// <summary>A compressor's marked rated-load current (RLA), as written.</summary>
    public Measure? RatedLoadCurrent { get; init; }
    /// <summary>A compressor's marked branch-circuit selection current, as written.</summary>
    public Measure? SelectionCurrent { get; init; }
    /// <summary>Marked locked-rotor current, as written.</summary>
    public Measure? LockedRotorCurrent { get; init; }
    /// <summary>Marked equipment's minimum circuit ampacity (440.4(B)), as written.</summary>
    public Measure? MinimumCircuitAmpacity { get; init; }
    /// <summary>Marked equipment's maximum short-circuit and ground-fault device (440.4(B)), as written.</summary>
    public Measure? MarkedMaximumProtection { get; init; }
    /// <summary>System voltage the motor is sized at.</summary>
    public Measure? Volts { get; init; }
    /// <summary>Nameplate (rated) voltage.</summary>
    public Measure? RatedVolts { get; init; }
    /// <summary>1, 3, or 0 for direct current.</summary>
    public int? Phases { get; init; }
    /// <summary>How it is started, in the list's words (full-voltage, wye-delta, part-winding, soft-start, drive).</summary>
    public string StartingMethod { get; init; } = "";
    /// <summary>Nameplate full-load current, as written.</summary>
    public Measure? NameplateCurrent { get; init; }
    public decimal? ServiceFactor { get; init; }
    public string? CodeLetter { get; init; }
    public string? Design { get; init; }
    /// <summary>The full-load current conductors, disconnect and protection are sized from (430.6(A)).</summary>
    public Measure? FullLoadCurrent { get; init; }
    public Measure? RequiredAmpacity { get; init; }
    public string? MinimumWire { get; init; }
    public string? Wire { get; init; }
    public Measure? WireAmpacity { get; init; }
    /// <summary>Conductors between the controller (or drive) and the motor: their required ampacity (430.22(C), (D), 430.122(B)); null where the branch wire runs to the motor.</summary>
    public Measure? LeadsRequiredAmpacity { get; init; }
    public string? MinimumLeads { get; init; }
    /// <summary>The leads as written ('motor-leads'), else the branch wire they are taken to be.</summary>
    public string? Leads { get; init; }
    /// <summary>A power-factor capacitor's rated current (460.8(A)); null without a capacitor.</summary>
    public Measure? CapacitorRatedCurrent { get; init; }
    public Measure? CapacitorWireRequiredAmpacity { get; init; }
    public string? MinimumCapacitorWire { get; init; }
    public string? CapacitorWire { get; init; }
    /// <summary>The largest device Table 430.72(B) permits on the motor control conductors (430.72(B)); null without a checked control circuit.</summary>
    public Measure? ControlConductorLimit { get; init; }
    /// <summary>The largest primary device 430.72(C) permits on the control transformer; null without one.</summary>
    public Measure? ControlPrimaryLimit { get; init; }
    /// <summary>The number of overload units Table 430.37 requires (430.37); null when 'overload-units' is not written.</summary>
    public int? OverloadUnitsRequired { get; init; }
    /// <summary>The protective device, in the list's words (inverse-time-breaker, dual-element-fuse, ...).</summary>
    public string ProtectionDevice { get; init; } = "";
    /// <summary>Largest branch short-circuit and ground-fault device permitted (430.52); null for a fire pump.</summary>
    public Measure? MaximumProtection { get; init; }
    /// <summary>A fire pump's smallest permitted device (695.4(B)(2)(a)(1)); null for other motors.</summary>
    public Measure? MinimumProtection { get; init; }
    /// <summary>The device rating as written.</summary>
    public Measure? Protection { get; init; }
    public Measure? OverloadLimit { get; init; }
    public Measure? Overload { get; init; }
    /// <summary>The circuit whose device protects this motor when it is on a branch circuit supplying several motors (430.53) with no device of its own; null otherwise.</summary>
    public string? ProtectedBy { get; init; }
    /// <summary>What the motor's conductors must carry as a tap from that circuit (430.53(D)); null when not a tap.</summary>
    public Measure? TapRequiredAmpacity { get; init; }
    public Measure? DisconnectMinimumCurrent { get; init; }
    public Measure? DisconnectMinimumPower { get; init; }
    /// <summary>NEMA starter size for the motor's horsepower (ICS 2), when the table has it.</summary>
    public string? StarterSize { get; init; }
    public string? MinimumGround { get; init; }
    public string? Ground { get; init; }
    public string? MinimumConduit { get; init; }
    public string? Conduit { get; init; }
    public Measure? ConduitFill { get; init; }
    /// <summary>One-way length as written (ft or m).</summary>
    public Measure? Length { get; init; }
    public Measure? BranchVoltageDrop { get; init; }
    /// <summary>Drop from the source through the feeders and this branch.</summary>
    public Measure? TotalVoltageDrop { get; init; }
    /// <summary>Three-phase bolted fault current at the motor's controller (taken to stand at its feeder's bus) from the source alone (ohmic method, docs/checks.md); null when the list has no 'source' or it could not be worked out.</summary>
    public Measure? FaultCurrent { get; init; }
    /// <summary>The same plus the running motors' contribution (≈ 4 × FLC, an approximation): what ratings are checked against.</summary>
    public Measure? FaultCurrentWithMotors { get; init; }
    /// <summary>X/R of the impedance from the source to the controller; null where it has no resistance or nothing was worked out.</summary>
    public decimal? FaultXOverR { get; init; }
    /// <summary>ok, warnings or errors: the worst finding on the motor's lines.</summary>
    public string Status { get; init; } = "ok";
    public IReadOnlyList<RowFinding> Findings { get; init; } = [];
    public IReadOnlyList<NotComputed> NotComputed { get; init; } = [];
    public IReadOnlyList<AppliedRule> RulesApplied { get; init; } = [];
    public IReadOnlyList<NotCheckedNote> NotChecked { get; init; } = [];
}

/// <summary>One feeder: its load, conductors and protection, and what was found on its own lines.</summary>
public sealed record FeederData
{
    public string? File { get; init; }
    public int Line { get; init; }
    public string Tag { get; init; } = "";
    public string Description { get; init; } = "";
    /// <summary>The feeder or switchboard it is supplied from, as written.</summary>
    public string? From { get; init; }
    public Measure? Volts { get; init; }
    public int? Phases { get; init; }
    /// <summary>How many motor rows it supplies directly.</summary>
    public int MotorCount { get; init; }
    /// <summary>Running load: full-load currents of everything supplied through it, at 100 %.</summary>
    public Measure? CalculatedLoad { get; init; }
    public Measure? RequiredAmpacity { get; init; }
    public string? MinimumWire { get; init; }
    public string? Wire { get; init; }
    public Measure? WireAmpacity { get; init; }
    public string ProtectionDevice { get; init; } = "";
    public Measure? MaximumProtection { get; init; }
    public Measure? MinimumProtection { get; init; }
    public Measure? Protection { get; init; }
    public string? MinimumGround { get; init; }
    public string? Ground { get; init; }
    public string? MinimumConduit { get; init; }
    public string? Conduit { get; init; }
    public Measure? ConduitFill { get; init; }
    public Measure? Length { get; init; }
    public Measure? VoltageDrop { get; init; }
    /// <summary>Drop from the source to this feeder's load end.</summary>
    public Measure? TotalVoltageDrop { get; init; }
    /// <summary>Three-phase bolted fault current at the feeder's bus (its load end) from the source alone (ohmic method, docs/checks.md); null when the list has no 'source' or it could not be worked out.</summary>
    public Measure? FaultCurrent { get; init; }
    /// <summary>The same plus the running motors' contribution (≈ 4 × FLC, an approximation): what ratings are checked against.</summary>
    public Measure? FaultCurrentWithMotors { get; init; }
    /// <summary>X/R of the impedance from the source to the bus; null where it has no resistance or nothing was worked out.</summary>
    public decimal? FaultXOverR { get; init; }
    public bool SuppliesFirePump { get; init; }
    /// <summary>The 430.53 permission of a branch circuit supplying several motors ('branch-group'): small-motors, smallest-protected or listed-group; null for a feeder.</summary>
    public string? BranchGroup { get; init; }
    /// <summary>A 430.26 demand factor applied by the authority's written permission; null when none.</summary>
    public Measure? DemandFactor { get; init; }
    /// <summary>A written disconnect serving everything the block supplies: the 430.110(C) ampere and horsepower minimums; null when none is written or it could not be sized.</summary>
    public Measure? DisconnectMinimumCurrent { get; init; }
    public Measure? DisconnectMinimumPower { get; init; }
    public string Status { get; init; } = "ok";
    public IReadOnlyList<RowFinding> Findings { get; init; } = [];
    public IReadOnlyList<NotComputed> NotComputed { get; init; } = [];
    public IReadOnlyList<AppliedRule> RulesApplied { get; init; } = [];
    public IReadOnlyList<NotCheckedNote> NotChecked { get; init; } = [];
}
