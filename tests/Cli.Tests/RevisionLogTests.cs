using System.Text.RegularExpressions;

namespace MotorLang.Cli.Tests;

/// <summary>The report's revision log, read from git: newest first, each revision with what changed since the one before it.</summary>
public sealed class RevisionLogTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-revlog-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string[] Rows(string html) =>
        Regex.Matches(html, "<tr class=\"revision\"[^>]*>(.*?)</tr>", RegexOptions.Singleline)
            .Select(m => Regex.Replace(m.Groups[1].Value, "<[^>]+>", " ")).ToArray();

    [Fact]
    public void LogShowsEachRevisionsChangesByTagAndTheUncommittedWorkTree()
    {
        Executable.Git(_dir, "init", "-q");
        var path = Path.Combine(_dir, "plant.motors");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 \"Pump\" 15hp\n    wire 10 AWG\n");
        Executable.Git(_dir, "add", "plant.motors");
        Executable.Git(_dir, "commit", "-q", "-m", "issued for review");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 \"Pump\" 30hp\n    wire 10 AWG\n");
        Executable.Git(_dir, "commit", "-q", "-am", "pump upsized after process review");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 \"Pump\" 30hp\n    wire 10 AWG\n  motor P-302 5hp\n");

        var (_, html, err) = Executable.Run(_dir, "report", "plant.motors", "--date", "2026-12-03");
        Assert.True(html.Length > 0, err);
        var rows = Rows(html);
        Assert.Equal(3, rows.Length);
        Assert.Contains("work tree", rows[0]);
        Assert.Contains("motor P-302 added", rows[0]);
        Assert.Contains("pump upsized after process review", rows[1]);
        // 30 hp 480 V: Table 430.250 40 A x 125 % = 50 A -> 8 AWG; 15 hp: 21 A x 125 % = 26.25 A -> 10 AWG (Table 310.16, 75 C).
        Assert.Contains("power 15hp → 30hp", System.Net.WebUtility.HtmlDecode(rows[1]));
        Assert.Contains("first revision", rows[2]);

        // --revisions 1 shows the newest only, still compared with the one before it.
        var one = Rows(Executable.Run(_dir, "report", "plant.motors", "--revisions", "1").Out);
        Assert.Single(one);
        Assert.Contains("motor P-302 added", one[0]);
    }

    [Fact]
    public void OutsideARepositoryTheSheetSaysThereIsNoLog()
    {
        var path = Path.Combine(_dir, "plant.motors");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 15hp\n");
        var (_, html, _) = Executable.Run(_dir, "report", "plant.motors");
        Assert.Empty(Rows(html));
        Assert.Contains("No revision log", html);
    }

    /// <summary>
    /// A plant's log (a copy of examples/harbor-cannery, one folder below the repository's top) is
    /// the plant diff per commit: a motor changed in an MCC file moves the switchboard feeder, whose
    /// file did not change, and a file added is named. The run starts in another folder, so the
    /// revisions are read from the plant's repository, not from wherever the command is run.
    /// </summary>
    [Fact]
    public void APlantsLogComparesTheWholePlantPerCommit()
    {
        var repo = Directory.CreateDirectory(Path.Combine(_dir, "repo")).FullName;
        var plant = Directory.CreateDirectory(Path.Combine(repo, "plant")).FullName;
        foreach (var f in Directory.GetFiles(Path.Combine(Executable.RepoRoot, "examples", "harbor-cannery"), "*.motors"))
            File.Copy(f, Path.Combine(plant, Path.GetFileName(f)));
        File.WriteAllText(Path.Combine(repo, "notes.txt"), "not a motor list\n");
        Executable.Git(repo, "init", "-q");
        Executable.Git(repo, "add", ".");
        Executable.Git(repo, "commit", "-q", "-m", "plant issued for review");
        var mcc1 = Path.Combine(plant, "mcc-1-retort.motors");
        File.WriteAllText(mcc1, File.ReadAllText(mcc1).Replace("pump\" 20hp", "pump\" 25hp"));
        Executable.Git(repo, "commit", "-q", "-am", "retort pump upsized");
        // A commit that touches no motor list is not a revision of the plant.
        File.WriteAllText(Path.Combine(repo, "notes.txt"), "still not a motor list\n");
        Executable.Git(repo, "commit", "-q", "-am", "notes");
        File.WriteAllText(Path.Combine(plant, "mcc-4-wash.motors"), "feeder MCC-4 480V 3ph\n  from SWBD-1\n  motor W-401 \"Wash pump\" 10hp\n");

        var elsewhere = Directory.CreateDirectory(Path.Combine(_dir, "elsewhere")).FullName;
        var (_, html, err) = Executable.Run(elsewhere, "report", plant, "--date", "2026-12-03");
        Assert.True(html.Length > 0, err);
        var rows = Rows(html).Select(r => System.Net.WebUtility.HtmlDecode(r) ?? "").ToArray();
        Assert.Equal(3, rows.Length);
        Assert.Contains("work tree", rows[0]);
        Assert.Contains("+ file mcc-4-wash.motors added", rows[0]);
        Assert.Contains("mcc-4-wash.motors: + motor W-401 added", rows[0]);
        Assert.Contains("retort pump upsized", rows[1]);
        Assert.Contains("mcc-1-retort.motors: ~ motor P-101: power 20hp → 25hp", rows[1]);
        // 430.24: the switchboard feeder's required ampacity follows the bigger pump (Table 430.250, 460 V: 20 hp 27 A, 25 hp 34 A).
        Assert.Matches("switchboard.motors: ~ feeder SWBD-1:.*required ampacity", rows[1]);
        Assert.Contains("plant issued for review", rows[2]);
        Assert.Contains("first revision", rows[2]);
        Assert.DoesNotContain(rows, r => r.Contains("notes", StringComparison.Ordinal) && !r.Contains("wash", StringComparison.Ordinal));
    }
}
