namespace MotorLang.Analysis.Reports.Data;

/// <summary>
/// One column of a flat schedule table (CSV, spreadsheet): its header with the unit in brackets, the
/// unit alone (null for text), and the cell: a decimal, an int, a bool, a string, or null for empty.
/// </summary>
public sealed record ScheduleColumn<T>(string Header, string? Unit, Func<T, object?> Cell);

/// <summary>
/// The columns of the flat motor and feeder tables, in order. A measure's number goes in a column
/// whose header names its unit; a quantity written in either of two units (power in hp or kW,
/// length in ft or m) has a number column and a unit column beside it.
/// </summary>
public static class ScheduleColumns
{
    public static readonly IReadOnlyList<ScheduleColumn<MotorData>> Motors =
    [
        Text<MotorData>("File", m => m.File),
        Number<MotorData>("Line", null, m => m.Line),
        Text<MotorData>("Feeder", m => m.Feeder),
        Text<MotorData>("Tag", m => m.Tag),
        Text<MotorData>("Description", m => m.Description),
        Number<MotorData>("Quantity", null, m => m.Quantity),
        Number<MotorData>("Power", null, m => m.Power?.Value),
        Text<MotorData>("Power unit", m => m.Power?.Unit),
        Number<MotorData>("Volts", Measure.Volts, m => m.Volts?.Value),
        Number<MotorData>("Rated volts", Measure.Volts, m => m.RatedVolts?.Value),
        Number<MotorData>("Phases", null, m => m.Phases),
        Text<MotorData>("Starting", m => m.StartingMethod),
        Number<MotorData>("Nameplate current", Measure.Amps, m => m.NameplateCurrent?.Value),
        Number<MotorData>("Service factor", null, m => m.ServiceFactor),
        Text<MotorData>("Code letter", m => m.CodeLetter),
        Text<MotorData>("Design", m => m.Design),
        Number<MotorData>("FLC", Measure.Amps, m => m.FullLoadCurrent?.Value),
        Number<MotorData>("Required ampacity", Measure.Amps, m => m.RequiredAmpacity?.Value),
        Text<MotorData>("Min wire", m => m.MinimumWire),
        Text<MotorData>("Wire", m => m.Wire),
        Number<MotorData>("Wire ampacity", Measure.Amps, m => m.WireAmpacity?.Value),
        Number<MotorData>("Leads required ampacity", Measure.Amps, m => m.LeadsRequiredAmpacity?.Value),
        Text<MotorData>("Min leads", m => m.MinimumLeads),
        Text<MotorData>("Leads", m => m.Leads),
        Number<MotorData>("Capacitor current", Measure.Amps, m => m.CapacitorRatedCurrent?.Value),
        Number<MotorData>("Capacitor wire required ampacity", Measure.Amps, m => m.CapacitorWireRequiredAmpacity?.Value),
        Text<MotorData>("Min capacitor wire", m => m.MinimumCapacitorWire),
        Text<MotorData>("Capacitor wire", m => m.CapacitorWire),
        Text<MotorData>("Protection device", m => m.ProtectionDevice),
        Number<MotorData>("Max protection", Measure.Amps, m => m.MaximumProtection?.Value),
        Number<MotorData>("Min protection", Measure.Amps, m => m.MinimumProtection?.Value),
        Number<MotorData>("Protection", Measure.Amps, m => m.Protection?.Value),
        Number<MotorData>("Overload limit", Measure.Amps, m => m.OverloadLimit?.Value),
        Number<MotorData>("Overload", Measure.Amps, m => m.Overload?.Value),
        Number<MotorData>("Overload units required", null, m => m.OverloadUnitsRequired),
        Number<MotorData>("Control conductors max protection", Measure.Amps, m => m.ControlConductorLimit?.Value),
        Number<MotorData>("Control transformer max primary", Measure.Amps, m => m.ControlPrimaryLimit?.Value),
        Number<MotorData>("Disconnect current", Measure.Amps, m => m.DisconnectMinimumCurrent?.Value),
        Number<MotorData>("Disconnect power", Measure.Horsepower, m => m.DisconnectMinimumPower?.Value),
        Text<MotorData>("Starter size", m => m.StarterSize),
        Text<MotorData>("Min ground", m => m.MinimumGround),
        Text<MotorData>("Ground", m => m.Ground),
        Text<MotorData>("Min conduit (trade size)", m => m.MinimumConduit),
        Text<MotorData>("Conduit (trade size)", m => m.Conduit),
        Number<MotorData>("Conduit fill", Measure.Percent, m => m.ConduitFill?.Value),
        Number<MotorData>("Length", null, m => m.Length?.Value),
        Text<MotorData>("Length unit", m => m.Length?.Unit),
        Number<MotorData>("Branch drop", Measure.Percent, m => m.BranchVoltageDrop?.Value),
        Number<MotorData>("Total drop", Measure.Percent, m => m.TotalVoltageDrop?.Value),
        Number<MotorData>("Fault current", Measure.KiloAmps, m => m.FaultCurrent?.Value),
        Number<MotorData>("Fault current with motors", Measure.KiloAmps, m => m.FaultCurrentWithMotors?.Value),
        Number<MotorData>("Fault X/R", null, m => m.FaultXOverR),
        Text<MotorData>("Status", m => m.Status),
        Text<MotorData>("Findings", m => Codes(m.Findings)),
        Text<MotorData>("Not computed", m => Fields(m.NotComputed)),
    ];

