using System.Diagnostics;

namespace MotorLang.Cli;

/// <summary>Runs git in a folder for the revisions of a plant: its exit code, standard output as bytes (a tar archive, which <see cref="Git"/>, reading text, cannot carry) and standard error.</summary>
internal static class GitProcess
{
    public static (int Code, byte[] Out, string Err) Run(string folder, params string[] args)
    {
        var info = new ProcessStartInfo("git", ["-C", folder, .. args])
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        try
        {
            using var git = Process.Start(info) ?? throw new CliException("cannot start git");
            var error = git.StandardError.ReadToEndAsync();
            using var output = new MemoryStream();
            git.StandardOutput.BaseStream.CopyTo(output);
            git.WaitForExit();
            return (git.ExitCode, output.ToArray(), error.Result.Trim());
        }
        catch (System.ComponentModel.Win32Exception)
        {
            throw new CliException("git is not installed, so revisions cannot be read");
        }
    }

    public static string Text(string folder, params string[] args)
    {
        var (code, output, error) = Run(folder, args);
        if (code != 0) throw new CliException($"git {string.Join(' ', args)}: {error}");
        return System.Text.Encoding.UTF8.GetString(output).Trim();
    }
}
