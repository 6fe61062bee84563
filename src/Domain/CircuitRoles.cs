namespace MotorLang.Domain;

/// <summary>What a motor or load is to a fire pump installation (Article 695); none for ordinary equipment.</summary>
public enum FireServiceRole { FirePump, PressureMaintenance, Accessory }

/// <summary>
/// How a part-winding motor's short-circuit device or overload is arranged (430.4): one per
/// winding connection, or one for both windings.
/// </summary>
public enum WindingScope { PerWinding, BothWindings }
