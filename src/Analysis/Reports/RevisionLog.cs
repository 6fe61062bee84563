using MotorLang.Analysis.Plant;

namespace MotorLang.Analysis.Reports;

/// <summary>One revision of a motor list as version control records it: null commit for changes not yet committed.</summary>
public sealed record RevisionSource(string? Commit, string Date, string Author, string Subject, string Text);

/// <summary>One revision of a plant of several files: its files as they were at that commit, analysed together.</summary>
public sealed record PlantRevisionSource(string? Commit, string Date, string Author, string Subject, PlantAnalysis Plant);

/// <summary>
/// One entry of the revision log: who, when, why (the commit's subject), and what changed since the
/// revision before it, one line per change by tag (the semantic diff's words). <see cref="Changes"/>
/// is null for the first revision (nothing before it to compare with).
/// </summary>
public sealed record Revision(string? Commit, string Date, string Author, string Subject, IReadOnlyList<string>? Changes);

/// <summary>Builds the revision log, newest first; each revision is compared with the next older one by the semantic diff.</summary>
public static class RevisionLog
{
    /// <param name="newestFirst">The revisions to show, newest first.</param>
    /// <param name="before">The revision just older than the last one shown, when there is one (it is compared, not shown).</param>
    public static IReadOnlyList<Revision> Of(IReadOnlyList<RevisionSource> newestFirst, RevisionSource? before) =>
        Build(newestFirst.Select(r => (r.Commit, r.Date, r.Author, r.Subject, Analyzer.Analyze(r.Text))).ToList(),
            before is null ? null : Analyzer.Analyze(before.Text),
            (older, newer) => ListDiff.Compare(older, newer).Select(ListDiff.Describe).ToList());

    /// <summary>A plant's log: each revision compared with the one before by the plant diff (files added and removed, records by tag, moves).</summary>
    public static IReadOnlyList<Revision> OfPlant(IReadOnlyList<PlantRevisionSource> newestFirst, PlantAnalysis? before) =>
        Build(newestFirst.Select(r => (r.Commit, r.Date, r.Author, r.Subject, r.Plant)).ToList(), before,
            (older, newer) => PlantDiff.Describe(PlantDiff.Compare(older, newer)).ToList());

    // Each version is analysed once by the caller, though every one but the ends is compared twice.
    private static IReadOnlyList<Revision> Build<T>(IReadOnlyList<(string? Commit, string Date, string Author, string Subject, T Version)> newestFirst, T? before,
        Func<T, T, IReadOnlyList<string>> compare) where T : class
    {
        var log = new List<Revision>(newestFirst.Count);
        for (var i = 0; i < newestFirst.Count; i++)
        {
            var previous = i + 1 < newestFirst.Count ? newestFirst[i + 1].Version : before;
            var r = newestFirst[i];
            log.Add(new Revision(r.Commit, r.Date, r.Author, r.Subject, previous is null ? null : compare(previous, r.Version)));
        }

        return log;
    }
}
