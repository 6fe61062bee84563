namespace MotorLang.Analysis.Findings;

/// <summary>
/// Codes for branch devices, drives and shared circuits (M150-M179). This block was allotted as a
/// whole, so its codes carry their severity in docs/checks.md rather than in the hundreds digit.
/// </summary>
public static partial class FindingCodes
{
    public const string NotInListedCombination = "M150";
    public const string SemiconductorFuseNotChecked = "M151";
    public const string ClassCcNotAFuse = "M152";

    /// <summary>The device of a branch circuit supplying several motors is above what its 430.53 permission allows.</summary>
    public const string GroupProtectionTooLarge = "M160";
    /// <summary>A branch circuit written under a 430.53 permission whose conditions it does not meet.</summary>
    public const string GroupNotPermitted = "M161";
    /// <summary>A tap to one motor of a group circuit carries less than 430.53(D) asks.</summary>
    public const string GroupTapUndersized = "M162";
    /// <summary>A disconnect serving several motors is rated below 430.110(C).</summary>
    public const string GroupDisconnectTooSmall = "M163";
    /// <summary>A 430.26 demand factor is applied by the permission written: said, with the permission.</summary>
    public const string DemandFactorApplied = "M164";
    /// <summary>A device that is also the overload (430.55) is above the 430.32(C) maximum.</summary>
    public const string CombinedDeviceTooLarge = "M165";
    /// <summary>A device that is also the overload (430.55) is above the 430.32(A)(1) limit but within 430.32(C).</summary>
    public const string CombinedDeviceAboveRunningLimit = "M166";
    /// <summary>An interlock named on one motor only: nothing is interlocked with it.</summary>
    public const string InterlockAlone = "M167";
}

/// <summary>Codes for capacitors, reduced-voltage starting leads and drives (M134-M149), errors and warnings as docs/checks.md says.</summary>
public static partial class FindingCodes
{
    public const string CapacitorWireUndersized = "M134";
    public const string CapacitorOverloadBasis = "M135";
    public const string MotorLeadsUndersized = "M137";
    public const string AboveDriveMaximum = "M138";
}
