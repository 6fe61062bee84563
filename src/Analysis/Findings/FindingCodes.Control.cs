namespace MotorLang.Analysis.Findings;

/// <summary>Codes for motor control circuits (430.72) and overload units (430.37), M170-M179, of the block whose severity docs/checks.md gives.</summary>
public static partial class FindingCodes
{
    public const string ControlProtectionTooLarge = "M170";
    public const string ControlBranchDeviceTooLarge = "M171";
    public const string ControlTransformerPrimaryTooLarge = "M172";
    public const string ControlSecondaryUnprotected = "M173";
    public const string ControlTransformerUnprotected = "M174";
    public const string ControlCircuitNotChecked = "M175";
    public const string TooFewOverloadUnits = "M176";
}
