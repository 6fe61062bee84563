namespace MotorLang.Cli.Tests;

/// <summary>
/// `motorlang diff` of a whole plant between git revisions (a copy of examples/harbor-cannery in a
/// repository of its own): a motor changed in one MCC file shows the switchboard feeder's sizes that
/// moved, in the switchboard's file, though that file did not change.
/// </summary>
public sealed class DiffPlantTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-diff-plant-").FullName;

    public DiffPlantTests()
    {
        Directory.CreateDirectory(Path.Combine(_dir, "plant"));
        foreach (var f in Directory.GetFiles(Path.Combine(Executable.RepoRoot, "examples", "harbor-cannery"), "*.motors"))
            File.Copy(f, Path.Combine(_dir, "plant", Path.GetFileName(f)));
        Executable.Git(_dir, "init", "-q");
        Executable.Git(_dir, "add", ".");
        Executable.Git(_dir, "commit", "-q", "-m", "first");
    }

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Plant(string name) => Path.Combine(_dir, "plant", name);

    [Fact]
    public void ARevisionAgainstTheWorkTreeComparesThePlants()
    {
        // P-101 from 20 hp to 500 hp, and a new file with one motor below MCC-2.
        File.WriteAllText(Plant("mcc-1-retort.motors"), File.ReadAllText(Plant("mcc-1-retort.motors")).Replace("pump\" 20hp", "pump\" 500hp"));
        Executable.Git(_dir, "commit", "-q", "-am", "bigger pump");
        File.WriteAllText(Plant("mcc-4-wash.motors"), "feeder MCC-4 480V 3ph\n  from SWBD-1\n  motor W-401 \"Wash pump\" 10hp\n");

        var (code, output, err) = Executable.Run(_dir, "diff", "HEAD~1", "plant");
        Assert.True(code == 0, err);
        var lines = output.Trim().Split('\n');
        Assert.Contains("+ file mcc-4-wash.motors added", lines);
        Assert.Contains(lines, l => l.StartsWith("mcc-1-retort.motors: ~ motor P-101: power 20hp → 500hp", StringComparison.Ordinal));
        // The switchboard file is unchanged, but its feeder now carries the bigger pump and MCC-4.
        Assert.Contains(lines, l => l.StartsWith("switchboard.motors: ~ feeder SWBD-1:", StringComparison.Ordinal) && l.Contains("required ampacity"));
        Assert.Contains(lines, l => l.StartsWith("mcc-4-wash.motors: + motor W-401 added", StringComparison.Ordinal));

        // A file of the plant names the plant as well, and REV:PATH reads that revision's plant.
        var same = Executable.Run(_dir, "diff", "HEAD~1:plant/switchboard.motors", Plant("mcc-2-filling.motors"));
        Assert.Equal(output, same.Out);

        var none = Executable.Run(_dir, "diff", "--exit-code", "HEAD", "HEAD:plant");
        Assert.Equal((0, "no changes"), (none.Code, none.Out.Trim()));
    }

    [Fact]
    public void AFolderWithNoPlantIsRefused()
    {
        Directory.CreateDirectory(Path.Combine(_dir, "loose"));
        File.WriteAllText(Path.Combine(_dir, "loose", "a.motors"), "feeder F 480V 3ph\n");
        var (code, _, err) = Executable.Run(_dir, "diff", "HEAD", "loose");
        Assert.Equal(2, code);
        Assert.Contains("holds no plant", err);
    }
}
