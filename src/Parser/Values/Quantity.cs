using System.Globalization;

namespace MotorLang.Parser.Values;

/// <summary>A number with its unit, as written (before any conversion).</summary>
public readonly record struct Quantity(decimal Value, Unit Unit)
{
    public override string ToString() => Number(Value) + Units.Canonical(Unit);

    /// <summary>
    /// A value as a person would write it: a fraction written as one (1/6, 7-1/2) comes back as
    /// a fraction, since a decimal such as 0.1666… is only the division's result; other values
    /// as written.
    /// </summary>
    public static string Number(decimal value)
    {
        var whole = decimal.Truncate(value);
        var frac = value - whole;
        if (frac == 0) return whole.ToString(CultureInfo.InvariantCulture);
        // Fractions written n/d are stored as n ÷ d; small denominators are the ones ratings use.
        foreach (var d in (int[])[2, 3, 4, 6, 8, 16])
        {
            var n = frac * d;
            if (Math.Abs(n - decimal.Round(n)) < 0.0000001m && decimal.Round(frac, 4) != frac)
            {
                var fraction = $"{(int)decimal.Round(n)}/{d}";
                return whole == 0 ? fraction : $"{whole.ToString(CultureInfo.InvariantCulture)}-{fraction}";
            }
        }

        return value.ToString(CultureInfo.InvariantCulture);
    }
}
