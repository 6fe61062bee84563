using System.Runtime.Versioning;

namespace MotorLang.Cli.Tests;

/// <summary>
/// The file-system cases of the reliability campaign, through the commands: writes that keep what the
/// user set up (or refuse), special files that are never opened or read, folder loops visited once.
/// Exit codes: a refused file is exit 2 with a message naming it; a special file met in a folder search
/// is skipped with a note on stderr and the run goes on.
/// </summary>
[UnsupportedOSPlatform("windows")]
public sealed class FileSafetyTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-files-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    // Not canonical (upper-case keywords, spaces in values): `fmt` wants to rewrite it.
    private const string Unformatted = "FEEDER F-1 480v 3PH\n    motor M-1 5 hp\n";
    private const string Formatted = "feeder F-1 480V 3ph\n  motor M-1 5hp\n";

    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private string Write(string name, string text)
    {
        var path = Path.Combine(_dir, name);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void FormattingIsWhatTheseTestsExpect()
    {
        var path = Write("a.motors", Unformatted);
        Assert.Equal(0, Run("fmt", path).Code);
        Assert.Equal(Formatted, File.ReadAllText(path));
    }

    [Fact]
    public void ASymlinkPlantedAtTheOldTemporaryNameRedirectsNothing()
    {
        // The name the writer used to pick (".NAME.PID.tmp"), planted as a symlink to a file the user can write.
        var list = Write("a.motors", Unformatted);
        var victim = Write("victim.txt", "precious\n");
        var planted = Path.Combine(_dir, $".a.motors.{Environment.ProcessId}.tmp");
        File.CreateSymbolicLink(planted, victim);

        Assert.Equal(0, Run("fmt", list).Code);
        Assert.Equal("precious\n", File.ReadAllText(victim));
        Assert.Null(new FileInfo(list).LinkTarget);
        Assert.Equal(Formatted, File.ReadAllText(list));
        Assert.Equal(victim, new FileInfo(planted).LinkTarget);
    }

    [Fact]
    public void ASymlinkedListIsFormattedThroughToItsTargetAndStaysALink()
    {
        var real = Write("lists/real.motors", Unformatted);
        var link = Path.Combine(_dir, "link.motors");
        File.CreateSymbolicLink(link, "lists/real.motors");

        var (code, output, _) = Run("fmt", link);
        Assert.Equal(0, code);
        Assert.Contains("formatted", output);
        Assert.Equal("lists/real.motors", new FileInfo(link).LinkTarget);
        Assert.Equal(Formatted, File.ReadAllText(real));
    }

    [Fact]
    public void SizeKeepsTheSymlinkToo()
    {
        const string before = "feeder F-1 480V 3ph\n  motor M-1 5hp\n";
        var real = Write("lists/real.motors", before);
        var link = Path.Combine(_dir, "link.motors");
        File.CreateSymbolicLink(link, "lists/real.motors");
        Assert.Equal(0, Run("size", link).Code);
        Assert.Equal("lists/real.motors", new FileInfo(link).LinkTarget);
        Assert.StartsWith("feeder F-1 480V 3ph\n", File.ReadAllText(real));
        Assert.NotEqual(before, File.ReadAllText(real));
    }

    [Fact]
    public void Mode640AndTheOwnerAreKept()
    {
        var list = Write("a.motors", Unformatted);
        File.SetUnixFileMode(list, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead);
        // CI runs as root: the file belongs to another user, as a shared project folder's file would.
        var root = Environment.UserName == "root";
        if (root) Executable.Tool("chown", "1234:2345", list);
        var owner = Owner(list);

        Assert.Equal(0, Run("fmt", list).Code);
        Assert.Equal(Formatted, File.ReadAllText(list));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead, File.GetUnixFileMode(list));
        Assert.Equal(owner, Owner(list));
        if (root) Assert.Equal("1234:2345", owner);
    }

    [Fact]
    public void AHardLinkedListIsRefusedAndLeftAlone()
    {
        var list = Write("a.motors", Unformatted);
        var other = Path.Combine(_dir, "b.motors");
        Executable.Tool("ln", list, other);

        var (code, _, err) = Run("fmt", list);
        Assert.Equal(2, code);
        Assert.Contains("has 2 hard links", err);
        Assert.Equal(Unformatted, File.ReadAllText(list));
        Assert.Equal(Unformatted, File.ReadAllText(other));
        Assert.Equal("2", Stat("%h", list));
    }

    [Fact]
    public void AReadOnlyListIsRefused()
    {
        // Root may write anything, so the rule reads the mode: no owner write bit is read-only.
        var list = Write("a.motors", Unformatted);
        File.SetUnixFileMode(list, UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead);

        var (code, _, err) = Run("fmt", list);
        Assert.Equal(2, code);
        Assert.Contains("is read-only (mode 0444); not written", err);
        Assert.Equal(Unformatted, File.ReadAllText(list));
        Assert.Equal("444", Stat("%a", list));
        Assert.Equal(2, Run("size", list).Code);
    }

    [Fact]
    public void ADirectorySymlinkLoopChecksEachFileOnce()
    {
        Write("plant/a.motors", Formatted);
        Write("plant/area/b.motors", Formatted);
        Directory.CreateSymbolicLink(Path.Combine(_dir, "plant/area/up"), "..");
        var (code, output, err) = Run("check", Path.Combine(_dir, "plant"));
        Assert.Equal(0, code);
        Assert.Contains("2 files checked", err);
        var reported = output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => Path.GetRelativePath(_dir, l[..l.IndexOf(".motors:", StringComparison.Ordinal)] + ".motors")).Distinct();
        Assert.Equal([Path.Combine("plant", "a.motors"), Path.Combine("plant", "area", "b.motors")], reported);
    }

    [Fact]
    public void AFifoInAFolderIsSkippedAndCheckFinishes()
    {
        Write("plant/a.motors", Formatted);
        Executable.Tool("mkfifo", Path.Combine(_dir, "plant/pipe.motors"));
        var (code, _, err) = Executable.Run(_dir, "check", "plant");
        Assert.Equal(0, code);
        Assert.Contains("skipped 'plant/pipe.motors': a named pipe (FIFO), not a regular file", err);
        Assert.Contains("1 file checked", err);
    }

    [Fact]
    public void AFifoNamedOnTheCommandLineIsRefusedWithExit2()
    {
        Executable.Tool("mkfifo", Path.Combine(_dir, "pipe.motors"));
        var (code, _, err) = Executable.Run(_dir, "check", "pipe.motors");
        Assert.Equal(2, code);
        Assert.Contains("'pipe.motors' is a named pipe (FIFO), not a regular file; only regular files are read", err);
    }

    [Fact]
    public void ASymlinkToDevZeroIsRefusedWithoutReading()
    {
        // A heap limit keeps the machine safe should the file be read: it would fail with out-of-memory, not exit 2.
        File.CreateSymbolicLink(Path.Combine(_dir, "zero.motors"), "/dev/zero");
        var env = new Dictionary<string, string?> { ["DOTNET_GCHeapHardLimit"] = "0x10000000" };
        var (code, _, err) = Executable.Run(_dir, env, "check", "zero.motors");
        Assert.Equal(2, code);
        Assert.Contains("'zero.motors' is a character device, not a regular file", err);
    }

    private static string Owner(string path) => Stat("%u:%g", path);

    private static string Stat(string format, string path)
    {
        using var p = System.Diagnostics.Process.Start(new System.Diagnostics.ProcessStartInfo("stat", ["-c", format, path]) { RedirectStandardOutput = true })!;
        var text = p.StandardOutput.ReadToEnd().Trim();
        p.WaitForExit();
        return text;
    }
}
