namespace MotorLang.Domain;

/// <summary>What a motor or load is to a fire pump installation (Article 695); none for ordinary equipment.</summary>
public enum FireServiceRole { FirePump, PressureMaintenance, Accessory }

/// <summary>
/// How a part-winding motor's short-circuit device or overload is arranged (430.4): one per
/// winding connection, or one for both windings.
/// </summary>
public enum WindingScope { PerWinding, BothWindings }

/// <summary>Where a power-factor capacitor on a motor circuit is connected relative to the motor's overload device (460.9).</summary>
public enum CapacitorPosition { LoadSide, LineSide }

/// <summary>Where the overload relay of a wye-start, delta-run motor sits: in the motor leads (the delta circuit) or in the line conductors.</summary>
public enum OverloadLocation { DeltaLeads, LineLeads }

/// <summary>Whether a motor control circuit's conductors stay within the motor control equipment enclosure (Table 430.72(B) Column B) or leave it (Column C).</summary>
public enum ControlRoute { WithinEnclosure, LeavesEnclosure }

/// <summary>How a motor of 1 hp or less is installed, for 430.32(D): permanently, or not (portable).</summary>
public enum Installation { Portable }

/// <summary>Whether a manually started motor is within sight from its controller (430.32(D)(2)).</summary>
public enum SightOfController { WithinSight }
