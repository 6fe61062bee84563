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
        Assert.Contains("first revision of the list", rows[2]);

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
}
