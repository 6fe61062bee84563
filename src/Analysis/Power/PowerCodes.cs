namespace MotorLang.Analysis.Findings;

/// <summary>Codes for the power system behind the motors: fault current, ratings, transformers (M500-M539, documented in docs/checks.md).</summary>
public static partial class FindingCodes
{
    /// <summary>110.9: a protective device's interrupting rating is below the fault current at its line terminals.</summary>
    public const string InterruptingTooLow = "M500";
    /// <summary>110.10, 409.22: a feeder bus's equipment short-circuit current rating is below the fault current there.</summary>
    public const string BusSccrTooLow = "M501";
    /// <summary>110.10, 430.8: a motor controller's or drive's short-circuit current rating is below the fault current there.</summary>
    public const string ControllerSccrTooLow = "M502";
    /// <summary>110.9: a transformer's primary device's interrupting rating is below the fault current where it stands.</summary>
    public const string PrimaryInterruptingTooLow = "M503";
    /// <summary>Table 450.3(B): the transformer's primary device is larger than the table permits.</summary>
    public const string TransformerPrimaryTooLarge = "M504";
    /// <summary>Table 450.3(B): the transformer's secondary device is larger than the table permits.</summary>
    public const string TransformerSecondaryTooLarge = "M505";
    /// <summary>240.21(C)(2), (C)(6): the secondary conductors' ampacity is below what the rule for their length asks.</summary>
    public const string SecondaryConductorsUndersized = "M506";
    /// <summary>240.21(C): secondary conductors over 25 ft, permitted only as outside conductors (240.21(C)(4)).</summary>
    public const string SecondaryConductorsTooLong = "M507";
    /// <summary>A transformer whose voltages do not match its feeder (secondary) or the bus it is supplied from (primary).</summary>
    public const string TransformerVoltageMismatch = "M508";
    /// <summary>240.21(C)(2), (C)(6): secondary conductors that end in no overcurrent device written in the list.</summary>
    public const string SecondaryConductorsUnprotected = "M509";
}
