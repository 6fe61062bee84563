using System.CommandLine;
using System.CommandLine.Parsing;
using MotorLang.Parser.Statements;

namespace MotorLang.Cli.Usage;

/// <summary>
/// Usage errors System.CommandLine lets through or words without a hint: a word that looks like an
/// option (`--chek`) but is none is an unknown option, not a file name (after `--` it is a file
/// name), and an unmatched first word is a misspelt command. Each gets the closest known name, if
/// one is close.
/// </summary>
public static class UnknownWords
{
    public static IReadOnlyList<string> Find(ParseResult parsed)
    {
        var messages = new List<string>();
        var command = parsed.CommandResult.Command;
        var afterSeparator = false;
        foreach (var token in parsed.Tokens)
        {
            if (token.Type == TokenType.DoubleDash) afterSeparator = true;
            if (afterSeparator || token.Type != TokenType.Argument || token.Value.Length < 2 || token.Value[0] != '-') continue;
            if (char.IsDigit(token.Value[1])) continue; // a negative number, not an option
            messages.Add($"unknown option '{token.Value}' for '{Name(command)}'{Hint(token.Value, OptionNames(command))}");
        }

        if (command is RootCommand)
        {
            foreach (var word in parsed.UnmatchedTokens.Where(t => !t.StartsWith('-')).Take(1))
                messages.Add($"unknown command '{word}'{Hint(word, command.Subcommands.Select(c => c.Name))}");
        }

        return messages;
    }

    private static string Name(Command c) => c is RootCommand ? "motorlang" : $"motorlang {c.Name}";

    private static IEnumerable<string> OptionNames(Command command)
    {
        var names = new List<string>();
        for (var c = command; c is not null; c = c.Parents.OfType<Command>().FirstOrDefault())
        {
            foreach (var o in c.Options.Where(o => c == command || o.Recursive)) names.AddRange([o.Name, .. o.Aliases]);
        }

        return names;
    }

    private static string Hint(string typed, IEnumerable<string> candidates) =>
        Suggestions.Closest(typed, candidates) is { } s ? $"; did you mean '{s}'?" : "";
}
