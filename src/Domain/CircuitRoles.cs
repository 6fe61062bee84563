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
