using System.CommandLine;

namespace MotorLang.Cli.Usage;

/// <summary>
/// `--color auto|always|never`. `auto` colours only a terminal, and not when NO_COLOR is set to
/// anything non-empty (no-color.org) or TERM is `dumb`; an explicit `always` or `never` wins over both.
/// </summary>
public static class ColorChoice
{
    public static Option<string> CreateOption()
    {
        var option = new Option<string>("--color")
        {
            Description = "Colour the output: auto (a terminal, unless NO_COLOR is set), always or never",
            DefaultValueFactory = _ => "auto",
            Recursive = true,
        };
        option.AcceptOnlyFromAmong("auto", "always", "never");
        return option;
    }

    public static bool Enabled(string? choice, CliEnvironment env) => choice switch
    {
        "always" => true,
        "never" => false,
        _ => env.OutputIsTerminal && string.IsNullOrEmpty(env.Variable("NO_COLOR")) && env.Variable("TERM") != "dumb",
    };
}
