using System.Reflection;
using MotorLang.Analysis;
using MotorLang.Analysis.Reports.Data;
using MotorLang.Report.Diagram;
using MotorLang.Report.Html;

namespace MotorLang.Report;

/// <summary>
/// The issued report of a motor list as one self-contained HTML file: styles and the diagram inline,
/// no script, nothing fetched. Sheets, each starting a printed page: revision log, motor schedule, feeder schedule,
/// findings, one-line diagram, a calculation sheet per motor and per feeder, assumptions and readings,
/// what was not checked, and the tool, tables and cautions.
/// </summary>
public static class PlantReport
{
    public static string Html(AnalysisResult analysis, ReportInfo info)
    {
        var lines = info.Lines ?? SourceLines.OneFile(info.SourceName);
        var data = ScheduleDataBuilder.Of(analysis, lines.At);
        var project = data.Title.Project is { Length: > 0 } name ? name : Path.GetFileNameWithoutExtension(info.SourceName);
        var block = new SheetTitle(project, info.SourceName, info.Date, info.ToolVersion, data.Title);
        var page = new Page();
        page.Raw("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">")
            .Raw("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">")
            .Raw("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'; img-src data:\">")
            .El("title", $"{project} — motor schedule and calculations")
            .Raw("<style>").Raw(Css).Raw(block.PageCss()).Raw("</style></head><body>");
        Contents(page, analysis);
        RevisionSheet.Write(page, info.Revisions, block);
        MotorScheduleSheet.Write(page, analysis, data, block, lines);
        FeederScheduleSheet.Write(page, analysis, data, block);
        FindingsSheet.Write(page, analysis, block, lines);
        page.SheetStart("diagram", "One-line diagram", block, "landscape diagram");
        page.Raw("<div class=\"figure\">").Raw(OneLineDiagram.Svg(analysis, $"{project} one-line diagram")).Raw("</div>");
        page.El("p", "Symbols after IEEE 315 / IEC 60617: ac supply (circle with sine), circuit breaker (blade with a cross), fuse (rectangle), bus (heavy bar), motor (circle with M), other load (arrowhead). "
            + "Each label gives the conductors and the protection written, with the limit worked out; a marked corner and a last line name error (✗) or warning (⚠) findings.", "class=\"note\"");
        page.SheetEnd();
        CalculationSheets.Write(page, analysis, block, lines);
        Assumptions.WriteAssumptions(page, analysis, block);
        Assumptions.WriteNotChecked(page, analysis, block);
        Assumptions.WriteSources(page, block);
        page.Raw("</body></html>\n");
        return page.ToString();
    }

    /// <summary>Links to each sheet, for reading on screen (hidden in print).</summary>
    private static void Contents(Page page, AnalysisResult analysis)
    {
        page.Open("nav", "class=\"contents\"").Open("ul");
        foreach (var (id, text) in new[] { ("revisions", "Revision log"), ("motor-schedule", "Motor schedule"), ("feeder-schedule", "Feeder schedule"), ("findings", "Findings"), ("diagram", "One-line diagram") })
            page.Open("li").El("a", text, Page.A("href", "#" + id)).Close("li");
        foreach (var m in analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index))
            page.Open("li").El("a", "Motor " + m.Tag, Page.A("href", "#" + CalculationSheets.SheetId("motor", m.Motor, analysis))).Close("li");
        foreach (var f in analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index))
            page.Open("li").El("a", "Feeder " + f.Tag, Page.A("href", "#" + CalculationSheets.SheetId("feeder", f.Feeder, analysis))).Close("li");
        foreach (var (id, text) in new[] { ("assumptions", "Assumptions"), ("not-checked", "Not checked"), ("sources", "Tool, tables, cautions") })
            page.Open("li").El("a", text, Page.A("href", "#" + id)).Close("li");
        page.Close("ul").Close("nav");
    }

    private static readonly string Css = ReadCss();

    private static string ReadCss()
    {
        using var stream = typeof(PlantReport).Assembly.GetManifestResourceStream("report.css")
            ?? throw new InvalidOperationException("report.css is not embedded");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
