using MotorLang.Analysis.Findings;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>Everything computed for one motor, each value with its steps. Null where it could not be computed.</summary>
public sealed class MotorResult(MotorNode motor)
{
    public MotorNode Motor { get; private set; } = motor;

    /// <summary>The findings sizing this motor produced (kept with it so that an update can replace just these).</summary>
    internal Finding[] Findings { get; set; } = [];

    /// <summary>
    /// The same result for the copy of this motor in a newer model (its feeder was copied by an
    /// edit elsewhere in it). A copy, never the original, so an older analysis is never changed.
    /// </summary>
    internal MotorResult Rebind(MotorNode copy)
    {
        var r = (MotorResult)MemberwiseClone();
        r.Motor = copy;
        return r;
    }
    public string Tag => Motor.Tag?.Value ?? "";
    public decimal Horsepower { get; internal set; }
    public decimal Volts { get; internal set; }
    /// <summary>The motor's rated (nameplate) voltage: the system voltage unless the motor line gives its own.</summary>
    public decimal RatedVolts { get; internal set; }
    public Phases Phases { get; internal set; }
    public int Quantity { get; internal set; } = 1;
    /// <summary>How the motor is started (a drive brings the drive items into what is not checked).</summary>
    public StartingMethod StartingMethod { get; internal set; } = StartingMethod.FullVoltage;
    public Result<decimal> FullLoadCurrent { get; internal set; } = Result<decimal>.Missing("not computed");
    public Result<decimal>? RequiredAmpacity { get; internal set; }
    public Result<WireSpec>? MinimumWire { get; internal set; }
    /// <summary>The motor has no device of its own on a circuit supplying several motors: the circuit's device protects it (430.53).</summary>
    public bool ProtectedByGroup { get; internal set; }
    /// <summary>What the motor's conductors must carry as a tap from a circuit supplying several motors (430.53(D)).</summary>
    public Result<decimal>? TapAmpacity { get; internal set; }
    public WireSpec? Wire { get; internal set; }
    public Result<decimal>? WireAmpacity { get; internal set; }
    /// <summary>For a 16 or 18 AWG branch wire: what 430.22(G) says about it (its ampacity is not read from Table 310.16).</summary>
    public SmallConductorVerdict? SmallConductor { get; internal set; }
    public ProtectiveDevice Device { get; internal set; } = ProtectiveDevice.InverseTimeBreaker;
    /// <summary>A protection line is written but its device type is not one MotorLang knows: nothing about protection is sized.</summary>
    public bool DeviceUnknown { get; internal set; }
    public decimal? ProtectionRating { get; internal set; }
    public Result<decimal>? MaximumProtection { get; internal set; }
    /// <summary>What the 430.52 maximum was worked out from (a feeder reads it for 430.62(A) Exception No. 1).</summary>
    internal ProtectionInput? ProtectionBasis { get; set; }
    public decimal? Overload { get; internal set; }
    public Result<decimal>? OverloadLimit { get; internal set; }
    public Result<decimal>? OverloadAbsoluteLimit { get; internal set; }
    public Result<DisconnectRating>? Disconnect { get; internal set; }
    public Result<decimal>? Controller { get; internal set; }
    public Result<int>? NemaStarter { get; internal set; }
    public string? NemaStarterSize { get; internal set; }
    public ConductorSize? Ground { get; internal set; }
    public Result<ConductorSize>? MinimumGround { get; internal set; }
    public Result<Drop>? BranchDrop { get; internal set; }
    public decimal? TotalDropPercent { get; internal set; }
    /// <summary>The drop while starting, worked out when first read (only a hover shows it).</summary>
    public Result<Drop>? StartingDrop => _startingDrop ??= Starting is { } s
        ? VoltageDrop.Starting(s.LockedRotorAmps, s.Feet, s.Wire, s.Volts, s.Phases, s.Material, s.Raceway)
        : null;

    private Result<Drop>? _startingDrop;

    /// <summary>What the starting drop is worked out from.</summary>
    internal StartingDropInput? Starting { get; set; }
    public Result<TradeSize>? MinimumConduit { get; internal set; }
    public decimal? ConduitFillPercent { get; internal set; }
    public Result<CurrentRange>? LockedRotorFromCodeLetter { get; internal set; }
    public Result<decimal>? LockedRotorTableMaximum { get; internal set; }

    /// <summary>The installation settings the motor was sized with.</summary>
    internal Resolution.Settings? Settings { get; set; }

    /// <summary>What the motor is to a fire pump installation (Article 695), if anything.</summary>
    public FireServiceRole? FireService { get; internal set; }

