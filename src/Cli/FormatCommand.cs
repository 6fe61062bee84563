using System.CommandLine;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Cli;

/// <summary>`motorlang fmt`: rewrite files in canonical form, or with --check only say which would change.</summary>
public static class FormatCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var paths = new Argument<string[]>("paths") { Description = "Motor-list files or folders", Arity = ArgumentArity.OneOrMore };
        var check = new Option<bool>("--check") { Description = "Change nothing; exit 1 and name each file that would change" };
        var toStdout = new Option<bool>("--stdout") { Description = "Print the formatted text instead of writing the file (for git textconv)" };
        var command = new Command("fmt", "Format motor lists in place") { paths, check, toStdout };
        command.SetAction(result =>
        {
            var checkOnly = result.GetValue(check);
            var changed = 0;
            foreach (var file in SourceFiles.Expand(result.GetValue(paths)!, stderr))
            {
                var text = SourceFiles.Read(file);
                var parsed = DocumentParser.Parse(text);
                if (FrozenLines.IsUnreadable(parsed))
                {
                    // Nothing of it was read, so nothing of it is written: say so rather than stay silent.
                    stderr.WriteLine($"{file}: not formatted: {parsed.Diagnostics[0].Message}");
                    continue;
                }

                var formatted = Formatter.Format(parsed);
                if (!formatted.Verified)
                {
                    stderr.WriteLine($"{file}: not formatted: the formatted text did not read back the same (please report this)");
                    continue;
                }

                if (result.GetValue(toStdout))
                {
                    stdout.Write(formatted.Text.TrimStart('\uFEFF'));
                    continue;
                }

                if (!formatted.Changed) continue;
                changed++;
                if (checkOnly) stdout.WriteLine($"{file}: would be reformatted");
                else
                {
                    SourceFiles.WriteAtomically(file, formatted.Text);
                    stdout.WriteLine($"{file}: formatted");
                }
            }

            return checkOnly && changed > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }
}
