using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>
/// The block at the head of every sheet: project, sheet title, source file, the list's own title block
/// (project number, revision, date, prepared and checked by, where written), date of issue and tool version.
/// </summary>
public sealed record SheetTitle(string Project, string Source, DateOnly Date, string ToolVersion, Analysis.Reports.Data.TitleBlock? Written = null)
{
    public void Write(Page page, string sheetTitle)
    {
        page.Open("header", "class=\"titleblock\"")
            .Open("div", "class=\"tb-main\"").El("div", Project + (Written?.Number is { } n ? $" · project {n}" : ""), "class=\"tb-project\"")
            .El("h2", sheetTitle, "class=\"tb-sheet\"").Close("div")
            .Open("dl", "class=\"tb-facts\"");
        void Fact(string name, string? value)
        {
            if (!string.IsNullOrEmpty(value)) page.El("dt", name).El("dd", value);
        }

        Fact("Motor list", Source);
        Fact("Revision", Written?.Revision);
        Fact("List dated", Written?.Date);
        Fact("Prepared by", Written?.PreparedBy);
        Fact("Checked by", Written?.CheckedBy);
        Fact("Issued", Date.ToString("yyyy-MM-dd"));
        Fact("Sized by", $"MotorLang {ToolVersion}, NFPA 70-2023");
        page.Close("dl").Close("header");
    }

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