    /// <summary>A fire pump's or pressure maintenance pump's locked-rotor current (695.4(B)(2)(a)(1)), the largest known.</summary>
    public Result<decimal>? FirePumpLockedRotor { get; internal set; }

    /// <summary>A fire pump's smallest permitted branch device (695.4(B)(2)(a)(1)); it replaces the 430.52 maximum.</summary>
    public Result<decimal>? FirePumpMinimumProtection { get; internal set; }

    /// <summary>Why no overload is asked for: a fire pump (695.6(D)), or a drive that provides it (430.124(A)).</summary>
    public Result<bool>? NoOverloadRequired { get; internal set; }

    /// <summary>The fire pump's protective device is stated to be listed for fire pump service.</summary>
    public bool FirePumpListedDevice { get; internal set; }

    /// <summary>A fire pump's branch drops for 695.7: starting at locked-rotor current, running at 115 % of full-load current.</summary>
    internal FirePumpBranch? FirePumpBranch { get; set; }

    /// <summary>A fire pump's voltage at starting and running (695.7), from the source through its feeders and branch.</summary>
    public Result<FirePumpVoltage>? FirePumpVoltage { get; internal set; }

    /// <summary>Written as a 'compressor': sized to Article 440 (FullLoadCurrent is then its RLA or selection current).</summary>
    public bool IsCompressor { get; internal set; }

    /// <summary>What a motor-compressor's nameplate is marked with, as written (Article 440).</summary>
    public CompressorMarking? Compressor { get; internal set; }

    /// <summary>
    /// Marked equipment's loads other than its largest motor-compressor, as its feeder counts them:
    /// the marked minimum circuit ampacity less 125 % of that compressor's current (440.33; docs/checks.md).
    /// </summary>
    public decimal? EquipmentOtherLoads { get; internal set; }

    /// <summary>The ampacity the conductors between the controller or drive and the motor need (430.22(C), (D), 430.122(B)); null for other starting.</summary>
    public Result<decimal>? LeadAmpacity { get; internal set; }
    public Result<WireSpec>? MinimumLeads { get; internal set; }
    /// <summary>Those conductors: as written ('motor-leads'), else taken to be the branch wire.</summary>
    public WireSpec? Leads { get; internal set; }
    /// <summary>The leads are written on the list, not taken to be the branch wire.</summary>
    public bool LeadsWritten { get; internal set; }
    public Result<decimal>? LeadsAmpacity { get; internal set; }

    /// <summary>The drive's marked or instructed maximum branch device (430.130(A)(2)), as written.</summary>
    public decimal? DriveMaximumProtection { get; internal set; }

    /// <summary>A power-factor capacitor is written on this motor circuit (Article 460).</summary>
    public bool HasCapacitor { get; internal set; }

    /// <summary>The capacitor is on the load side of the overload (written or taken so): 460.9 sets the overload's basis.</summary>
    public bool CapacitorOnLoadSide { get; internal set; }

    /// <summary>The capacitor's rated current, written or from its kvar (460.8(A)).</summary>
    public Result<decimal>? CapacitorRatedCurrent { get; internal set; }

    /// <summary>The ampacity the capacitor's conductors need (460.8(A)).</summary>
    public Result<decimal>? CapacitorRequiredAmpacity { get; internal set; }
    public Result<WireSpec>? MinimumCapacitorWire { get; internal set; }
    public WireSpec? CapacitorWire { get; internal set; }
    public Result<decimal>? CapacitorWireAmpacity { get; internal set; }

    /// <summary>The current the overload is selected from when it is not the nameplate (460.9, with a load-side capacitor).</summary>
    public Result<decimal>? OverloadBasis { get; internal set; }

    /// <summary>A motor control circuit was checked on this motor (430.72): a 'control-wire' or a 'control-transformer' is written.</summary>
    public bool ControlCircuitChecked { get; internal set; }

    /// <summary>A control circuit transformer is written on this motor (430.72(C)).</summary>
    public bool HasControlTransformer { get; internal set; }

    /// <summary>The largest device Table 430.72(B) permits on the control conductors (the column that applies, or 430.72(B) Exception No. 2 through the transformer).</summary>
    public Result<decimal>? ControlConductorLimit { get; internal set; }

    /// <summary>The written device the control conductors were compared with: the control circuit's own, the motor branch device, or the transformer's primary device.</summary>
    public decimal? ControlConductorDevice { get; internal set; }

    /// <summary>The largest primary device 430.72(C) permits on the control transformer.</summary>
    public Result<decimal>? ControlPrimaryLimit { get; internal set; }

    /// <summary>The control transformer's primary device as written.</summary>
    public decimal? ControlPrimaryDevice { get; internal set; }

