using MotorLang.Parser.Diagnostics;

namespace MotorLang.Cli.Output;

/// <summary>ANSI colours for severities: red errors, yellow warnings, cyan information, each reset after the word.</summary>
public static class Colors
{
    public const string Reset = "\u001b[0m";

    public static string Severity(Severity s, string text, bool enabled) =>
        enabled ? $"{Code(s)}{text}{Reset}" : text;

    private static string Code(Severity s) => s switch
    {
        Parser.Diagnostics.Severity.Error => "\u001b[1;31m",
        Parser.Diagnostics.Severity.Warning => "\u001b[33m",
        _ => "\u001b[36m",
    };
}
