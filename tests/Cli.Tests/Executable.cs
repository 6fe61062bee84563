using System.Diagnostics;

namespace MotorLang.Cli.Tests;

/// <summary>Runs the real motorlang executable (the built dll, through the dotnet host) and captures what it prints.</summary>
internal static class Executable
{
    public static (int Code, string Out, string Err) Run(string workingDirectory, params string[] args) =>
        Run(workingDirectory, new Dictionary<string, string?>(), args);

    /// <summary>Runs with some environment variables set (a null value removes one).</summary>
    public static (int Code, string Out, string Err) Run(string workingDirectory, IReadOnlyDictionary<string, string?> environment, params string[] args)
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
        var info = new ProcessStartInfo("dotnet", ["exec", dll, .. args])
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        foreach (var (name, value) in environment) info.Environment[name] = value;
        using var process = Process.Start(info)!;
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(60_000))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"motorlang {string.Join(' ', args)} did not finish in 60 s");
        }

        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    /// <summary>Runs a helper program (mkfifo, ln, chown) and fails the test if it fails.</summary>
    public static void Tool(string file, params string[] args)
    {
        using var p = Process.Start(new ProcessStartInfo(file, args) { RedirectStandardOutput = true, RedirectStandardError = true })!;
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"{file} {string.Join(' ', args)}: {p.StandardError.ReadToEnd()}");
    }

    public static void Git(string dir, params string[] args)
    {
        var info = new ProcessStartInfo("git", args) { WorkingDirectory = dir, RedirectStandardOutput = true, RedirectStandardError = true };
        info.Environment["GIT_AUTHOR_NAME"] = info.Environment["GIT_COMMITTER_NAME"] = "Test";
        info.Environment["GIT_AUTHOR_EMAIL"] = info.Environment["GIT_COMMITTER_EMAIL"] = "test@example.invalid";
        using var p = Process.Start(info)!;
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"git {string.Join(' ', args)}: {p.StandardError.ReadToEnd()}");
    }

    public static string RepoRoot
    {
        get
        {
            var dir = AppContext.BaseDirectory;
            while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
            return dir;
        }
    }
}
