using System.Diagnostics;

namespace MotorLang.Cli;

/// <summary>Runs git for the commands that read revisions (diff, the report's revision log). Arguments are passed as a list, never through a shell.</summary>
public static class Git
{
    /// <summary>Git's standard output, or null when git is not installed or the command fails (e.g. the folder is not in a repository).</summary>
    public static string? TryRun(string? workingDirectory, params string[] args)
    {
        var (code, output, _) = Run(workingDirectory, args);
        return code == 0 ? output : null;
    }

    /// <summary>Git's standard output; a failure ends the run with its message.</summary>
    public static string RunOrFail(string? workingDirectory, string what, params string[] args)
    {
        var (code, output, error) = Run(workingDirectory, args);
        if (code == -1) throw new CliException("git is not installed, so revisions cannot be read");
        if (code != 0) throw new CliException($"git cannot {what}: {error.Trim()}");
        return output;
    }

    private static (int Code, string Output, string Error) Run(string? workingDirectory, string[] args)
    {
        var info = new ProcessStartInfo("git", args)
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
            StandardOutputEncoding = System.Text.Encoding.UTF8,
        };
        if (workingDirectory is not null) info.WorkingDirectory = workingDirectory;
        try
        {
            using var git = Process.Start(info);
            if (git is null) return (-1, "", "");
            // Read stderr alongside stdout so a chatty error cannot fill its pipe and stall git.
            var error = git.StandardError.ReadToEndAsync();
            var output = git.StandardOutput.ReadToEnd();
            git.WaitForExit();
            return (git.ExitCode, output, error.GetAwaiter().GetResult());
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return (-1, "", "");
        }
    }
}
