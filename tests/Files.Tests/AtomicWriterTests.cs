using System.Diagnostics;

namespace MotorLang.Files.Tests;

/// <summary>The file-writing rules (docs/ARCHITECTURE.md, "Files"), each against a real file system.</summary>
public sealed class AtomicWriterTests : TempFolder
{
    private const string Old = "feeder F-1 480V 3ph\n";
    private const string New = "feeder F-1 480V 3ph\n  motor M-1 5hp\n";

    public override void Dispose()
    {
        AtomicWriter.TempName = DefaultName;
        AtomicWriter.AfterTempWritten = null;
        base.Dispose();
    }

    private static readonly Func<string, string> DefaultName = AtomicWriter.TempName;

    private string[] Leftovers() => Directory.GetFiles(Dir, "*.tmp");

    [Fact]
    public void APlantedSymlinkAtTheTemporaryNameIsNeverOpened()
    {
        var list = Write("a.motors", Old);
        var victim = Write("victim.txt", "precious\n");
        // Every name the writer tries first is taken by a symlink to the victim, as an attacker sharing the folder would plant them.
        var planted = Enumerable.Range(0, 3).Select(i => PathOf($".planted{i}.tmp")).ToArray();
        foreach (var p in planted) File.CreateSymbolicLink(p, victim);
        var tries = 0;
        AtomicWriter.TempName = target => tries < planted.Length ? Path.GetFileName(planted[tries++]) : DefaultName(target);

        AtomicWriter.WriteText(list, New);

        Assert.Equal("precious\n", File.ReadAllText(victim));
        Assert.Equal(New, File.ReadAllText(list));
        Assert.Null(new FileInfo(list).LinkTarget);
        Assert.All(planted, p => Assert.Equal(victim, new FileInfo(p).LinkTarget));
        Assert.Equal(planted.Length, tries);
    }