    public static readonly IReadOnlyList<ScheduleColumn<FeederData>> Feeders =
    [
        Text<FeederData>("File", f => f.File),
        Number<FeederData>("Line", null, f => f.Line),
        Text<FeederData>("Feeder", f => f.Tag),
        Text<FeederData>("Description", f => f.Description),
        Text<FeederData>("From", f => f.From),
        Number<FeederData>("Volts", Measure.Volts, f => f.Volts?.Value),
        Number<FeederData>("Phases", null, f => f.Phases),
        Number<FeederData>("Motors", null, f => f.MotorCount),
        Number<FeederData>("Calculated load", Measure.Amps, f => f.CalculatedLoad?.Value),
        Number<FeederData>("Required ampacity", Measure.Amps, f => f.RequiredAmpacity?.Value),
        Text<FeederData>("Min wire", f => f.MinimumWire),
        Text<FeederData>("Wire", f => f.Wire),
        Number<FeederData>("Wire ampacity", Measure.Amps, f => f.WireAmpacity?.Value),
        Text<FeederData>("Protection device", f => f.ProtectionDevice),
        Number<FeederData>("Max protection", Measure.Amps, f => f.MaximumProtection?.Value),
        Number<FeederData>("Min protection", Measure.Amps, f => f.MinimumProtection?.Value),
        Number<FeederData>("Protection", Measure.Amps, f => f.Protection?.Value),
        Text<FeederData>("Min ground", f => f.MinimumGround),
        Text<FeederData>("Ground", f => f.Ground),
        Text<FeederData>("Min conduit (trade size)", f => f.MinimumConduit),
        Text<FeederData>("Conduit (trade size)", f => f.Conduit),
        Number<FeederData>("Conduit fill", Measure.Percent, f => f.ConduitFill?.Value),
        Number<FeederData>("Length", null, f => f.Length?.Value),
        Text<FeederData>("Length unit", f => f.Length?.Unit),
        Number<FeederData>("Voltage drop", Measure.Percent, f => f.VoltageDrop?.Value),
        Number<FeederData>("Total drop", Measure.Percent, f => f.TotalVoltageDrop?.Value),
        Number<FeederData>("Fault current", Measure.KiloAmps, f => f.FaultCurrent?.Value),
        Number<FeederData>("Fault current with motors", Measure.KiloAmps, f => f.FaultCurrentWithMotors?.Value),
        Number<FeederData>("Fault X/R", null, f => f.FaultXOverR),
        Text<FeederData>("Supplies fire pump", f => f.SuppliesFirePump ? "yes" : "no"),
        Text<FeederData>("Status", f => f.Status),
        Text<FeederData>("Findings", f => Codes(f.Findings)),
        Text<FeederData>("Not computed", f => Fields(f.NotComputed)),
    ];

    private static ScheduleColumn<T> Text<T>(string header, Func<T, string?> cell) => new(header, null, r => cell(r) is { Length: > 0 } s ? s : null);

    private static ScheduleColumn<T> Number<T>(string header, string? unit, Func<T, decimal?> cell) =>
        new(unit is null ? header : $"{header} ({unit})", unit, r => cell(r));

    private static string Codes(IReadOnlyList<RowFinding> findings) => string.Join(" ", findings.Select(f => f.Code).Distinct());

    private static string Fields(IReadOnlyList<NotComputed> missing) => string.Join(" ", missing.Select(n => n.Field).Distinct());
}
