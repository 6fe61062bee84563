using System.Text;
using MotorLang.Analysis;
using MotorLang.Analysis.Reports;

namespace MotorLang.Tests.Shared;

/// <summary>Everything an analysis reports, as text, for the property tests that compare an incremental path with a fresh analysis.</summary>
public static class AnalysisText
{
    /// <summary>Findings with their fixes, then the schedule's rows and feeder lines.</summary>
    public static string Describe(AnalysisResult a)
    {
        var sb = new StringBuilder();
        foreach (var f in a.Findings)
        {
            sb.Append($"{f.Code} {f.Severity} {f.Range} {f.Message}");
            if (f.Fix is { } fix) sb.Append($" | {fix.Title}: {string.Join("; ", fix.Edits.Select(e => $"{e.Range} '{e.NewText}'"))}");
            sb.Append('\n');
        }

        var schedule = Schedule.Of(a);
        foreach (var row in schedule.Rows) sb.AppendJoin(" | ", row.Cells).Append('\n');
        foreach (var feeder in schedule.Feeders) sb.Append(feeder).Append('\n');
        return sb.ToString();
    }
}