    [Fact]
    public void WhenEveryNameIsTakenNothingIsWritten()
    {
        var list = Write("a.motors", Old);
        var victim = Write("victim.txt", "precious\n");
        File.CreateSymbolicLink(PathOf(".always.tmp"), victim);
        AtomicWriter.TempName = _ => ".always.tmp";

        var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(list, New));
        Assert.Contains("already taken", e.Message);
        Assert.Equal(Old, File.ReadAllText(list));
        Assert.Equal("precious\n", File.ReadAllText(victim));
    }

    [Fact]
    public void TemporaryNamesAreUnpredictable()
    {
        // 128 random bits per name, nothing from the process id: 1,000 names, all different, none containing the pid.
        var names = Enumerable.Range(0, 1000).Select(_ => DefaultName("/x/a.motors")).ToList();
        Assert.Equal(names.Count, names.Distinct().Count());
        Assert.All(names, n => Assert.Matches(@"^\.a\.motors\.[0-9a-f]{32}\.tmp$", n));
        Assert.All(names, n => Assert.DoesNotContain($".{Environment.ProcessId}.", n));
    }

    [Fact]
    public void ASymlinkIsWrittenThroughToItsTargetAndStaysALink()
    {
        var real = Write("lists/real.motors", Old);
        var link = PathOf("link.motors");
        File.CreateSymbolicLink(link, Path.Combine("lists", "real.motors"));

        AtomicWriter.WriteText(link, New);

        Assert.Equal(Path.Combine("lists", "real.motors"), new FileInfo(link).LinkTarget);
        Assert.Equal(New, File.ReadAllText(real));
        Assert.Empty(Directory.GetFiles(Path.Combine(Dir, "lists"), "*.tmp"));
    }

    [Fact]
    public void ADanglingSymlinkIsRefused()
    {
        var link = PathOf("link.motors");
        File.CreateSymbolicLink(link, "missing.motors");
        Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(link, New));
        Assert.False(File.Exists(PathOf("missing.motors")));
    }

    [Theory]
    [InlineData(0b110_100_000)] // 0640
    [InlineData(0b110_000_000)] // 0600
    [InlineData(0b111_101_101)] // 0755
    [InlineData(0b110_110_110)] // 0666
    public void ModeIsKept(int mode)
    {
        var list = Write("a.motors", Old);
        File.SetUnixFileMode(list, (UnixFileMode)mode);
        AtomicWriter.WriteText(list, New);
        Assert.Equal((UnixFileMode)mode, File.GetUnixFileMode(list));
        Assert.Equal(New, File.ReadAllText(list));
    }

    [Fact]
    public void OwnerAndGroupAreKept()
    {
        var list = Write("a.motors", Old);
        // As root (CI) the file is given to another user first, so keeping the owner is a real change of the temporary file's owner.
        if (Posix.Geteuid() == 0) Posix.Chown(list, 1234, 2345);
        var before = Posix.Stat(list);
        AtomicWriter.WriteText(list, New);
        var after = Posix.Stat(list);
        Assert.Equal((before.Uid, before.Gid), (after.Uid, after.Gid));
        Assert.Equal(New, File.ReadAllText(list));
    }

    [Fact]
    public void AHardLinkedFileIsRefusedAndBothNamesKeepTheirText()
    {
        var list = Write("a.motors", Old);
        var other = PathOf("b.motors");
        Posix.Link(list, other);

        var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(list, New));
        Assert.Contains("2 hard links", e.Message);
        Assert.Equal(Old, File.ReadAllText(list));
        Assert.Equal(2u, Posix.Stat(list).Links);
        Assert.Equal(Posix.Stat(list).Identity, Posix.Stat(other).Identity);
        Assert.Empty(Leftovers());
    }

    [Theory]
    [InlineData(0b100_100_100)] // 0444
    [InlineData(0b100_110_110)] // 0466: others may write, the owner may not
    [InlineData(0b000_000_000)] // 0000
    public void AReadOnlyFileIsRefused(int mode)
    {
        // Root passes permission checks, so the rule reads the mode bits: no owner write bit means read-only.
        var list = Write("a.motors", Old);
        File.SetUnixFileMode(list, (UnixFileMode)mode);

        var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(list, New));
        Assert.Contains("read-only", e.Message);
        Assert.Equal((UnixFileMode)mode, File.GetUnixFileMode(list));
        File.SetUnixFileMode(list, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        Assert.Equal(Old, File.ReadAllText(list));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void AFifoIsNotWritten()
    {
        var fifo = PathOf("p.motors");
        Posix.Mkfifo(fifo);
        var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(fifo, New));
        Assert.Contains("FIFO", e.Message);
        Assert.Equal(FileKind.Fifo, Posix.Stat(fifo).Kind);
    }

    [Fact]
    public void AFailureWhileWritingLeavesTheOriginalAndNoTemporaryFile()
    {
        // The same path a full disk takes (an IOException from the temporary file), made to happen on any machine.
        var list = Write("a.motors", Old);
        AtomicWriter.AfterTempWritten = _ => throw new IOException("No space left on device");

        var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(list, New));
        Assert.Contains("No space left on device", e.Message);
        Assert.Contains("unchanged", e.Message);
        Assert.Equal(Old, File.ReadAllText(list));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void AFullDiskLeavesTheOriginalIntact()
    {
        // A real full disk: a 64 KB tmpfs (mounting needs root, as in CI), filled but for the original.
        var mount = Directory.CreateDirectory(PathOf("small")).FullName;
        var mounted = Run("mount", "-t", "tmpfs", "-o", "size=64k", "tmpfs", mount);
        Assert.True(mounted == 0, "mounting a small tmpfs failed; this test needs root (CI runs as root)");
        try
        {
            var list = Path.Combine(mount, "a.motors");
            var original = string.Concat(Enumerable.Repeat("feeder F-1 480V 3ph\n", 1000)); // 20,000 bytes
            File.WriteAllText(list, original);
            using (var filler = new FileStream(Path.Combine(mount, "filler"), FileMode.Create, FileAccess.Write, FileShare.None, bufferSize: 0))
            {
                var block = new byte[1024];
                try
                {
                    while (true) filler.Write(block);
                }
                catch (IOException)
                {
                    // The disk is full now.
                }
            }

            var e = Assert.Throws<FileRefusedException>(() => AtomicWriter.WriteText(list, original + original));
            Assert.Contains("unchanged", e.Message);
            Assert.Equal(original, File.ReadAllText(list));
            Assert.Empty(Directory.GetFiles(mount, "*.tmp"));
        }
        finally
        {
            Assert.Equal(0, Run("umount", mount));
        }
    }

    private static int Run(string file, params string[] args)
    {
        using var p = Process.Start(new ProcessStartInfo(file, args) { RedirectStandardError = true, RedirectStandardOutput = true })!;
        p.WaitForExit();
        return p.ExitCode;
    }
}
