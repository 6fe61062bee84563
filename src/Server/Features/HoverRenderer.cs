using System.Text;
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

        return sb.ToString();
    }

    private static string Escape(string s) => s.Replace("|", "\\|").Replace("*", "\\*").Replace("_", "\\_");
}
