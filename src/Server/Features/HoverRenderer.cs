using System.Text;
using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;

namespace MotorLang.Server.Features;

/// <summary>Renders a breakdown as Markdown: a heading, a table of steps with their code references, the verdict.</summary>
public static class HoverRenderer
{
    public static string Markdown(BreakdownView view)
    {
        var sb = new StringBuilder();
        sb.Append("**").Append(Escape(view.Title)).Append("**\n");
        foreach (var section in view.Sections)
        {
            sb.Append("\n### ").Append(Escape(section.Heading)).Append('\n');
            if (section.Steps.Count > 0)
            {
                sb.Append("\n| Step | Value | Rule | Why |\n|---|---|---|---|\n");
                foreach (var s in section.Steps)
                    sb.Append($"| {Escape(s.Label)} | {Escape(s.Value)} | {Escape(s.Rule)} | {Escape(s.Note)} |\n");
            }

            if (section.Verdict is { } v) sb.Append('\n').Append(Escape(v)).Append('\n');
        }

        if (view.Coverage is { } coverage) AppendCoverage(sb, coverage);
        return sb.ToString();
    }

    /// <summary>One line of the rules applied, then a short list of what was not checked (the reasons are in docs/checks.md).</summary>
    private static void AppendCoverage(StringBuilder sb, CircuitCoverage coverage)
    {
        sb.Append("\n---\n");
        sb.Append("\n**Checked:** ")
            .Append(coverage.Applied.Count > 0 ? Escape(string.Join(", ", coverage.Applied.Select(a => a.Rule))) : "nothing could be worked out (see the findings)")
            .Append('\n');
        if (coverage.NotChecked.Count == 0) return;
        sb.Append("\n**Not checked:**\n\n");
        foreach (var n in coverage.NotChecked) sb.Append("- ").Append(Escape(n.Rule)).Append(": ").Append(Escape(n.Text)).Append('\n');
    }

    private static string Escape(string s) => s.Replace("|", "\\|").Replace("*", "\\*").Replace("_", "\\_");
}
