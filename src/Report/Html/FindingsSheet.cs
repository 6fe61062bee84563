using MotorLang.Analysis;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;

namespace MotorLang.Report.Html;

/// <summary>Every finding of the list: counts by severity, then one row each with its circuit, line, code and message.</summary>
public static class FindingsSheet
{
    public static void Write(Page page, AnalysisResult analysis, SheetTitle block, SourceLines lines)
    {
        page.SheetStart("findings", "Findings", block);
        var f = analysis.Findings;
        int Count(Severity s) => f.Count(x => x.Severity == s);
        page.El("p", $"{Count(Severity.Error)} errors, {Count(Severity.Warning)} warnings, {Count(Severity.Information)} notes. "
            + "An error is a value that breaks a rule MotorLang checks, or a line it cannot read; its circuit's status names the code. "
            + "docs/checks.md explains each code, its rule and the readings taken.", "class=\"lead\"");
        if (f.Length == 0)
        {
            page.El("p", "No findings.");
            page.SheetEnd();
            return;
        }

        page.Open("table", "class=\"findings\"").Open("thead").Open("tr");
        foreach (var h in new[] { "Circuit", "Line", "Code", "Severity", "Message" }) page.El("th", h);
        page.Close("tr").Close("thead").Open("tbody");
        var model = analysis.Parse.Model;
        foreach (var x in f)
        {
            var circuit = model.BlockAt(x.Range.Start.Line) is CircuitNode c ? c.Tag?.Value ?? "" : model.BlockAt(x.Range.Start.Line) is ProjectNode ? "project" : "";
            var css = x.Severity switch { Severity.Error => "err", Severity.Warning => "warn", _ => "info" };
            page.Open("tr", $"class=\"finding {css}\" {Page.A("data-line", (lines.At(x.Range.Start.Line).Line + 1).ToString())}")
                .El("td", circuit, "class=\"tag\"").El("td", lines.Describe(x.Range.Start.Line), "class=\"num\"").El("td", x.Code, "class=\"code\"")
                .El("td", x.Severity.ToString().ToLowerInvariant()).El("td", x.Message).Close("tr");
        }

        page.Close("tbody").Close("table");
        page.SheetEnd();
    }
}
