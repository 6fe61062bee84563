namespace MotorLang.Files.Tests;

/// <summary>Folder search: each real file once, ordinal order, special files skipped, optionally inside the root.</summary>
public sealed class FileSearchTests : TempFolder
{
    private IReadOnlyList<string> Names(SearchResult r) => r.Files.Select(f => Path.GetRelativePath(Dir, f)).ToList();

    [Fact]
    public void ADirectorySymlinkLoopVisitsEachFileOnce()
    {
        Write("a.motors", "");
        Write("sub/b.motors", "");
        Directory.CreateSymbolicLink(PathOf("sub/loop"), Dir);
        Directory.CreateSymbolicLink(PathOf("sub/self"), ".");
        var r = FileSearch.Find(Dir, ".motors", stayInside: false);
        Assert.Equal(["a.motors", Path.Combine("sub", "b.motors")], Names(r));
    }

    [Fact]
    public void TwoNamesForOneFileGiveItOnceUnderTheFirstNameInOrdinalOrder()
    {
        Write("b.motors", "");
        File.CreateSymbolicLink(PathOf("a.motors"), "b.motors");
        Posix.Link(PathOf("b.motors"), PathOf("c.motors"));
        Assert.Equal(["a.motors"], Names(FileSearch.Find(Dir, ".motors", stayInside: false)));
    }

    [Fact]
    public void TheOrderIsOrdinalAndTheSameEveryTime()
    {
        string[] names = ["B.motors", "a.motors", "Z/x.motors", "_.motors", "a/b.motors", "a-b.motors", "é.motors"];
        foreach (var n in names) Write(n, "");
        var expected = names.Select(n => PathOf(n)).Order(StringComparer.Ordinal).Select(p => Path.GetRelativePath(Dir, p)).ToList();
        for (var i = 0; i < 5; i++) Assert.Equal(expected, Names(FileSearch.Find(Dir, ".motors", stayInside: false)));
    }

    [Fact]
    public void FifosDevicesAndDanglingLinksAreSkippedWithAReason()
    {
        Write("a.motors", "");
        Posix.Mkfifo(PathOf("fifo.motors"));
        File.CreateSymbolicLink(PathOf("zero.motors"), "/dev/zero");
        File.CreateSymbolicLink(PathOf("gone.motors"), "nowhere.motors");
        var r = FileSearch.Find(Dir, ".motors", stayInside: false);
        Assert.Equal(["a.motors"], Names(r));
        var reasons = r.Skipped.ToDictionary(s => Path.GetFileName(s.Path), s => s.Reason);
        Assert.Contains("FIFO", reasons["fifo.motors"]);
        Assert.Contains("character device", reasons["zero.motors"]);
        Assert.Contains("dangling", reasons["gone.motors"]);
    }

    [Fact]
    public void InsideTheRootSymlinksLeavingItAreSkipped()
    {
        var outside = Directory.CreateTempSubdirectory("motorlang-outside-").FullName;
        try
        {
            File.WriteAllText(Path.Combine(outside, "out.motors"), "");
            var root = Directory.CreateDirectory(PathOf("root")).FullName;
            Write("root/in.motors", "");
            File.CreateSymbolicLink(Path.Combine(root, "out.motors"), Path.Combine(outside, "out.motors"));
            Directory.CreateSymbolicLink(Path.Combine(root, "outdir"), outside);
            Directory.CreateSymbolicLink(Path.Combine(root, "indir"), Path.Combine(root, "sub"));
            Write("root/sub/s.motors", "");

            var inside = FileSearch.Find(root, ".motors", stayInside: true);
            Assert.Equal(["in.motors", Path.Combine("indir", "s.motors")], inside.Files.Select(f => Path.GetRelativePath(root, f)));
            Assert.Equal(["out.motors", "outdir"], inside.Skipped.Select(s => Path.GetFileName(s.Path)).Order(StringComparer.Ordinal));

            var anywhere = FileSearch.Find(root, ".motors", stayInside: false);
            Assert.Contains(Path.Combine(root, "out.motors"), anywhere.Files);
        }
        finally
        {
            Directory.Delete(outside, recursive: true);
        }
    }

    [Fact]
    public void AnUnreadableFolderIsSkippedNotThrown()
    {
        Write("a.motors", "");
        var r = FileSearch.Find(PathOf("missing"), ".motors", stayInside: true);
        Assert.Empty(r.Files);
        // /proc changes while it is walked (processes come and go) and holds files that cannot be read; the search never throws.
        var proc = FileSearch.Find("/proc/self", ".motors", stayInside: true);
        Assert.Empty(proc.Files);
    }
}
