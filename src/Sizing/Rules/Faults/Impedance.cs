namespace MotorLang.Sizing.Rules.Faults;

/// <summary>
/// A series impedance per phase (ohms to neutral), R + jX, at a stated voltage. The ohmic method
/// adds impedances as complex numbers, so resistance and reactance are kept apart all the way.
/// </summary>
public readonly record struct Impedance(decimal R, decimal X)
{
    public static readonly Impedance Zero = new(0, 0);

    public decimal Magnitude => Root(R * R + X * X);

    /// <summary>X/R at this point; null where there is no resistance (a pure reactance).</summary>
    public decimal? XOverR => R == 0 ? null : X / R;

    public static Impedance operator +(Impedance a, Impedance b) => new(a.R + b.R, a.X + b.X);

    /// <summary>The same impedance seen from another voltage: ohms scale with the square of the turns ratio.</summary>
    public Impedance Referred(decimal fromVolts, decimal toVolts)
    {
        var k = toVolts / fromVolts;
        return new Impedance(R * k * k, X * k * k);
    }

    /// <summary>R and X of a magnitude split by an X/R ratio: R = Z ÷ √(1 + (X/R)²), X = R × X/R.</summary>
    public static Impedance FromMagnitude(decimal z, decimal xOverR)
    {
        var r = z / Root(1 + xOverR * xOverR);
        return new Impedance(r, r * xOverR);
    }

    internal static decimal Root(decimal v) => (decimal)Math.Sqrt((double)v);

    public override string ToString() => $"{Ohms(R)} + j{Ohms(X)} Ω";

    /// <summary>Ohms with enough places for a few milliohms of bus impedance.</summary>
    public static string Ohms(decimal ohms) => ohms.ToString("0.######", System.Globalization.CultureInfo.InvariantCulture);
}