    /// <summary>The largest secondary device Table 450.3(B) permits with primary and secondary protection (430.72(C)(2)).</summary>
    public Result<decimal>? ControlSecondaryLimit { get; internal set; }

    /// <summary>The 20 A a small portable motor within sight may have on a 120 V branch circuit (430.32(D)(2)(a) Exception), where 430.52 gives less and it was used.</summary>
    public Result<decimal>? SmallMotorCircuitAllowance { get; internal set; }

    /// <summary>The number of overload units Table 430.37 requires, when 'overload-units' is written.</summary>
    public Result<int>? OverloadUnitsRequired { get; internal set; }
    public int? OverloadUnits { get; internal set; }

    /// <summary>The current this motor adds to its feeder under 430.24 (its duty-cycle current when it has one).</summary>
    public decimal? DutyCycleAmps { get; internal set; }
}

/// <summary>A fire pump branch's part of the 695.7 drops, and the currents the feeders carry for them.</summary>
internal sealed record FirePumpBranch(Drop? Starting, Drop? Running, decimal LockedRotorAmps, decimal ExtraRunningAmps, string? Missing);

/// <summary>The 695.7 voltage drops of a fire pump, as percentages of the system voltage, with their limits.</summary>
public readonly record struct FirePumpVoltage(decimal StartingPercent, decimal StartingLimitPercent, decimal RunningPercent, decimal RunningLimitPercent);

internal readonly record struct StartingDropInput(decimal LockedRotorAmps, decimal Feet, WireSpec Wire, decimal Volts, Phases Phases,
    ConductorMaterial Material, RacewayType Raceway);

/// <summary>Everything computed for one feeder.</summary>
public sealed class FeederResult(FeederNode feeder)
{
    public FeederNode Feeder { get; } = feeder;

    /// <summary>The findings sizing this feeder produced.</summary>
    internal Finding[] SizingFindings { get; set; } = [];

    /// <summary>Total voltage-drop findings of the motors on this feeder, which depend on its drop from the source.</summary>
    internal Finding[] DropFindings { get; set; } = [];

    /// <summary>A copy to change, so that an older analysis holding this result never sees it change.</summary>
    internal FeederResult Copy() => (FeederResult)MemberwiseClone();
    public string Tag => Feeder.Tag?.Value ?? "";
    public decimal Volts { get; internal set; }
    public Phases Phases { get; internal set; }
    /// <summary>Running load: the full-load currents of every motor supplied through it plus its other loads, at 100 %.</summary>
    public decimal CalculatedLoad { get; internal set; }
    public Result<decimal>? RequiredAmpacity { get; internal set; }
    public Result<WireSpec>? MinimumWire { get; internal set; }
    public WireSpec? Wire { get; internal set; }
    public Result<decimal>? WireAmpacity { get; internal set; }
    public decimal? ProtectionRating { get; internal set; }
    public Result<decimal>? MaximumProtection { get; internal set; }
    public ConductorSize? Ground { get; internal set; }
    public Result<ConductorSize>? MinimumGround { get; internal set; }
    public Result<Drop>? Drop { get; internal set; }
    public Result<TradeSize>? MinimumConduit { get; internal set; }
    public decimal? ConduitFillPercent { get; internal set; }
    /// <summary>The feeder supplies a fire pump (directly or through feeders 'from' it): 695.4 and 695.6 replace 430.62 and add to 430.24.</summary>
    public bool SuppliesFirePump { get; internal set; }

    /// <summary>The smallest protective device a fire pump supply permits (695.4(B)(2)(a)(1)).</summary>
    public Result<decimal>? FirePumpMinimumProtection { get; internal set; }

    /// <summary>What the feeder's drop is worked out from, for the fire pump checks that add other currents to it.</summary>
    internal DropBasis? DropBasis { get; set; }

    /// <summary>The block is one branch circuit supplying several motors, under this 430.53 permission.</summary>
    public BranchGroupKind? BranchGroup { get; internal set; }

    /// <summary>A disconnect serving everything the feeder carries (430.110(C)), when one is written.</summary>
    public Result<DisconnectRating>? Disconnect { get; internal set; }

    /// <summary>Drop from the source to this feeder's load end, through the feeders it is supplied from.</summary>
    public decimal? CumulativeDropPercent { get; internal set; }
}

/// <summary>A circuit's conductors and settings, to work out its drop at another current or power factor.</summary>
internal sealed record DropBasis(decimal Feet, WireSpec Wire, decimal Volts, Phases Phases, ConductorMaterial Material, RacewayType Raceway, decimal PowerFactor)
{
    public decimal? Percent(decimal amps, decimal powerFactor) =>
        VoltageDrop.Of(amps, Feet, Wire, Volts, Phases, Material, Raceway, powerFactor).Value?.Percent;
}
