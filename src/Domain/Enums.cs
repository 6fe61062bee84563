namespace MotorLang.Domain;

public enum Phases { Dc = 0, Single = 1, Three = 3 }

/// <summary>Motor construction, as the rows of Table 430.52(C)(1) distinguish them.</summary>
public enum MotorKind { Induction, WoundRotor, Synchronous, Dc }

public enum DesignLetter { A, B, C, D }

/// <summary>Design B premium efficiency / energy-efficient motors get the 1100 % instantaneous-trip column.</summary>
public enum Efficiency { Standard, Premium }

/// <summary>
/// Branch short-circuit and ground-fault devices. The first four are the columns of Table
/// 430.52(C)(1); the others are the devices 430.52(C)(5)-(7) permit in lieu of them.
/// </summary>
public enum ProtectiveDevice
{
    NonTimeDelayFuse,
    DualElementFuse,
    InstantaneousTripBreaker,
    InverseTimeBreaker,
    /// <summary>430.52(C)(7): part of a listed combination motor controller; a setting, at most 1300 % (1700 %).</summary>
    MotorShortCircuitProtector,
    /// <summary>430.52(C)(6): a listed self-protected combination controller; instantaneous setting at most 1300 % (1700 %).</summary>
    SelfProtectedController,
    /// <summary>430.52(C)(5): fuses for the power electronic devices of a solid-state controller, rated as marked beside them.</summary>
    SemiconductorFuse,
}

public enum DutyKind { Continuous, ShortTime, Intermittent, Periodic, Varying }

/// <summary>The time rating columns of Table 430.22(E).</summary>
public enum DutyRating { Minutes5, Minutes15, Minutes30To60, Continuous }

public enum StartingMethod { FullVoltage, WyeDelta, PartWinding, SoftStart, Drive }

public enum ConductorMaterial { Copper, Aluminum }

/// <summary>Raceway types whose areas (Chapter 9 Table 4) and reactance class (Table 9) we carry.</summary>
public enum RacewayType { Emt, Rmc, Pvc }

/// <summary>Motors for which 430.6(A) sends conductor, disconnect and protection sizing to the nameplate current.</summary>
public enum NameplateBasis { None, LowSpeed, HighTorque, Multispeed, CannedPump, ShadedPoleFan, PscFan }

/// <summary>Code letters of Table 430.7(B). I, O and Q are not used by the table.</summary>
public enum CodeLetter { A, B, C, D, E, F, G, H, J, K, L, M, N, P, R, S, T, U, V }

/// <summary>What supplies the plant: a utility with a stated fault current, an infinite bus (no impedance ahead of the first transformer), or a generator.</summary>
public enum SourceKind { Utility, InfiniteBus, Generator }

/// <summary>Which 430.53 permission a branch circuit supplying several motors is installed under.</summary>
public enum BranchGroupKind
{
    /// <summary>430.53(A): motors of 1 hp or less, each of 6 A or less, on a 120 V circuit at 20 A or less, or one of 1000 V or less at 15 A or less.</summary>
    SmallMotors,
    /// <summary>430.53(B): the branch device is no larger than 430.52 allows for the smallest motor.</summary>
    SmallestProtected,
    /// <summary>430.53(C): a group installation with controllers and overloads listed for it.</summary>
    ListedGroup,
}
