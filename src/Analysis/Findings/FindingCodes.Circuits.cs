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
}

/// <summary>Codes for capacitors, reduced-voltage starting leads and drives (M134-M149), errors and warnings as docs/checks.md says.</summary>
public static partial class FindingCodes
{
    public const string CapacitorWireUndersized = "M134";
    public const string CapacitorOverloadBasis = "M135";
    public const string MotorLeadsUndersized = "M137";
    public const string AboveDriveMaximum = "M138";
}
