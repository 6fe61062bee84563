using System.CommandLine;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Analysis.Reports;
using MotorLang.Cli.Output;

namespace MotorLang.Cli;

/// <summary>`motorlang diff OLD NEW`: what changed between two versions, record by record, with the sizes that moved.</summary>
public static class DiffCommand
{
    public static Command Create(TextWriter stdout)
    {
        var oldArg = new Argument<string>("old") { Description = "A file, or a git revision and path such as HEAD~1:plant.motors" };
        var newArg = new Argument<string>("new") { Description = "A file, or a git revision and path" };
        var format = new Option<string>("--format") { Description = "text or json", DefaultValueFactory = _ => "text" };
        format.AcceptOnlyFromAmong("text", "json");
        var exitCode = new Option<bool>("--exit-code") { Description = "Exit 1 when the versions differ, 0 when they do not" };
        var command = new Command("diff", "Compare two versions of a motor list by tag") { oldArg, newArg, format, exitCode };
        command.SetAction(result =>
        {
            var before = Analyzer.Analyze(Read(result.GetValue(oldArg)!));
            var after = Analyzer.Analyze(Read(result.GetValue(newArg)!));
            var changes = ListDiff.Compare(before, after);
            if (result.GetValue(format) == "json")
                stdout.WriteLine(JsonSerializer.Serialize(changes, JsonReport.Options));
            else if (changes.Count == 0)
                stdout.WriteLine("no changes");
            else
                foreach (var c in changes) stdout.WriteLine(ListDiff.Describe(c));
            return result.GetValue(exitCode) && changes.Count > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>A path on disk, or REV:PATH read with `git show` from the current folder's repository.</summary>
    public static string Read(string spec)
    {
        if (File.Exists(spec)) return SourceFiles.Read(spec);
        var colon = spec.IndexOf(':');
        if (colon <= 0) throw new CliException($"cannot read '{spec}': no such file, and not a git revision:path");
        return Git.RunOrFail(null, $"show '{spec}'", "show", spec);
    }
}
