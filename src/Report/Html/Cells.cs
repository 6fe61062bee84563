using System.Globalization;
using MotorLang.Analysis.Reports.Data;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>
/// Schedule cells written from the typed schedule rows. A value the JSON schedule carries is marked with
/// its JSON field (<c>data-json</c>) and printed exactly as the JSON writes it, so a test can hold the
/// two equal; a limit goes under the written value in small type.
/// </summary>
public static class Cells
{
    public static string Text(Measure m) => m.Value.ToString(CultureInfo.InvariantCulture) + " " + m.Unit;

    public static string Json(string field, Measure? value, string empty = "—") =>
        value is { } v ? Marked(field, Text(v)) : None(empty);

    public static string Json(string field, string? value, string empty = "—") =>
        string.IsNullOrEmpty(value) ? None(empty) : Marked(field, value);

    public static string Json(string field, decimal? value, string empty = "—") =>
        value is { } v ? Marked(field, v.ToString(CultureInfo.InvariantCulture)) : None(empty);

    public static string Limit(string word, string field, Measure? value) => value is { } v ? $"<small>{word} {Marked(field, Text(v))}</small>" : "";

    public static string Limit(string word, string field, string? value) => string.IsNullOrEmpty(value) ? "" : $"<small>{word} {Marked(field, value)}</small>";

    public static string Limit(string word, string field, decimal? value) =>
        value is { } v ? $"<small>{word} {Marked(field, v.ToString(CultureInfo.InvariantCulture))}</small>" : "";

    public static string Phases(int? phases) => phases switch { 3 => " 3ph", 1 => " 1ph", 0 => " dc", _ => "" };

    private static string Marked(string field, string text) => $"<span data-json=\"{field}\">{Svg.E(text)}</span>";

    private static string None(string empty) => $"<span class=\"none\">{Svg.E(empty)}</span>";
}
