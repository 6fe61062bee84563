using System.Diagnostics;
using System.Text.RegularExpressions;

namespace MotorLang.Cli.Tests;

/// <summary>
/// The README's pre-commit hook, run as written in a scratch repository, and the hook definitions
/// for the pre-commit framework (.pre-commit-hooks.yaml) run through the real command line.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class PreCommitTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-hook-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string Example(string name) => File.ReadAllText(Path.Combine(Executable.RepoRoot, "examples", name));

    /// <summary>The first ```sh block after the README's "A pre-commit hook" paragraph, exactly as written.</summary>
    private static string ReadmeHook()
    {
        var readme = File.ReadAllText(Path.Combine(Executable.RepoRoot, "README.md"));
        var at = readme.IndexOf("**A pre-commit hook**", StringComparison.Ordinal);
        Assert.True(at >= 0, "README has no pre-commit hook");
        var m = new Regex("```sh\n(.*?)```", RegexOptions.Singleline).Match(readme, at);
        return m.Groups[1].Value;
    }

    private int RunHook()
    {
        // `motorlang` on PATH is the built tool, as the README's Install section puts it there.
        var bin = Directory.CreateDirectory(Path.Combine(_dir, "bin")).FullName;
        var wrapper = Path.Combine(bin, "motorlang");
        File.WriteAllText(wrapper, $"#!/bin/sh\nexec dotnet exec '{Path.Combine(AppContext.BaseDirectory, "motorlang.dll")}' \"$@\"\n");
        File.SetUnixFileMode(wrapper, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        var hook = Path.Combine(_dir, "repo", ".git", "hooks", "pre-commit");
        File.WriteAllText(hook, ReadmeHook());
        var info = new ProcessStartInfo("sh", [hook]) { WorkingDirectory = Path.Combine(_dir, "repo"), RedirectStandardOutput = true, RedirectStandardError = true };
        info.Environment["PATH"] = bin + ":" + Environment.GetEnvironmentVariable("PATH");
        using var p = Process.Start(info)!;
        p.StandardOutput.ReadToEndAsync();
        p.StandardError.ReadToEndAsync();
        Assert.True(p.WaitForExit(120_000), "the hook did not finish");
        return p.ExitCode;
    }

    private string Repo()
    {
        var repo = Directory.CreateDirectory(Path.Combine(_dir, "repo")).FullName;
        Executable.Git(repo, "init", "-q");
        return repo;
    }

    private static void Stage(string repo, string name, string text)
    {
        File.WriteAllText(Path.Combine(repo, name), text);
        Executable.Git(repo, "add", "--", name);
    }

    [Fact]
    public void TheReadmeHookChecksTheStagedTextNotTheWorkTree()
    {
        var repo = Repo();
        var good = Example("dairy-bottling.motors");
        Stage(repo, "bottling hall.motors", good);
        // The work tree holds an unformatted, failing version that is not staged: the commit is fine.
        File.WriteAllText(Path.Combine(repo, "bottling hall.motors"), Example("cabinet-shop.motors").Replace("\n  ", "\n   "));
        Assert.Equal(0, RunHook());

        // Staged with an error (cabinet-shop.motors has deliberate mistakes): the hook fails.
        Stage(repo, "cabinet shop.motors", Example("cabinet-shop.motors"));
        Assert.NotEqual(0, RunHook());
    }

    [Fact]
    public void TheReadmeHookFailsOnAStagedListThatIsNotCanonical()
    {
        var repo = Repo();
        var text = Example("dairy-bottling.motors");
        Stage(repo, "a b.motors", text.Replace("  ambient", "  ambient ", StringComparison.Ordinal).Replace("\n  ", "\n    "));
        Assert.NotEqual(0, RunHook());
        Stage(repo, "a b.motors", text);
        Assert.Equal(0, RunHook());
    }

    [Fact]
    public void TheReadmeHookPassesWhenNoMotorListIsStaged()
    {
        var repo = Repo();
        Stage(repo, "notes.txt", "nothing to size\n");
        Assert.Equal(0, RunHook());
    }

    /// <summary>Each hook of .pre-commit-hooks.yaml: its id, entry and files pattern (a flat list, read line by line).</summary>
    private static List<(string Id, string Entry, string Files)> Hooks()
    {
        var hooks = new List<(string, string, string)>();
        string? id = null, entry = null;
        foreach (var line in File.ReadAllLines(Path.Combine(Executable.RepoRoot, ".pre-commit-hooks.yaml")))
        {
            if (line.StartsWith("- id: ")) (id, entry) = (line[6..].Trim(), null);
            else if (line.StartsWith("  entry: ")) entry = line[9..].Trim();
            else if (line.StartsWith("  files: ")) hooks.Add((id!, entry!, line[9..].Trim()));
        }

        return hooks;
    }

    [Fact]
    public void TheFrameworkHooksRunRealCommandsOnMotorListsOnly()
    {
        var hooks = Hooks();
        Assert.Equal(["motorlang-fmt", "motorlang-check"], hooks.Select(h => h.Id));
        var good = Path.Combine(_dir, "good list.motors");
        File.WriteAllText(good, Example("dairy-bottling.motors"));
        var bad = Path.Combine(_dir, "bad list.motors");
        File.WriteAllText(bad, Example("cabinet-shop.motors").Replace("\n  ", "\n    "));
        foreach (var (id, entry, files) in hooks)
        {
            var words = entry.Split(' ');
            Assert.Equal("motorlang", words[0]);
            Assert.Matches(files, "pump room/a b.motors");
            Assert.DoesNotMatch(files, "notes.txt");
            // pre-commit appends the staged file names to the entry.
            Assert.True(CommandLine.Run([.. words[1..], good], new StringWriter(), new StringWriter()) == 0, $"{id} fails a clean list");
            Assert.True(CommandLine.Run([.. words[1..], bad], new StringWriter(), new StringWriter()) == 1, $"{id} passes a list it should fail");
        }
    }
}
