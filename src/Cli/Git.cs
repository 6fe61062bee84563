using System.Diagnostics;

namespace MotorLang.Cli;

/// <summary>
/// Runs git for the commands that read revisions (diff of files and plants, the report's revision
/// log). Arguments are passed as a list, never through a shell; output is kept as bytes, since a
/// plant's revision comes as a tar archive.
/// </summary>
public static class Git
{
    /// <summary>Exit code (-1 when git is not installed), standard output as bytes, standard error.</summary>
    public static (int Code, byte[] Out, string Err) Run(string? workingDirectory, params string[] args)
    {
        var info = new ProcessStartInfo("git", args) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        if (workingDirectory is not null) info.WorkingDirectory = workingDirectory;
        try
        {
            using var git = Process.Start(info);
            if (git is null) return (-1, [], "");
            // Read stderr alongside stdout so a chatty error cannot fill its pipe and stall git.
            var error = git.StandardError.ReadToEndAsync();
            using var output = new MemoryStream();
            git.StandardOutput.BaseStream.CopyTo(output);
            git.WaitForExit();
            return (git.ExitCode, output.ToArray(), error.GetAwaiter().GetResult().Trim());
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return (-1, [], "");
        }
    }

    /// <summary>Git's standard output as text, or null when git is not installed or the command fails (e.g. the folder is not in a repository).</summary>
    public static string? TryRun(string? workingDirectory, params string[] args)
    {
        var (code, output, _) = Run(workingDirectory, args);
        return code == 0 ? System.Text.Encoding.UTF8.GetString(output) : null;
    }

    /// <summary>Git's standard output as text; a failure ends the run, saying what could not be done.</summary>
    public static string RunOrFail(string? workingDirectory, string what, params string[] args)
    {
        var (code, output, error) = Run(workingDirectory, args);
        if (code == -1) throw new CliException("git is not installed, so revisions cannot be read");
        if (code != 0) throw new CliException($"git cannot {what}: {error}");
        return System.Text.Encoding.UTF8.GetString(output);
    }

    /// <summary><see cref="RunOrFail"/> in a folder, trimmed, naming the git command on failure.</summary>
    public static string Text(string folder, params string[] args) => RunOrFail(folder, string.Join(' ', args), args).Trim();
}
