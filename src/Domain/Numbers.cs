using System.Globalization;

namespace MotorLang.Domain;

/// <summary>Reads the numbers the tables print: decimals, fractions (1/2) and mixed numbers (1-1/2).</summary>
public static class Numbers
{
    public static decimal? Parse(string text)
    {
        var dash = text.IndexOf('-', 1 < text.Length ? 1 : 0);
        var slash = text.IndexOf('/');
        if (slash < 0)
            return decimal.TryParse(text, NumberStyles.Number, CultureInfo.InvariantCulture, out var d) ? d : null;
        var whole = 0m;
        var fraction = text;
        if (dash > 0)
        {
            if (!decimal.TryParse(text[..dash], NumberStyles.Number, CultureInfo.InvariantCulture, out whole)) return null;
            fraction = text[(dash + 1)..];
        }

        var parts = fraction.Split('/');
        if (parts.Length != 2 || !decimal.TryParse(parts[0], CultureInfo.InvariantCulture, out var n)
                              || !decimal.TryParse(parts[1], CultureInfo.InvariantCulture, out var m) || m == 0)
            return null;
        return whole + n / m;
    }

    /// <summary>A horsepower as the tables print it: 1/2, 7-1/2, 15.</summary>
    public static string Horsepower(decimal hp)
    {
        var whole = decimal.Truncate(hp);
        var frac = hp - whole;
        var fracText = frac switch
        {
            0.5m => "1/2", 0.25m => "1/4", 0.75m => "3/4",
            _ when Math.Abs(frac - 1m / 3) < 0.001m => "1/3",
            _ when Math.Abs(frac - 1m / 6) < 0.001m => "1/6",
            _ => null,
        };
        if (frac == 0) return whole.ToString(CultureInfo.InvariantCulture);
        if (fracText is null) return hp.ToString("0.###", CultureInfo.InvariantCulture);
        return whole == 0 ? fracText : $"{whole}-{fracText}";
    }
}
