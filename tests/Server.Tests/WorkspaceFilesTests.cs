using System.Runtime.Versioning;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>
/// workspace/symbol reads the workspace's lists by the command line's rules (MotorLang.Files): it
/// stays inside the root, skips FIFOs and lists over the size limit, visits a folder loop once and
/// never fails the request over a file it cannot read.
/// </summary>
[UnsupportedOSPlatform("windows")]
public sealed class WorkspaceFilesTests : IDisposable
{
    private readonly string _root = Directory.CreateTempSubdirectory("motorlang-ws-root-").FullName;
    private readonly string _outside = Directory.CreateTempSubdirectory("motorlang-ws-outside-").FullName;

    public void Dispose()
    {
        Directory.Delete(_root, recursive: true);
        Directory.Delete(_outside, recursive: true);
    }

    [Fact]
    public async Task WorkspaceSymbolsStayInTheRootAndSkipSpecialAndLargeFiles()
    {
        File.WriteAllText(Path.Combine(_root, "in.motors"), "feeder F-IN 480V 3ph\n  motor M-IN 5hp\n");
        Directory.CreateDirectory(Path.Combine(_root, "area"));
        File.WriteAllText(Path.Combine(_root, "area", "deep.motors"), "feeder F-DEEP 480V 3ph\n");
        Directory.CreateSymbolicLink(Path.Combine(_root, "area", "loop"), _root);
        File.WriteAllText(Path.Combine(_outside, "out.motors"), "feeder F-OUT 480V 3ph\n");
        File.CreateSymbolicLink(Path.Combine(_root, "out.motors"), Path.Combine(_outside, "out.motors"));
        Directory.CreateSymbolicLink(Path.Combine(_root, "outdir"), _outside);
        var fifo = Path.Combine(_root, "pipe.motors");
        Mkfifo(fifo);
        // A readable first line, then padding to one byte over the 64 MB limit (sparse, so cheap to make).
        using (var big = File.Create(Path.Combine(_root, "big.motors")))
        {
            big.Write("feeder F-BIG 480V 3ph\n"u8);
            big.SetLength(64L * 1024 * 1024 + 1);
        }

        await using var server = await InProcessServer.StartAsync(rootUri: new Uri(_root).AbsoluteUri);
        var request = server.Client.Request<SymbolInformation[]>("workspace/symbol", new WorkspaceSymbolParams("F-"));
        SymbolInformation[] symbols;
        try
        {
            symbols = await request.WaitAsync(TimeSpan.FromSeconds(30));
        }
        catch (TimeoutException)
        {
            // The server is stuck opening the FIFO: give it a writer so the test process can end, then fail.
            await Task.Run(() => File.WriteAllText(fifo, "")).WaitAsync(TimeSpan.FromSeconds(5));
            throw;
        }

        Assert.Equal(["F-DEEP", "F-IN"], symbols.Select(s => s.Name).Order(StringComparer.Ordinal));
        Assert.All(symbols, s => Assert.StartsWith(new Uri(_root).AbsoluteUri + "/", s.Location.Uri));
        Assert.Equal(1, symbols.Count(s => s.Name == "F-DEEP"));
    }

    private static void Mkfifo(string path)
    {
        using var p = System.Diagnostics.Process.Start("mkfifo", [path]);
        p.WaitForExit();
        Assert.Equal(0, p.ExitCode);
    }
}
