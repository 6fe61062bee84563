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
    /// <summary>430.28: a feeder tap's ampacity is below what Part II asks for the motor it supplies.</summary>
    public const string TapBelowPartTwo = "M510";
    /// <summary>430.28(1), (2): a tap not over 10 ft meets neither the 1000 % device limit nor one third of the feeder conductors' ampacity.</summary>
    public const string TapTenFootRule = "M511";
    /// <summary>430.28(2): a tap over 10 ft and not over 25 ft has less than one third of the feeder conductors' ampacity.</summary>
    public const string TapTwentyFiveFootRule = "M512";
    /// <summary>430.28(3): a tap over 25 ft has less ampacity than the feeder conductors.</summary>
    public const string TapOverTwentyFiveFeet = "M513";
    /// <summary>430.28: a feeder tap that cannot be checked (the feeder's wire or device is not written, or the tap's ampacity is not known).</summary>
    public const string TapNotChecked = "M514";
    /// <summary>430.28: tap conductors end in a branch-circuit protective device, and the motor writes no 'protection' rating.</summary>
    public const string TapWithoutBranchDevice = "M515";
    /// <summary>The starting dip at the motor's terminals is above the 'dip-limit' (15 % when not written).</summary>
    public const string StartingDipAtMotorHigh = "M516";
    /// <summary>The starting dip at the motor's feeder bus is above the 'dip-limit' for the bus (10 % when not written).</summary>
    public const string StartingDipAtBusHigh = "M517";
    /// <summary>A transformer feeder's running load is above the transformer's rated secondary current.</summary>
    public const string TransformerOverloaded = "M518";
}
