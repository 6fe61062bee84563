using System.CommandLine;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli;

/// <summary>The `motorlang` commands. Each command is a thin shell over the parser and analysis.</summary>
public static class CommandLine
{
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr) => Run(args, stdout, stderr, CliEnvironment.Plain());

    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, CliEnvironment env)
    {
        var root = new RootCommand("MotorLang: check, format and size motor lists (.motors) against NFPA 70-2023 Article 430.");
        var color = ColorChoice.CreateOption();
        root.Options.Add(color);
        root.Subcommands.Add(CheckCommand.Create(stdout, stderr, env, color));
        root.Subcommands.Add(FormatCommand.Create(stdout, stderr, env));
        root.Subcommands.Add(ScheduleCommand.Create(stdout, stderr, env));
        root.Subcommands.Add(ReportCommand.CreateReport(stdout, stderr, env));
        root.Subcommands.Add(ReportCommand.CreateDiagram(stdout, stderr, env));
        root.Subcommands.Add(SizeCommand.Create(stdout, stderr));
        root.Subcommands.Add(DiffCommand.Create(stdout));
        root.Subcommands.Add(ExplainCommand.Create(stdout));
        root.Subcommands.Add(LspCommand.Create());

        var parsed = root.Parse(args);
        var unknown = UnknownWords.Find(parsed);
        if (unknown.Count > 0 || parsed.Errors.Count > 0)
        {
            // Our messages name the unknown word with a suggestion; the library's would repeat it without one.
            foreach (var m in unknown.Count > 0 ? unknown : parsed.Errors.Select(e => e.Message)) stderr.WriteLine($"motorlang: {m}");
            var name = parsed.CommandResult.Command is RootCommand ? "motorlang" : $"motorlang {parsed.CommandResult.Command.Name}";
            stderr.WriteLine($"Run '{name} --help' for usage.");
            return ExitCodes.Usage;
        }

        try
        {
            return parsed.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr, EnableDefaultExceptionHandler = false });
        }
        catch (CliException e)
        {
            stderr.WriteLine($"motorlang: {e.Message}");
            return ExitCodes.Usage;
        }
    }
}

public static class ExitCodes
{
    public const int Clean = 0;
    public const int Findings = 1;
    public const int Usage = 2;
}

/// <summary>A problem with the command's input (a missing file, an unreadable one) that ends the run with exit 2.</summary>
public sealed class CliException(string message) : Exception(message);
