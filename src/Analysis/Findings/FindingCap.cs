using MotorLang.Parser.Diagnostics;

namespace MotorLang.Analysis.Findings;

/// <summary>
/// How many findings of one file are shown (command line, JSON, SARIF, editor diagnostics): the
/// first <see cref="MaxShown"/> in document order, then one M310 note saying how many were left
/// out. A list with a million mistakes stays readable and its report stays small; the totals and
/// the exit code still count every finding.
/// </summary>
public static class FindingCap
{
    public const int MaxShown = 1000;

    public static IReadOnlyList<Finding> Shown(IReadOnlyList<Finding> findings, int max = MaxShown)
    {
        if (findings.Count <= max) return findings;
        var shown = new List<Finding>(max + 1);
        for (var i = 0; i < max; i++) shown.Add(findings[i]);
        var left = findings.Count - max;
        shown.Add(new Finding(FindingCodes.NotShown, Severity.Information, findings[max].Range,
            $"{left} more finding{(left == 1 ? "" : "s")} not shown: at most {max} are listed per file (from here on); fix these and check again"));
        return shown;
    }
}
