using MotorLang.Analysis;
using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Report.Html;

/// <summary>The feeder schedule: each feeder's supply, load, conductors, protection and drop, with the limits worked out (typed rows).</summary>
public static class FeederScheduleSheet
{
    private static readonly string[] Headers =
        ["Feeder", "Description", "Supplied from", "V / ph", "Motors", "Load", "Required ampacity", "Phase conductors", "Protection", "Grounding", "Conduit", "Length", "Drop", "Status"];

    private const string FaultHeader = "Fault current at bus";

    public static void Write(Page page, AnalysisResult analysis, ScheduleData data, SheetTitle block)
    {
        page.SheetStart("feeder-schedule", "Feeder schedule", block, "landscape");
        // A list with a 'source' shows the fault current at each bus; others keep the sheet as it was.
        var fault = analysis.Power.HasSource;
        page.Open("table", "class=\"schedule feeders\"").Open("thead").Open("tr");
        foreach (var h in fault ? [.. Headers[..^1], FaultHeader, Headers[^1]] : Headers) page.El("th", h);
        page.Close("tr").Close("thead").Open("tbody");
        foreach (var f in data.Feeders)
        {
            var status = f.Status == "ok" ? "ok" : f.Status == "warnings" ? "warn" : "err";
            var errors = f.Findings.Where(x => x.Severity == "error").Select(x => x.Code).Distinct().ToList();
            page.Open("tr", $"class=\"feeder {status}\" {Page.A("data-tag", f.Tag)} {Page.A("data-line", f.Line.ToString())}");
            page.Open("td", "class=\"tag\"").Raw(Cells.Json("tag", f.Tag)).Close("td");
            page.Open("td", "class=\"desc\"").Raw(Cells.Json("description", f.Description, "")).Close("td");
            page.Open("td").Raw(Cells.Json("from", f.From, "supply")).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("volts", f.Volts)).Raw(Cells.Phases(f.Phases)).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("motorCount", f.MotorCount)).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("calculatedLoad", f.CalculatedLoad)).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("requiredAmpacity", f.RequiredAmpacity)).Close("td");
            page.Open("td").Raw(Cells.Json("wire", f.Wire, "not written")).Raw(Cells.Limit("min", "minimumWire", f.MinimumWire))
                .Raw(Cells.Limit("carries", "wireAmpacity", f.WireAmpacity)).Close("td");
            page.Open("td").Raw(Cells.Json("protection", f.Protection, "not written"))
                .Raw(f.ProtectionDevice.Length > 0 ? " " + Cells.Json("protectionDevice", f.ProtectionDevice) : "")
                .Raw(Cells.Limit("max", "maximumProtection", f.MaximumProtection)).Raw(Cells.Limit("min", "minimumProtection", f.MinimumProtection)).Close("td");
            page.Open("td").Raw(Cells.Json("ground", f.Ground, "not written")).Raw(Cells.Limit("min", "minimumGround", f.MinimumGround)).Close("td");
            page.Open("td").Raw(Cells.Json("conduit", f.Conduit, "not written")).Raw(Cells.Limit("min", "minimumConduit", f.MinimumConduit))
                .Raw(Cells.Limit("fill", "conduitFill", f.ConduitFill)).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("length", f.Length, "not written")).Close("td");
            page.Open("td", "class=\"num\"").Raw(Cells.Json("voltageDrop", f.VoltageDrop)).Raw(Cells.Limit("from source", "totalVoltageDrop", f.TotalVoltageDrop)).Close("td");
            if (fault)
                page.Open("td", "class=\"num\"").Raw(Cells.Json("faultCurrent", f.FaultCurrent, "not worked out"))
                    .Raw(Cells.Limit("with motors", "faultCurrentWithMotors", f.FaultCurrentWithMotors)).Raw(Cells.Limit("X/R", "faultXOverR", f.FaultXOverR)).Close("td");
            page.Open("td", "class=\"status\"").Raw(Cells.Json("status", f.Status)).Raw(errors.Count > 0 ? $"<small>{string.Join(" ", errors)}</small>" : "").Close("td");
            page.Close("tr");
        }

        page.Close("tbody").Close("table");
        page.El("p", "Load is the running load at 100 % of each motor's full-load current plus the other loads; the required ampacity adds 25 % of the largest motor (430.24).", "class=\"note\"");
        if (fault)
            page.El("p", "Fault current is the three-phase bolted fault current at the feeder's bus from the source, by the ohmic (R + jX) method; \"with motors\" adds about 4 × the running motors' full-load current, an approximation; X/R is that of the impedance from the source. Each motor's controller is taken to stand at its feeder's bus.", "class=\"note\"");
        page.SheetEnd();
    }
}
