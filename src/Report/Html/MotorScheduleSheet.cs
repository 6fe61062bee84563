using MotorLang.Analysis;
using MotorLang.Analysis.Reports;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>
/// The motor schedule as issued: one row per motor, grouped by feeder, its columns grouped under
/// headings so the whole row fits a landscape page. A written value stands above the limit it was
/// checked against. Values shared with the JSON schedule are marked with the JSON field they equal
/// (<c>data-json</c>), so a test can hold the two the same.
/// </summary>
public static class MotorScheduleSheet
{
    private static readonly (string Group, string[] Columns)[] Groups =
    [
        ("Motor", ["Tag", "Description", "Rating", "V / ph", "Nameplate", "Table FLC", "SF", "Code"]),
        ("Controller", ["Starting", "Controller"]),
        ("Protection", ["Short-circuit / ground-fault", "Overload"]),
        ("Disconnect", ["Minimum"]),
        ("Conductors", ["Phase", "Grounding"]),
        ("Raceway", ["Type", "Conduit"]),
        ("Run", ["Length", "Drop"]),
        ("", ["Status"]),
    ];

    public static void Write(Page page, AnalysisResult analysis, Schedule schedule, TitleBlock block)
    {
        page.SheetStart("motor-schedule", "Motor schedule", block, "landscape");
        page.Open("table", "class=\"schedule motors\"").Open("thead").Open("tr", "class=\"groups\"");
        foreach (var (group, columns) in Groups) page.El("th", group, $"colspan=\"{columns.Length}\"");
        page.Close("tr").Open("tr");
        foreach (var column in Groups.SelectMany(g => g.Columns)) page.El("th", column);
        page.Close("tr").Close("thead");

        var motors = analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index).ToList();
        var columnCount = Groups.Sum(g => g.Columns.Length);
        foreach (var feeder in motors.Select((m, i) => (m, row: schedule.Rows[i])).GroupBy(p => p.m.Motor.Feeder))
        {
            page.Open("tbody", "class=\"feeder-group\"").Open("tr", "class=\"feeder-row\"")
                .El("th", $"Feeder {feeder.Key.Tag?.Value}{(feeder.Key.Description?.Value is { } d ? " — " + d : "")}", $"colspan=\"{columnCount}\" scope=\"rowgroup\"")
                .Close("tr");
            foreach (var (m, row) in feeder) Row(page, analysis, m, row);
            page.Close("tbody");
        }

        page.Close("table");
        page.El("p", "Each cell gives the value written in the list; below it, in small type, the limit or minimum MotorLang worked out. "
            + "FLC is the table full-load current used for conductors and protection (430.6(A)(1)); nameplate current is used for overloads (430.6(A)(2)). "
            + "Status names the error findings on the motor (see Findings).", "class=\"note\"");
        page.SheetEnd();
    }

    private static void Row(Page page, AnalysisResult analysis, MotorResult m, ScheduleRow row)
    {
        var motor = m.Motor;
        var model = analysis.Parse.Model;
        string? Own<T>(Func<Parser.Model.MotorNode, Parser.Model.Located<T>?> get) => Likes.Get(motor, model, get)?.Value.Value?.ToString();

        var status = row.Status == "ok" ? "ok" : row.Status == "warnings" ? "warn" : "err";
        page.Open("tr", $"class=\"motor {status}\" {Page.A("data-tag", m.Tag)} {Page.A("data-line", motor.Header.Line.Index.ToString())}");
        page.Open("td", "class=\"tag\"").Raw(Json("Tag", row.Tag)).Close("td");
        page.Open("td", "class=\"desc\"").Raw(Json("Description", row.Description)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Json("Power", row.Power)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Json("Volts", row.Volts)).Raw(m.Volts > 0 ? " " + Labels.Phases(m.Phases) : "").Close("td");
        page.El("td", Own(x => x.Nameplate) ?? "—", "class=\"num\"");
        page.Open("td", "class=\"num\"").Raw(Json("Flc", row.Flc)).Close("td");
        page.El("td", Own(x => x.ServiceFactor) ?? "—", "class=\"num\"");
        page.El("td", Own(x => x.CodeLetter) ?? "—");
        page.El("td", Starting(m));
        page.El("td", Controller(m), "class=\"num\"");
        page.Open("td").Raw(Json("Protection", row.Protection, "not written")).Raw(Limit("max", "MaximumProtection", row.MaximumProtection)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Json("Overload", row.Overload, m.NoOverloadRequired?.Value == true ? "none required" : "not written"))
            .Raw(Limit("max", "OverloadLimit", row.OverloadLimit)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Json("Disconnect", row.Disconnect, "—")).Close("td");
        page.Open("td").Raw(Json("Wire", row.Wire, "not written")).Raw(Limit("min", "MinimumWire", row.MinimumWire)).Close("td");
        page.Open("td").Raw(Json("Ground", row.Ground, "not written")).Raw(Limit("min", "MinimumGround", row.MinimumGround)).Close("td");
        page.El("td", Settings.For(motor, model).Raceway.ToString().ToUpperInvariant());
        page.Open("td").Text(motor.Conduit?.Value.ToString() ?? "not written")
            .Raw(Limit("min", null, m.MinimumConduit?.Value?.ToString() ?? "")).Close("td");
        page.El("td", motor.Length?.Value.ToString() ?? "not written", "class=\"num\"");
        page.Open("td", "class=\"num\"").Raw(Json("VoltageDrop", row.VoltageDrop, "—")).Close("td");
        page.Open("td", "class=\"status\"").Raw(Json("Status", row.Status)).Close("td");
        page.Close("tr");
    }

    /// <summary>A value that the JSON schedule also carries, marked with its field.</summary>
    private static string Json(string field, string value, string empty = "") =>
        value.Length == 0 ? $"<span class=\"none\">{Svg.E(empty)}</span>" : $"<span data-json=\"{field}\">{Svg.E(value)}</span>";

    private static string Limit(string word, string? field, string value) =>
        value.Length == 0 ? "" : $"<small>{word} " + (field is null ? Svg.E(value) : $"<span data-json=\"{field}\">{Svg.E(value)}</span>") + "</small>";

    private static string Starting(MotorResult m) => m.StartingMethod switch
    {
        StartingMethod.FullVoltage => "full voltage",
        StartingMethod.WyeDelta => "wye-delta",
        StartingMethod.PartWinding => "part winding",
        StartingMethod.SoftStart => "soft starter",
        _ => "drive",
    };

    private static string Controller(MotorResult m)
    {
        var hp = m.Controller?.Value is { } c ? $"≥ {Numbers.Horsepower(c)} hp" : "—";
        return m.NemaStarterSize is { } size ? $"{hp}, NEMA size {size}" : hp;
    }
}
