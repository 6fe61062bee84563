using System.CommandLine;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Cli.Usage;

/// <summary>Options several commands share, made in one place so they are spelt and described alike.</summary>
public static class SharedOptions
{
    public static Option<bool> Quiet(string what) => new("--quiet", "-q") { Description = $"Print nothing but {what}" };

    /// <summary>`--output FILE` (`-o`): write the result to FILE (atomically, through src/Files) instead of standard output.</summary>
    public static Option<string?> Output(string what) => new("--output", "-o") { Description = $"Write {what} to this file instead of standard output" };

    /// <summary>`--severity LEVEL`: show findings at LEVEL or more severe. Totals and the exit code still count all of them.</summary>
    public static Option<string> SeverityFilter()
    {
        var option = new Option<string>("--severity")
        {
            Description = "Show only findings this severe or more: error, warning or information (the default)",
            DefaultValueFactory = _ => "information",
        };
        option.AcceptOnlyFromAmong("error", "warning", "information");
        return option;
    }

    public static bool Shows(string? level, Severity s) => level switch
    {
        "error" => s == Severity.Error,
        "warning" => s is Severity.Error or Severity.Warning,
        _ => true,
    };

    /// <summary>Rejects two options that ask for opposite things, as a usage error naming both.</summary>
    public static void Exclusive(Command command, Option a, Option b) =>
        command.Validators.Add(r =>
        {
            if (r.GetResult(a) is { Implicit: false } && r.GetResult(b) is { Implicit: false })
                r.AddError($"{a.Name} and {b.Name} cannot be used together");
        });
}
