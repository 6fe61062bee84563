using MotorLang.Analysis;
using MotorLang.Analysis.Reports;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>The feeder schedule: each feeder's supply, load, conductors, protection and drop, with the limits worked out.</summary>
public static class FeederScheduleSheet
{
    private static readonly string[] Headers =
        ["Feeder", "Description", "Supplied from", "V / ph", "Motors", "Load", "Required ampacity", "Phase conductors", "Protection", "Grounding", "Conduit", "Length", "Drop", "Status"];

    public static void Write(Page page, AnalysisResult analysis, Schedule schedule, TitleBlock block)
    {
        page.SheetStart("feeder-schedule", "Feeder schedule", block, "landscape");
        page.Open("table", "class=\"schedule feeders\"").Open("thead").Open("tr");
        foreach (var h in Headers) page.El("th", h);
        page.Close("tr").Close("thead").Open("tbody");
        var feeders = analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index).ToList();
        for (var i = 0; i < feeders.Count; i++)
        {
            var f = feeders[i];
            var t = schedule.Feeders[i];
            var status = Status.Of(analysis, f.Feeder.Header.Line.Index, f.Feeder.LastOwnLine);
            page.Open("tr", $"class=\"feeder {status.Css}\" {Page.A("data-tag", f.Tag)} {Page.A("data-line", f.Feeder.Header.Line.Index.ToString())}");
            page.Open("td", "class=\"tag\"").Raw(Json("Tag", t.Tag)).Close("td");
            page.El("td", f.Feeder.Description?.Value ?? "", "class=\"desc\"");
            page.El("td", f.Feeder.From?.Value ?? "supply");
            page.Open("td", "class=\"num\"").Raw(Json("Volts", t.Volts, "—")).Raw(f.Volts > 0 ? " " + Labels.Phases(f.Phases) : "").Close("td");
            page.El("td", f.Feeder.Motors.Count.ToString(), "class=\"num\"");
            page.Open("td", "class=\"num\"").Raw(Json("CalculatedLoad", t.CalculatedLoad)).Close("td");
            page.Open("td", "class=\"num\"").Raw(Json("RequiredAmpacity", t.RequiredAmpacity, "—")).Close("td");
            page.Open("td").Raw(Json("Wire", t.Wire, "not written")).Raw(Limit("min", "MinimumWire", t.MinimumWire)).Close("td");
            page.Open("td").Raw(Json("Protection", t.Protection, "not written"))
                .Raw(f.Feeder.Protection?.Value is { } d ? " " + Svg.E(Labels.DeviceShort(d)) : "")
                .Raw(Limit(f.FirePumpMinimumProtection is null ? "max" : "", "MaximumProtection", t.MaximumProtection)).Close("td");
            page.Open("td").Raw(Json("Ground", t.Ground, "not written")).Raw(Limit("min", "MinimumGround", t.MinimumGround)).Close("td");
            page.Open("td").Text(f.Feeder.Conduit?.Value.ToString() ?? "not written").Raw(f.MinimumConduit?.Value is { } c ? $"<small>min {Svg.E(c.ToString())}</small>" : "").Close("td");
            page.El("td", f.Feeder.Length?.Value.ToString() ?? "not written", "class=\"num\"");
            page.Open("td", "class=\"num\"").Raw(Json("VoltageDrop", t.VoltageDrop, "—"))
                .Raw(f.CumulativeDropPercent is { } cum ? $"<small>from source {cum:0.##} %</small>" : "").Close("td");
            page.El("td", status.Text, "class=\"status\"");
            page.Close("tr");
        }

        page.Close("tbody").Close("table");
        page.El("p", "Load is the running load at 100 % of each motor's full-load current plus the other loads; the required ampacity adds 25 % of the largest motor (430.24).", "class=\"note\"");
        page.SheetEnd();
    }

    private static string Json(string field, string value, string empty = "") =>
        value.Length == 0 ? $"<span class=\"none\">{Svg.E(empty)}</span>" : $"<span data-json=\"{field}\">{Svg.E(value)}</span>";

    private static string Limit(string word, string field, string value) =>
        value.Length == 0 ? "" : $"<small>{word} <span data-json=\"{field}\">{Svg.E(value)}</span></small>";
}

/// <summary>A circuit's status from the findings on its lines: the error codes, "warnings", or "ok" (as the schedule's Status).</summary>
public sealed record Status(string Text, string Css)
{
    public static Status Of(AnalysisResult analysis, int first, int last)
    {
        var on = analysis.Findings.Where(f => f.Range.Start.Line >= first && f.Range.Start.Line <= last).ToList();
        var errors = on.Where(f => f.Severity == Parser.Diagnostics.Severity.Error).Select(f => f.Code).Distinct().ToList();
        if (errors.Count > 0) return new Status(string.Join(" ", errors), "err");
        return on.Any(f => f.Severity == Parser.Diagnostics.Severity.Warning) ? new Status("warnings", "warn") : new Status("ok", "ok");
    }
}
