using System.CommandLine;

namespace MotorLang.Cli;

/// <summary>The `motorlang` commands. Each command is a thin shell over the parser and analysis.</summary>
public static class CommandLine
{
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        var root = new RootCommand("MotorLang: check, format and size motor lists (.motors) against NFPA 70-2023 Article 430.");
        root.Subcommands.Add(CheckCommand.Create(stdout, stderr));
        root.Subcommands.Add(FormatCommand.Create(stdout, stderr));
        root.Subcommands.Add(ScheduleCommand.Create(stdout));
        root.Subcommands.Add(SizeCommand.Create(stdout, stderr));
        root.Subcommands.Add(DiffCommand.Create(stdout));
        root.Subcommands.Add(LspCommand.Create());

        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            foreach (var e in parsed.Errors) stderr.WriteLine($"motorlang: {e.Message}");
            stderr.WriteLine("Run 'motorlang --help' for usage.");
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
