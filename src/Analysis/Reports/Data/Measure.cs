using System.Globalization;
using MotorLang.Parser.Values;

namespace MotorLang.Analysis.Reports.Data;

/// <summary>
/// A number with its unit, as every machine-readable output writes it: <c>{"value": 124, "unit": "A"}</c>.
/// Values keep at most four decimals (the sizing arithmetic is not rounded; this is only how it is written).
/// </summary>
public readonly record struct Measure(decimal Value, string Unit)
{
    public const string Amps = "A";
    public const string Volts = "V";
    public const string Percent = "%";
    public const string Horsepower = "hp";
    public const string KiloAmps = "kA";

    public static Measure Of(decimal value, string unit) => new(Normalize(value), unit);

    public static Measure? Of(decimal? value, string unit) => value is { } v ? Of(v, unit) : null;

    /// <summary>A value as written in the list (hp, kW, V, A, ft, m, ...), unit spelled as the formatter spells it.</summary>
    public static Measure Written(Quantity q) => Of(q.Value, Units.Canonical(q.Unit));

    public override string ToString() => Value.ToString(CultureInfo.InvariantCulture) + " " + Unit;

    // Four decimals, trailing zeros dropped (21.50 is written 21.5), so equal values print alike.
    private static decimal Normalize(decimal v) => decimal.Round(v, 4, MidpointRounding.AwayFromZero) / 1.0000000000000000000000000000m;
}
