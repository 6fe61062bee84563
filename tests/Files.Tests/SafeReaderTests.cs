using System.Text;

namespace MotorLang.Files.Tests;

/// <summary>The file-reading rules: regular files only, the size limit counted on the bytes read, strict UTF-8.</summary>
public sealed class SafeReaderTests : TempFolder
{
    [Fact]
    public void ARegularFileIsReadWithItsBom()
    {
        var path = PathOf("a.motors");
        File.WriteAllBytes(path, [0xEF, 0xBB, 0xBF, .. "feeder F 480V 3ph\n"u8]);
        Assert.Equal("\uFEFFfeeder F 480V 3ph\n", SafeReader.ReadText(path));
    }

    [Fact]
    public async Task AFifoIsRefusedWithoutWaitingForAWriter()
    {
        // Opened non-blocking, then refused by type: without that, open() waits for a writer forever.
        var fifo = PathOf("p.motors");
        Posix.Mkfifo(fifo);
        var read = Task.Run(() => SafeReader.ReadText(fifo));
        var e = await Assert.ThrowsAsync<FileRefusedException>(() => read.WaitAsync(TimeSpan.FromSeconds(20)));
        Assert.Contains("named pipe (FIFO), not a regular file", e.Message);
    }

    [Theory]
    [InlineData("/dev/zero", "character device")]
    [InlineData("/dev/null", "character device")]
    [InlineData("/dev/urandom", "character device")]
    public void ASymlinkToADeviceIsRefusedWithoutReading(string device, string kind)
    {
        var link = PathOf("dev.motors");
        File.CreateSymbolicLink(link, device);
        var e = Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(link));
        Assert.Contains(kind, e.Message);
    }

    [Fact]
    public void AFolderIsRefused()
    {
        var dir = Directory.CreateDirectory(PathOf("d.motors")).FullName;
        Assert.Contains("folder", Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(dir)).Message);
    }

    [Fact]
    public void TheLimitCountsTheBytesReadNotTheReportedLength()
    {
        // /proc/self/maps is a regular file that reports length 0 and holds far more than 100 bytes.
        Assert.Equal(0, new FileInfo("/proc/self/maps").Length);
        var e = Assert.Throws<FileRefusedException>(() => SafeReader.ReadText("/proc/self/maps", maxBytes: 100));
        Assert.Contains("over 100 bytes", e.Message);
    }

    [Theory]
    [InlineData(0, true)]
    [InlineData(99, true)]
    [InlineData(100, true)]
    [InlineData(101, false)]
    [InlineData(5000, false)]
    [InlineData(9000, false)]
    public void FilesUpToTheLimitAreReadAndLargerOnesRefused(int size, bool read)
    {
        var path = PathOf("s.motors");
        File.WriteAllText(path, new string('x', size));
        if (read) Assert.Equal(size, SafeReader.ReadText(path, maxBytes: 100).Length);
        else Assert.Contains("are not read", Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(path, maxBytes: 100)).Message);
    }

    [Fact]
    public void TheRealLimitIs64Megabytes()
    {
        // A sparse file one byte over the limit: refused after reading at most the limit and one byte.
        var path = PathOf("big.motors");
        using (var f = File.Create(path)) f.SetLength(SafeReader.MaxBytes + 1);
        Assert.Contains("over 64 MB", Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(path)).Message);
    }

    [Fact]
    public void NonUtf8IsRefusedWithTheOffset()
    {
        var path = PathOf("l.motors");
        File.WriteAllBytes(path, [.. Encoding.ASCII.GetBytes("project \"Caf"), 0xE9, .. Encoding.ASCII.GetBytes("\"\n")]);
        Assert.Contains("not UTF-8 text (bad byte at offset 12)", Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(path)).Message);
    }

    [Fact]
    public void AMissingFileIsRefused() =>
        Assert.Contains("no such file", Assert.Throws<FileRefusedException>(() => SafeReader.ReadText(PathOf("none.motors"))).Message);
}
