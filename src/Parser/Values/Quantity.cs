namespace MotorLang.Parser.Values;

/// <summary>A number with its unit, as written (before any conversion).</summary>
public readonly record struct Quantity(decimal Value, Unit Unit)
{
    public override string ToString() => Value.ToString(System.Globalization.CultureInfo.InvariantCulture) + Units.Canonical(Unit);
}
