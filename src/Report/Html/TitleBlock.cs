using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>The block at the head of every sheet: project, sheet title, source file, date of issue and tool version.</summary>
public sealed record TitleBlock(string Project, string Source, DateOnly Date, string ToolVersion)
{
    public void Write(Page page, string sheetTitle) => page
        .Open("header", "class=\"titleblock\"")
        .Open("div", "class=\"tb-main\"").El("div", Project, "class=\"tb-project\"").El("h2", sheetTitle, "class=\"tb-sheet\"").Close("div")
        .Open("dl", "class=\"tb-facts\"")
        .El("dt", "Motor list").El("dd", Source)
        .El("dt", "Issued").El("dd", Date.ToString("yyyy-MM-dd"))
        .El("dt", "Sized by").El("dd", $"MotorLang {ToolVersion}, NFPA 70-2023")
        .Close("dl")
        .Close("header");

    /// <summary>The running header and footer of printed pages (CSS paged-media margin boxes; Chromium draws them).</summary>
    public string PageCss() =>
        "@page{@top-left{content:" + CssString($"{Project} — motor list {Source}") + "}"
        + "@top-right{content:" + CssString($"issued {Date:yyyy-MM-dd} · MotorLang {ToolVersion}") + "}"
        + "@bottom-left{content:" + CssString("To be checked by a qualified person before use; see Cautions.") + "}"
        + "@bottom-right{content:\"Page \" counter(page) \" of \" counter(pages)}}";

    private static string CssString(string s) =>
        "\"" + s.Replace("\\", "\\\\").Replace("\"", "\\\"").Replace("\n", " ").Replace("<", "\\3c ") + "\"";

    public static string Escape(string s) => Svg.E(s);
}
