using System.CommandLine;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Cli;

/// <summary>
/// `motorlang fmt`: rewrite files in canonical form; `--check` only names those that would change,
/// `--diff` shows how, `--stdout` prints the result. `-` formats standard input to standard output.
/// </summary>
public static class FormatCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr, CliEnvironment env)
    {
        var paths = new Argument<string[]>("paths") { Description = "Motor-list files or folders, or - for standard input", Arity = ArgumentArity.OneOrMore };
        var check = new Option<bool>("--check") { Description = "Change nothing; exit 1 and name each file that would change" };
        var diff = new Option<bool>("--diff") { Description = "Change nothing; print a unified diff of what would change (with --check, also exit 1)" };
        var toStdout = new Option<bool>("--stdout") { Description = "Print the formatted text instead of writing the file (for git textconv)" };
        var stdinName = Inputs.CreateStdinNameOption();
        var quiet = SharedOptions.Quiet("what --check, --diff or --stdout asks for (no 'formatted' lines)");
        var command = new Command("fmt", "Format motor lists in place") { paths, check, diff, toStdout, stdinName, quiet };
        SharedOptions.Exclusive(command, check, toStdout);
        SharedOptions.Exclusive(command, diff, toStdout);
        command.SetAction(result =>
        {
            var checkOnly = result.GetValue(check);
            var showDiff = result.GetValue(diff);
            var quietly = result.GetValue(quiet);
            var inputs = Inputs.Resolve(result.GetValue(paths)!, result.GetValue(stdinName), env, stderr);
            // Standard input has no file to write back to: its formatted text goes to stdout.
            var print = result.GetValue(toStdout) || (inputs.FromStdin && !checkOnly && !showDiff);
            var changed = 0;
            var failed = false;
            foreach (var file in inputs.Names)
            {
                var text = inputs.Read(file);
                var parsed = DocumentParser.Parse(text);
                if (FrozenLines.IsUnreadable(parsed))
                {
                    // Nothing of it was read, so nothing of it is written: say so rather than stay silent.
                    stderr.WriteLine($"{file}: not formatted: {parsed.Diagnostics[0].Message}");
                    failed |= inputs.FromStdin;
                    continue;
                }

                var formatted = Formatter.Format(parsed);
                if (!formatted.Verified)
                {
                    stderr.WriteLine($"{file}: not formatted: the formatted text did not read back the same (please report this)");
                    failed |= inputs.FromStdin;
                    continue;
                }

                if (print)
                {
                    stdout.Write(inputs.FromStdin ? formatted.Text : formatted.Text.TrimStart('\uFEFF'));
                    continue;
                }

                if (!formatted.Changed) continue;
                changed++;
                if (showDiff) stdout.Write(UnifiedDiff.Between(file, text, formatted.Text, "formatted"));
                if (checkOnly && !quietly) stdout.WriteLine($"{file}: would be reformatted");
                if (checkOnly || showDiff) continue;
                SourceFiles.WriteAtomically(file, formatted.Text);
                if (!quietly) stdout.WriteLine($"{file}: formatted");
            }

            // Standard input that could not be formatted gives nothing on stdout, so a caller
            // replacing its buffer with the output must see a failure, not an empty success.
            if (failed) return ExitCodes.Usage;
            return checkOnly && changed > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }
}
