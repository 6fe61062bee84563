using System.CommandLine;
using MotorLang.Cli.Output;
using MotorLang.Parser.Statements;

namespace MotorLang.Cli;

/// <summary>`motorlang explain CODE`: the documentation entry of one finding code.</summary>
public static class ExplainCommand
{
    public static Command Create(TextWriter stdout)
    {
        var code = new Argument<string>("code") { Description = "A finding code, such as M103 or P005" };
        var command = new Command("explain", "Print what a finding code means, its rule and its fix (from docs/checks.md and docs/format.md)") { code };
        command.SetAction(result =>
        {
            var wanted = result.GetValue(code)!.Trim();
            var entry = CodeDocs.Find(wanted);
            if (entry is null)
            {
                var hint = Suggestions.Closest(wanted.ToUpperInvariant(), CodeDocs.Entries.Select(e => e.Code)) is { } s ? $" (did you mean '{s}'?)" : "";
                throw new CliException($"no finding code '{wanted}'{hint}; docs/checks.md and docs/format.md list them all");
            }

            stdout.WriteLine($"{entry.Code} ({entry.Source})");
            foreach (var line in entry.Lines) stdout.WriteLine(line);
            return ExitCodes.Clean;
        });
        return command;
    }
}
