using System.CommandLine;
using MotorLang.Analysis;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Cli;

/// <summary>`motorlang check`: report every problem as file:line:col: severity code: message.</summary>
public static class CheckCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var paths = new Argument<string[]>("paths") { Description = "Motor-list files or folders", Arity = ArgumentArity.OneOrMore };
        var command = new Command("check", "Check motor lists and report problems") { paths };
        command.SetAction(result =>
        {
            var files = SourceFiles.Expand(result.GetValue(paths)!);
            int errors = 0, warnings = 0;
            foreach (var file in files)
            {
                var analysis = Analyzer.Analyze(SourceFiles.Read(file));
                foreach (var d in analysis.Findings)
                {
                    stdout.WriteLine(Describe(file, d));
                    if (d.Severity == Severity.Error) errors++;
                    else if (d.Severity == Severity.Warning) warnings++;
                }
            }

            stderr.WriteLine($"{files.Count} file{(files.Count == 1 ? "" : "s")} checked: {errors} error{(errors == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}");
            return errors > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    public static string Describe(string file, Finding d) =>
        $"{file}:{d.Range.Start.Line + 1}:{d.Range.Start.Column + 1}: {d.Severity.ToString().ToLowerInvariant()} {d.Code}: {d.Message}";
}
