using System.Text;
using MotorLang.Parser.Formatting;
using MotorLang.Tests.Shared;
using Xunit.Abstractions;

namespace MotorLang.Cli.Tests;

/// <summary>`motorlang fmt` on files as bytes: it never empties a file, and never writes one it could not read.</summary>
public sealed class FormatSafetyTests(ITestOutputHelper output) : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-fmt-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    [Fact]
    public void AFileWithANulByteIsLeftExactlyAsItIsAndTheUserIsTold()
    {
        var path = Path.Combine(_dir, "n.motors");
        var bytes = Encoding.UTF8.GetBytes("feeder F-1 480V 3ph\n  motor M-1 5hp\0\n    wire 12 AWG\n");
        File.WriteAllBytes(path, bytes);

        var (code, stdout, stderr) = Run("fmt", path);
        Assert.Equal(0, code);
        Assert.DoesNotContain("formatted", stdout);
        Assert.Contains($"{path}: not formatted: this looks like a binary file", stderr);
        Assert.Equal(bytes, File.ReadAllBytes(path));

        Assert.Equal(0, Run("fmt", "--check", path).Code);
        Assert.Equal(bytes, File.ReadAllBytes(path));
    }

    [Fact]
    public void ALineWithAnErrorIsWrittenBackByteForByte()
    {
        var path = Path.Combine(_dir, "e.motors");
        File.WriteAllText(path, "project  \"Unclosed\nfeeder F 480v 3ph\n  motor M-1 5hp\n  motor m-1  5 HP\n    LIKE   Q-9\n");
        Assert.Equal(0, Run("fmt", path).Code);
        Assert.Equal("project  \"Unclosed\nfeeder F 480V 3ph\n  motor M-1 5hp\n  motor m-1  5 HP\n    LIKE   Q-9\n", File.ReadAllText(path));
    }

    /// <summary>
    /// 600 mutated lists written as bytes (with invalid UTF-8, NUL, BOMs and stray CRs mixed in) and
    /// formatted in place: a file is refused unchanged, left unchanged, or holds exactly the
    /// formatter's text for it, never less.
    /// </summary>
    [Fact]
    public void MutatedFilesAreFormattedOrLeftAloneNeverDamaged()
    {
        const int files = 600;
        var bases = Directory.GetFiles(Path.Combine(RepoRoot, "examples"), "*.motors").Order().Select(File.ReadAllText).ToArray();
        var strict = new UTF8Encoding(false, throwOnInvalidBytes: true);
        var (refused, unreadable, formatted, unchanged) = (0, 0, 0, 0);
        var n = 0;
        foreach (var bytes in HostileDocuments.Draw(HostileDocuments.Bytes(bases), 430_32, files))
        {
            var path = Path.Combine(_dir, $"m{n}.motors");
            File.WriteAllBytes(path, bytes);
            string? text;
            try
            {
                text = strict.GetString(bytes);
            }
            catch (DecoderFallbackException)
            {
                text = null;
            }

            var (code, _, err) = Run("fmt", path);
            var after = File.ReadAllBytes(path);
            var what = $"file {n} (seed 43032)";
            if (text is null)
            {
                Assert.True(code == ExitCodes.Usage, $"{what}: invalid UTF-8 was not refused");
                Assert.Contains("not UTF-8", err);
                Assert.Equal(bytes, after);
                refused++;
            }
            else if (text.Contains('\0'))
            {
                Assert.Equal(bytes, after);
                unreadable++;
            }
            else
            {
                Assert.Equal(0, code);
                var expected = Formatter.Format(text);
                Assert.True(FormatOracle.Violation(text, expected) is null, $"{what}: {FormatOracle.Violation(text, expected)}");
                Assert.Equal(strict.GetBytes(expected.Verified ? expected.Text : text), after);
                Assert.True(after.Length > 0 || bytes.Length == 0, $"{what}: the file was emptied");
                if (after.AsSpan().SequenceEqual(bytes)) unchanged++;
                else formatted++;
            }

            File.Delete(path);
            n++;
        }

        output.WriteLine($"{n} files: {refused} refused as not UTF-8, {unreadable} left alone as binary, {formatted} formatted, {unchanged} already canonical");
        Assert.Equal(files, n);
        Assert.True(refused >= files / 10 && unreadable > 0 && formatted >= files / 10, "the campaign must reach each outcome");
    }

    private static string RepoRoot
    {
        get
        {
            var dir = AppContext.BaseDirectory;
            while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
            return dir;
        }
    }
}
