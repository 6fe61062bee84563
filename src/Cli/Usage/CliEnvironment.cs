namespace MotorLang.Cli.Usage;

/// <summary>
/// What a run reads from its surroundings besides its arguments: standard input, whether standard
/// output is a terminal and how wide it is, and the environment. Tests pass their own to see
/// colour and width decisions without a real terminal.
/// </summary>
public sealed record CliEnvironment(Func<Stream> OpenStdin, bool OutputIsTerminal, int? TerminalWidth, Func<string, string?> Variable)
{
    public static CliEnvironment FromProcess() => new(
        Console.OpenStandardInput,
        !Console.IsOutputRedirected,
        Console.IsOutputRedirected ? null : SafeWidth(),
        Environment.GetEnvironmentVariable);

    /// <summary>A run with no terminal and an empty environment: output is plain and full width.</summary>
    public static CliEnvironment Plain(Stream? stdin = null) =>
        new(() => stdin ?? Stream.Null, false, null, _ => null);

    private static int? SafeWidth()
    {
        try
        {
            return Console.WindowWidth is > 0 and var w ? w : null;
        }
        catch (IOException)
        {
            return null;
        }
    }
}
