using System.CommandLine;
using MotorLang.Files;

namespace MotorLang.Cli.Usage;

/// <summary>
/// The motor lists a command reads: files and folders as named, or, for a lone `-`, standard input,
/// called by `--stdin-filename` in messages (default `<stdin>`).
/// </summary>
public sealed class Inputs
{
    public const string StdinWord = "-";
    public const string DefaultStdinName = "<stdin>";

    private readonly Func<string>? _stdin;
    private string? _stdinText;

    private Inputs(IReadOnlyList<string> names, Func<string>? stdin, bool fromStdin)
    {
        Names = names;
        _stdin = stdin;
        FromStdin = fromStdin;
    }

    public IReadOnlyList<string> Names { get; }

    /// <summary>True when the one input is standard input (so there is no file to write back to).</summary>
    public bool FromStdin { get; }

    public static Option<string> CreateStdinNameOption() =>
        new("--stdin-filename") { Description = "With '-', the name to give standard input in messages" };

    public static Inputs Resolve(IReadOnlyList<string> paths, string? stdinName, CliEnvironment env, TextWriter stderr)
    {
        if (paths.Contains(StdinWord))
        {
            if (paths.Count > 1) throw new CliException("'-' (standard input) cannot be combined with other paths");
            var name = string.IsNullOrEmpty(stdinName) ? DefaultStdinName : stdinName;
            return new Inputs([name], () => ReadStdin(env, name), fromStdin: true);
        }

        if (stdinName is not null) throw new CliException("--stdin-filename needs '-' (standard input) as the path");
        return new Inputs(SourceFiles.Expand(paths, stderr), null, fromStdin: false);
    }

    public string Read(string name) => FromStdin ? _stdinText ??= _stdin!() : SourceFiles.Read(name);

    private static string ReadStdin(CliEnvironment env, string name)
    {
        try
        {
            using var stream = env.OpenStdin();
            return SafeReader.ReadText(stream, name);
        }
        catch (FileRefusedException e)
        {
            throw new CliException(e.Message);
        }
    }
}
