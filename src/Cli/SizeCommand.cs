using System.CommandLine;
using MotorLang.Analysis.Fixes;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli;

/// <summary>
/// `motorlang size`: apply every fix (correct sizes in, missing sizes added). `--dry-run` prints a
/// unified diff instead and `--check` only names the file; both change nothing and exit 1 when
/// the list would change, so CI can require a fully sized list.
/// </summary>
public static class SizeCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file" };
        var dryRun = new Option<bool>("--dry-run") { Description = "Print a unified diff, change nothing; exit 1 if the list would change" };
        var check = new Option<bool>("--check") { Description = "Change nothing; exit 1 and name the file if it would change" };
        var quiet = SharedOptions.Quiet("the diff (no status line)");
        var command = new Command("size", "Write the required sizes into a motor list") { file, dryRun, check, quiet };
        SharedOptions.Exclusive(command, dryRun, check);
        command.SetAction(result =>
        {
            var path = SourceFiles.Expand([result.GetValue(file)!])[0];
            var before = SourceFiles.Read(path);
            var after = SizeAll.Apply(before);
            var say = result.GetValue(quiet) ? TextWriter.Null : stderr;
            if (after == before)
            {
                say.WriteLine($"{path}: nothing to change");
                return ExitCodes.Clean;
            }

            if (result.GetValue(dryRun))
            {
                stdout.Write(UnifiedDiff.Between(path, before, after, "sized"));
                return ExitCodes.Findings;
            }

            if (result.GetValue(check))
            {
                if (!result.GetValue(quiet)) stdout.WriteLine($"{path}: would be sized");
                return ExitCodes.Findings;
            }

            SourceFiles.WriteAtomically(path, after);
            say.WriteLine($"{path}: sized");
            return ExitCodes.Clean;
        });
        return command;
    }
}
