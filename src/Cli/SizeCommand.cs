using System.CommandLine;
using System.Text;
using DiffPlex.DiffBuilder;
using DiffPlex.DiffBuilder.Model;
using MotorLang.Analysis.Fixes;

namespace MotorLang.Cli;

/// <summary>`motorlang size`: apply every fix (correct sizes in, missing sizes added); --dry-run shows a unified diff instead.</summary>
public static class SizeCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file" };
        var dryRun = new Option<bool>("--dry-run") { Description = "Print a unified diff and change nothing" };
        var command = new Command("size", "Write the required sizes into a motor list") { file, dryRun };
        command.SetAction(result =>
        {
            var path = SourceFiles.Expand([result.GetValue(file)!])[0];
            var before = SourceFiles.Read(path);
            var after = SizeAll.Apply(before);
            if (after == before)
            {
                stderr.WriteLine($"{path}: nothing to change");
                return ExitCodes.Clean;
            }

            if (result.GetValue(dryRun)) stdout.Write(UnifiedDiff(path, before, after));
            else
            {
                SourceFiles.WriteAtomically(path, after);
                stderr.WriteLine($"{path}: sized");
            }

            return ExitCodes.Clean;
        });
        return command;
    }

    public static string UnifiedDiff(string path, string before, string after)
    {
        var diff = InlineDiffBuilder.Diff(before, after, ignoreWhiteSpace: false);
        var lines = diff.Lines;
        var sb = new StringBuilder($"--- {path}\n+++ {path} (sized)\n");
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
