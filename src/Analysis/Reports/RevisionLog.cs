namespace MotorLang.Analysis.Reports;

/// <summary>One revision of a motor list as version control records it: null commit for changes not yet committed.</summary>
public sealed record RevisionSource(string? Commit, string Date, string Author, string Subject, string Text);

/// <summary>
/// One entry of the revision log: who, when, why (the commit's subject), and what changed in the list
/// since the revision before it, record by record. <see cref="Changes"/> is null for the list's first
/// revision (nothing before it to compare with).
/// </summary>
public sealed record Revision(string? Commit, string Date, string Author, string Subject, IReadOnlyList<RecordChange>? Changes);

/// <summary>Builds the revision log from the list's texts, newest first; each is compared with the next older one by the semantic diff.</summary>
public static class RevisionLog
{
    /// <param name="newestFirst">The revisions to show, newest first.</param>
    /// <param name="before">The revision just older than the last one shown, when there is one (it is compared, not shown).</param>
    public static IReadOnlyList<Revision> Of(IReadOnlyList<RevisionSource> newestFirst, RevisionSource? before)
    {
        // Each text analysed once, though every one but the ends is compared twice.
        var analyses = newestFirst.Select(r => Analyzer.Analyze(r.Text)).ToList();
        var older = before is null ? null : Analyzer.Analyze(before.Text);
        var log = new List<Revision>(newestFirst.Count);
        for (var i = 0; i < newestFirst.Count; i++)
        {
            var previous = i + 1 < analyses.Count ? analyses[i + 1] : older;
            var r = newestFirst[i];
            log.Add(new Revision(r.Commit, r.Date, r.Author, r.Subject, previous is null ? null : ListDiff.Compare(previous, analyses[i])));
        }

        return log;
    }
}
