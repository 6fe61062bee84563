namespace MotorLang.Analysis.Findings;

/// <summary>
/// Stable codes for sizing findings, documented in docs/checks.md. Never renumber. M1xx are
/// errors against a code rule, M2xx warnings, M3xx information (values not written yet).
/// </summary>
public static partial class FindingCodes
{
    public const string WireUndersized = "M101";
    public const string ProtectionTooLarge = "M102";
    public const string OverloadTooLarge = "M103";
    public const string DisconnectTooSmall = "M104";
    public const string ControllerTooSmall = "M105";
    public const string GroundUndersized = "M106";
    public const string FeederWireUndersized = "M107";
    public const string FeederProtectionTooLarge = "M108";
    public const string ConduitOverfilled = "M109";
    public const string VoltageMismatch = "M110";
    public const string NeedsNameplate = "M111";
    public const string FirePumpProtectionTooSmall = "M112";
    public const string FirePumpOverload = "M113";
    public const string FirePumpConductorsUndersized = "M114";
    public const string FirePumpStartingDrop = "M115";
    public const string FirePumpRunningDrop = "M116";
    public const string PartWindingProtectionTooLarge = "M117";
    public const string SmallConductorNotPermitted = "M120";
    public const string CompressorWireUndersized = "M130";
    public const string CompressorProtectionTooLarge = "M131";
    public const string CompressorDisconnectTooSmall = "M132";
    /// <summary>A statement that means nothing for the kind of circuit it is on (a motor attribute under a compressor, or the reverse): it is not used.</summary>
    public const string NotUsedHere = "M133";

    public const string ProtectionMayTrip = "M201";
    public const string VoltageDropHigh = "M202";
    public const string OverloadMissing = "M203";
    public const string CannotCheck = "M204";
    public const string OverloadAboveRunningLimit = "M205";
    public const string FirePumpDropPartlyChecked = "M206";
    public const string FeederDeviceNotSized = "M215";
    public const string SuppliesAnotherVoltage = "M216";

    /// <summary>
    /// Outside what MotorLang sizes (an unsupported kind, a device type it does not know, a
    /// voltage with no table, a rule or table it does not carry): says what and why, and nothing
    /// on that circuit is computed by a wrong rule instead.
    /// </summary>
    public const string OutsideScope = "M210";
    public const string SmallConductorConditions = "M211";

    public const string NotWritten = "M301";
    public const string FirePumpListedDevice = "M302";
    public const string NotShown = "M310";

    /// <summary>An acknowledgement (`# acknowledge CODE: reason`) that matches no finding on its line any more.</summary>
    public const string AcknowledgementStale = "M320";

    /// <summary>An acknowledgement that names no code, or one that does not exist or cannot be acknowledged.</summary>
    public const string AcknowledgementBadCode = "M321";

    /// <summary>An acknowledgement without a reason: it acknowledges nothing until the reason is written.</summary>
    public const string AcknowledgementWithoutReason = "M322";
}
