namespace MotorLang.Report;

/// <summary>
/// What the title block says beyond the list itself: the source file as named, the tool's version, and
/// the date of issue (passed in, so the same list and date always give the same report).
/// </summary>
public sealed record ReportInfo(string SourceName, string ToolVersion, DateOnly Date);
