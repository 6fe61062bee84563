using System.Diagnostics;
using System.Text.RegularExpressions;

namespace MotorLang.Cli.Tests;

/// <summary>
/// The README's hunk-header recipe (.gitattributes and the xfuncname setting), run as written with
/// the installed git on the example list: the headers name what the README says they name.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class HunkHeaderRecipeTests : IDisposable
{
    private readonly string _repo = Directory.CreateTempSubdirectory("motorlang-hunks-").FullName;

    public void Dispose() => Directory.Delete(_repo, recursive: true);

    /// <summary>The first code block of each kind after the README's "Hunk headers" paragraph.</summary>
    private static (string Attributes, string Config) ReadmeRecipe()
    {
        var readme = File.ReadAllText(Path.Combine(Executable.RepoRoot, "README.md"));
        var at = readme.IndexOf("**Hunk headers that name the motor.**", StringComparison.Ordinal);
        Assert.True(at >= 0, "README has no hunk-header recipe");
        var attributes = new Regex("```\n(.*?)```", RegexOptions.Singleline).Match(readme, at).Groups[1].Value;
        var config = new Regex("```sh\n(.*?)```", RegexOptions.Singleline).Match(readme, at).Groups[1].Value;
        return (attributes, config);
    }

    private string[] Lines => File.ReadAllLines(Path.Combine(_repo, "plant.motors"));

    private string HunkHeaderAfterChanging(int oneBasedLine, params string[] diffOptions)
    {
        var lines = Lines;
        lines[oneBasedLine - 1] += "  # changed";
        File.WriteAllLines(Path.Combine(_repo, "plant.motors"), lines);
        var info = new ProcessStartInfo("git", ["diff", .. diffOptions]) { WorkingDirectory = _repo, RedirectStandardOutput = true, RedirectStandardError = true };
        using var p = Process.Start(info)!;
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        Executable.Git(_repo, "checkout", "-q", "--", "plant.motors");
        return Assert.Single(output.Split('\n'), l => l.StartsWith("@@ ", StringComparison.Ordinal));
    }

    private int LineOf(string start) => Array.FindIndex(Lines, l => l.TrimStart().StartsWith(start, StringComparison.Ordinal)) + 1;

    [Fact]
    public void HeadersNameTheBlockAsTheReadmeSays()
    {
        var (attributes, config) = ReadmeRecipe();
        Executable.Git(_repo, "init", "-q");
        File.WriteAllText(Path.Combine(_repo, ".gitattributes"), attributes);
        File.Copy(Path.Combine(Executable.RepoRoot, "examples", "dairy-bottling.motors"), Path.Combine(_repo, "plant.motors"));
        Executable.Git(_repo, "add", "-A");
        Executable.Git(_repo, "commit", "-qm", "plant");
        // The config line runs as written, in the clone.
        using (var sh = Process.Start(new ProcessStartInfo("sh", ["-c", config]) { WorkingDirectory = _repo })!) sh.WaitForExit();

        var p102 = LineOf("motor P-102 ");
        var previous = Lines.Take(p102 - 1).Last(l => Regex.IsMatch(l, "^ *(feeder|motor|load) ")).Trim();
        Assert.StartsWith("motor P-10", previous); // the dairy list has its pumps in a row

        // Four lines into P-102's block: the header is P-102's own line.
        Assert.EndsWith(Lines[p102 - 1].Trim(), HunkHeaderAfterChanging(p102 + 4));
        // Two lines into it, with three lines of context the hunk starts above P-102: the block before.
        Assert.EndsWith(previous, HunkHeaderAfterChanging(p102 + 2));
        // -U0 names the block that holds the change.
        Assert.EndsWith(Lines[p102 - 1].Trim(), HunkHeaderAfterChanging(p102 + 1, "-U0"));
    }
}
