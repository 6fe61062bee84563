using MotorLang.Parser.Values;

namespace MotorLang.Analysis.Resolution;

/// <summary>Unit conversions the sizing core's inputs need (it works in °C, feet, hp, volts, amperes).</summary>
public static class Conversions
{
    public const decimal FeetPerMetre = 3.28084m;

    public static decimal Celsius(Quantity q) => q.Unit == Unit.Fahrenheit ? (q.Value - 32m) * 5m / 9m : q.Value;

    public static decimal Feet(Quantity q) => q.Unit == Unit.Metre ? q.Value * FeetPerMetre : q.Value;
}
