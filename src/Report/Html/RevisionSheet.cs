using MotorLang.Analysis.Reports;

namespace MotorLang.Report.Html;

/// <summary>
/// The revision log: one row per revision of the list, newest first, with what changed since the
/// revision before it, record by record (the semantic diff, not the text diff).
/// </summary>
public static class RevisionSheet
{
    public static void Write(Page page, IReadOnlyList<Revision>? revisions, SheetTitle block)
    {
        page.SheetStart("revisions", "Revision log", block);
        if (revisions is null || revisions.Count == 0)
        {
            page.El("p", "No revision log: the motor list is not kept in a git repository here, or has no commits yet, or the log was not asked for (--revisions 0). "
                + "The title block's revision is as written in the list.", "class=\"lead\"");
            page.SheetEnd();
            return;
        }

        page.El("p", "Newest first. Each revision lists what changed since the one below it, by tag: written values, "
            + "sizes that moved and findings that appeared or were resolved (in a plant, each led by its file, with files added and removed).", "class=\"lead\"");
        page.Open("table", "class=\"revisions\"").Open("thead").Open("tr");
        foreach (var h in new[] { "Revision", "Date", "Author", "Reason", "Changes" }) page.El("th", h);
        page.Close("tr").Close("thead").Open("tbody");
        foreach (var r in revisions)
        {
            page.Open("tr", $"class=\"revision\" {Page.A("data-commit", r.Commit ?? "work-tree")}")
                .El("td", r.Commit ?? "work tree", "class=\"code\"").El("td", r.Date).El("td", r.Author).El("td", r.Subject).Open("td");
            if (r.Changes is null) page.Text("first revision (nothing before it to compare with)");
            else if (r.Changes.Count == 0) page.Text("no change to any feeder, motor or load (project settings, comments or layout)");
            else
            {
                page.Open("ul", "class=\"changes\"");
                foreach (var c in r.Changes) page.El("li", c);
                page.Close("ul");
            }

            page.Close("td").Close("tr");
        }

        page.Close("tbody").Close("table");
        page.SheetEnd();
    }
}
