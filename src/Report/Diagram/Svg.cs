using System.Globalization;
using System.Net;

namespace MotorLang.Report.Diagram;

/// <summary>Small helpers for writing SVG and HTML text.</summary>
public static class Svg
{
    public static string N(double v) => Math.Round(v, 1).ToString("0.#", CultureInfo.InvariantCulture);

    /// <summary>Escaped for element content and attribute values alike.</summary>
    public static string E(string text) => WebUtility.HtmlEncode(text);
}
