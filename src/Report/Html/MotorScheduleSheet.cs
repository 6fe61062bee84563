using MotorLang.Analysis;
using MotorLang.Analysis.Reports.Data;
using MotorLang.Analysis.Sizing;
using MotorLang.Domain;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>
/// The motor schedule as issued: one row per motor, grouped by feeder, its columns grouped under
/// headings so the whole row fits a landscape page. A written value stands above the limit it was
/// checked against. Cells come from the typed schedule rows (the JSON schedule's data).
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
        ("Raceway", ["Conduit"]),
        ("Run", ["Length", "Drop"]),
        ("", ["Status"]),
    ];

    public static void Write(Page page, AnalysisResult analysis, ScheduleData data, SheetTitle block, SourceLines lines)
    {
        page.SheetStart("motor-schedule", "Motor schedule", block, "landscape");
        page.Open("table", "class=\"schedule motors\"").Open("thead").Open("tr", "class=\"groups\"");
        foreach (var (group, columns) in Groups) page.El("th", group, $"colspan=\"{columns.Length}\"");
        page.Close("tr").Open("tr");
        foreach (var column in Groups.SelectMany(g => g.Columns)) page.El("th", column);
        page.Close("tr").Close("thead");

        // Rows and results meet at the place the motor is written (file and line): unique in a plant too.
        var results = analysis.Motors.Values.ToDictionary(m => lines.At(m.Motor.Header.Line.Index) is var (file, line) ? (file, line + 1) : default);
        var descriptions = analysis.Parse.Model.Feeders.GroupBy(f => f.Tag?.Value ?? "").ToDictionary(g => g.Key, g => g.First().Description?.Value);
        var columnCount = Groups.Sum(g => g.Columns.Length);
        foreach (var feeder in data.Motors.GroupBy(m => m.Feeder))
        {
            var description = descriptions.GetValueOrDefault(feeder.Key);
            page.Open("tbody", "class=\"feeder-group\"").Open("tr", "class=\"feeder-row\"")
                .El("th", $"Feeder {feeder.Key}{(description is { } d ? " — " + d : "")}", $"colspan=\"{columnCount}\" scope=\"rowgroup\"")
                .Close("tr");
            foreach (var m in feeder) Row(page, m, results.GetValueOrDefault((m.File, m.Line)));
            page.Close("tbody");
        }

        page.Close("table");
        page.El("p", "Each cell gives the value written in the list; below it, in small type, the limit or minimum MotorLang worked out. "
            + "Table FLC is the full-load current used for conductors and protection (430.6(A)(1)); the nameplate current sets the overload (430.6(A)(2)). "
            + "Status names the error codes on the motor (see Findings).", "class=\"note\"");
        page.SheetEnd();
    }

    private static void Row(Page page, MotorData m, MotorResult? result)
    {
        var status = m.Status == "ok" ? "ok" : m.Status == "warnings" ? "warn" : "err";
        var errors = m.Findings.Where(f => f.Severity == "error").Select(f => f.Code).Distinct().ToList();
        page.Open("tr", $"class=\"motor {status}\" {Page.A("data-tag", m.Tag)} {Page.A("data-line", m.Line.ToString())}");
        page.Open("td", "class=\"tag\"").Raw(Cells.Json("tag", m.Tag)).Raw(m.Quantity > 1 ? $" <small>× <span data-json=\"quantity\">{m.Quantity}</span></small>" : "").Close("td");
        page.Open("td", "class=\"desc\"").Raw(Cells.Json("description", m.Description, "")).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("power", m.Power, "not written")).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("volts", m.Volts)).Raw(Cells.Phases(m.Phases))
            .Raw(m.RatedVolts is { } rv && rv != m.Volts ? Cells.Limit("rated", "ratedVolts", rv) : "").Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("nameplateCurrent", m.NameplateCurrent)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("fullLoadCurrent", m.FullLoadCurrent, "not computed")).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("serviceFactor", m.ServiceFactor)).Close("td");
        page.Open("td").Raw(Cells.Json("codeLetter", m.CodeLetter)).Raw(m.Design is { } d ? $"<small>design <span data-json=\"design\">{d}</span></small>" : "").Close("td");
        page.Open("td").Raw(Cells.Json("startingMethod", m.StartingMethod)).Close("td");
        page.Open("td", "class=\"num\"").Text(result?.Controller?.Value is { } c ? $"≥ {Numbers.Horsepower(c)} hp" : "—")
            .Raw(Cells.Limit("NEMA size", "starterSize", m.StarterSize)).Close("td");
        page.Open("td").Raw(Cells.Json("protection", m.Protection, "not written"))
            .Raw(m.ProtectionDevice.Length > 0 ? " " + Cells.Json("protectionDevice", m.ProtectionDevice) : "")
            .Raw(Cells.Limit("max", "maximumProtection", m.MaximumProtection)).Raw(Cells.Limit("min", "minimumProtection", m.MinimumProtection)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("overload", m.Overload, result?.NoOverloadRequired?.Value == true ? "none required" : "not written"))
            .Raw(Cells.Limit("max", "overloadLimit", m.OverloadLimit)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("disconnectMinimumCurrent", m.DisconnectMinimumCurrent))
            .Raw(Cells.Limit("and", "disconnectMinimumPower", m.DisconnectMinimumPower)).Close("td");
        page.Open("td").Raw(Cells.Json("wire", m.Wire, "not written")).Raw(Cells.Limit("min", "minimumWire", m.MinimumWire)).Raw(Cells.Limit("needs", "requiredAmpacity", m.RequiredAmpacity))
            .Raw(Cells.Limit("carries", "wireAmpacity", m.WireAmpacity))
            // Conductors from the controller or drive to the motor, and a capacitor's, where the motor has them.
            .Raw(Cells.Limit("leads", "leads", m.Leads)).Raw(Cells.Limit("leads min", "minimumLeads", m.MinimumLeads))
            .Raw(Cells.Limit("leads need", "leadsRequiredAmpacity", m.LeadsRequiredAmpacity))
            .Raw(Cells.Limit("capacitor", "capacitorWire", m.CapacitorWire)).Raw(Cells.Limit("capacitor min", "minimumCapacitorWire", m.MinimumCapacitorWire))
            .Raw(Cells.Limit("capacitor needs", "capacitorWireRequiredAmpacity", m.CapacitorWireRequiredAmpacity))
            .Raw(Cells.Limit("capacitor rated", "capacitorRatedCurrent", m.CapacitorRatedCurrent)).Close("td");
        page.Open("td").Raw(Cells.Json("ground", m.Ground, "not written")).Raw(Cells.Limit("min", "minimumGround", m.MinimumGround)).Close("td");
        page.Open("td").Raw(Cells.Json("conduit", m.Conduit, "not written")).Raw(Cells.Limit("min", "minimumConduit", m.MinimumConduit))
            .Raw(Cells.Limit("fill", "conduitFill", m.ConduitFill)).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("length", m.Length, "not written")).Close("td");
        page.Open("td", "class=\"num\"").Raw(Cells.Json("branchVoltageDrop", m.BranchVoltageDrop)).Raw(Cells.Limit("total", "totalVoltageDrop", m.TotalVoltageDrop)).Close("td");
        page.Open("td", "class=\"status\"").Raw(Cells.Json("status", m.Status)).Raw(errors.Count > 0 ? $"<small>{Svg.E(string.Join(" ", errors))}</small>" : "").Close("td");
        page.Close("tr");
    }
}
