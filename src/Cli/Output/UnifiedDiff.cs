using System.Text;
using DiffPlex.DiffBuilder;
using DiffPlex.DiffBuilder.Model;

namespace MotorLang.Cli.Output;

/// <summary>A unified diff (three lines of context) of what a command would write, for `size --dry-run` and `fmt --diff`.</summary>
public static class UnifiedDiff
{
    public static string Between(string path, string before, string after, string newLabel)
    {
        var diff = InlineDiffBuilder.Diff(before, after, ignoreWhiteSpace: false);
        var lines = diff.Lines;
        // Both texts end in a newline, which the line split reports as one more, empty, line.
        if (lines.Count > 0 && lines[^1] is { Type: ChangeType.Unchanged, Text: "" }) lines = lines.Take(lines.Count - 1).ToList();
        var sb = new StringBuilder($"--- {path}\n+++ {path} ({newLabel})\n");
        const int context = 3;
        var i = 0;
        while (i < lines.Count)
        {
            if (lines[i].Type == ChangeType.Unchanged)
            {
                i++;
                continue;
            }

            var start = Math.Max(0, i - context);
            var end = i;
            while (end < lines.Count && (lines[end].Type != ChangeType.Unchanged || Enumerable.Range(end, Math.Min(context * 2, lines.Count - end)).Any(k => lines[k].Type != ChangeType.Unchanged)))
                end++;
            end = Math.Min(lines.Count, end + context);
            var oldStart = lines.Take(start).Count(l => l.Type != ChangeType.Inserted) + 1;
            var newStart = lines.Take(start).Count(l => l.Type != ChangeType.Deleted) + 1;
            var hunk = lines.Skip(start).Take(end - start).ToList();
            sb.Append($"@@ -{oldStart},{hunk.Count(l => l.Type != ChangeType.Inserted)} +{newStart},{hunk.Count(l => l.Type != ChangeType.Deleted)} @@\n");
            foreach (var l in hunk)
                sb.Append(l.Type switch { ChangeType.Inserted => '+', ChangeType.Deleted => '-', _ => ' ' }).Append(l.Text).Append('\n');
            i = end;
        }

        return sb.ToString();
    }
}
