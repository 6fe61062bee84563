namespace MotorLang.Report;

/// <summary>
/// What the title block says beyond the list itself: the source file as named, the tool's version, and
/// the date of issue (passed in, so the same list and date always give the same report), and the
/// list's revision log where the caller has one (from version control; null when not asked for).
/// </summary>
public sealed record ReportInfo(string SourceName, string ToolVersion, DateOnly Date, IReadOnlyList<Analysis.Reports.Revision>? Revisions = null)
{
    /// <summary>Where each analysed line is written; null: all in <see cref="SourceName"/>.</summary>
    public SourceLines? Lines { get; init; }
}
