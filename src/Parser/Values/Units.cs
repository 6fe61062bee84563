namespace MotorLang.Parser.Values;

/// <summary>The units the format knows, each with the one spelling the formatter writes.</summary>
public enum Unit { None, Hp, Kw, Volt, Amp, Foot, Metre, Celsius, Fahrenheit, Percent, Kva, Kvar, Va, Minute, Phase, Awg, Kcmil, Inch, KiloAmp, XOverR }

public static class Units
{
    private static readonly Dictionary<string, Unit> Spellings = new(StringComparer.OrdinalIgnoreCase)
    {
        ["hp"] = Unit.Hp, ["kw"] = Unit.Kw, ["v"] = Unit.Volt, ["a"] = Unit.Amp,
        ["ft"] = Unit.Foot, ["m"] = Unit.Metre, ["c"] = Unit.Celsius, ["°c"] = Unit.Celsius,
        ["f"] = Unit.Fahrenheit, ["°f"] = Unit.Fahrenheit, ["%"] = Unit.Percent, ["kva"] = Unit.Kva, ["kvar"] = Unit.Kvar, ["va"] = Unit.Va,
        ["min"] = Unit.Minute, ["ph"] = Unit.Phase, ["awg"] = Unit.Awg, ["kcmil"] = Unit.Kcmil, ["mcm"] = Unit.Kcmil, ["in"] = Unit.Inch, ["ka"] = Unit.KiloAmp,
    };

    public static bool TryParse(string text, out Unit unit) => Spellings.TryGetValue(text, out unit);

    // Units written out as words are not accepted (one spelling per unit keeps lists diffable),
    // but they are recognised so the message can say which symbol to write.
    private static readonly Dictionary<string, Unit> WrittenOut = new(StringComparer.OrdinalIgnoreCase)
    {
        ["amp"] = Unit.Amp, ["amps"] = Unit.Amp, ["ampere"] = Unit.Amp, ["amperes"] = Unit.Amp,
        ["volt"] = Unit.Volt, ["volts"] = Unit.Volt, ["horsepower"] = Unit.Hp,
        ["kilowatt"] = Unit.Kw, ["kilowatts"] = Unit.Kw, ["foot"] = Unit.Foot, ["feet"] = Unit.Foot,
        ["metre"] = Unit.Metre, ["metres"] = Unit.Metre, ["meter"] = Unit.Metre, ["meters"] = Unit.Metre,
        ["percent"] = Unit.Percent, ["minute"] = Unit.Minute, ["minutes"] = Unit.Minute,
        ["phase"] = Unit.Phase, ["inch"] = Unit.Inch, ["inches"] = Unit.Inch,
    };

    /// <summary>A unit written out as a word ("amps", "volts"): the unit it names, so a message can give its symbol.</summary>
    public static bool TryParseWrittenOut(string text, out Unit unit) => WrittenOut.TryGetValue(text, out unit);

    public static string Canonical(Unit unit) => unit switch
    {
        Unit.Hp => "hp", Unit.Kw => "kW", Unit.Volt => "V", Unit.Amp => "A", Unit.Foot => "ft", Unit.Metre => "m",
        Unit.Celsius => "C", Unit.Fahrenheit => "F", Unit.Percent => "%", Unit.Kva => "kVA", Unit.Kvar => "kvar", Unit.Va => "VA", Unit.Minute => "min",
        Unit.Phase => "ph", Unit.Awg => "AWG", Unit.Kcmil => "kcmil", Unit.Inch => "in", Unit.KiloAmp => "kA", Unit.XOverR => "x/r", _ => "",
    };

    /// <summary>What a value with this unit measures, for messages ("expected a current").</summary>
    public static string Describe(Unit unit) => unit switch
    {
        Unit.Hp or Unit.Kw => "a power (hp or kW)",
        Unit.Volt => "a voltage (V)",
        Unit.Amp => "a current (A)",
        Unit.Foot or Unit.Metre => "a length (ft or m)",
        Unit.Celsius or Unit.Fahrenheit => "a temperature (C or F)",
        Unit.Percent => "a percentage (%)",
        Unit.Kva => "an apparent power (kVA)",
        Unit.Kvar => "a reactive power (kvar)",
        Unit.Va => "a transformer rating in volt-amperes (VA)",
        Unit.Minute => "a time rating (min)",
        Unit.Phase => "a phase count (1ph or 3ph)",
        Unit.Awg or Unit.Kcmil => "a wire size (AWG or kcmil)",
        Unit.Inch => "a raceway trade size (in)",
        Unit.KiloAmp => "a fault current or short-circuit rating (kA)",
        Unit.XOverR => "an X/R ratio (x/r 8)",
        _ => "a plain number",
    };
}
