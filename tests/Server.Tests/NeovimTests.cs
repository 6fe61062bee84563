using System.Diagnostics;

namespace MotorLang.Server.Tests;

/// <summary>
/// A second, independent client: Neovim's built-in LSP client, headless, against the real server.
/// .ci/run installs Neovim; on a machine without it the test is reported as skipped (never in CI,
/// where a missing Neovim fails it).
/// </summary>
public class NeovimTests
{
    [SkippableFact]
    public async Task NeovimSeesTheDiagnosticsAndTheHover()
    {
        var nvim = FindOnPath("nvim");
        var inCi = Environment.GetEnvironmentVariable("CI") == "true";
        Skip.If(nvim is null && !inCi, "Neovim is not installed (apt-get install neovim); .ci/run installs it");
        Assert.True(nvim is not null, "CI must have Neovim: .ci/run installs it");

        var dir = Directory.CreateTempSubdirectory("motorlang-nvim-").FullName;
        try
        {
            var file = Path.Combine(dir, "shop.motors");
            File.Copy(Path.Combine(Fixture.Root, "examples", "cabinet-shop.motors"), file);
            var output = Path.Combine(dir, "out.txt");
            var info = new ProcessStartInfo(nvim!, ["--headless", "--noplugin", "-u", "NONE", "-c", $"luafile {Path.Combine(AppContext.BaseDirectory, "Neovim", "check.lua")}"])
            {
                RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false,
            };
            info.Environment["MOTORLANG_FILE"] = file;
            info.Environment["MOTORLANG_DLL"] = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
            info.Environment["MOTORLANG_OUT"] = output;
            info.Environment["MOTORLANG_HOVER_LINE"] = "17"; // "    wire 14 AWG" of SAW-1 (0-based)
            info.Environment["MOTORLANG_HOVER_COL"] = "6";
            using var process = Process.Start(info)!;
            using var cts = new CancellationTokenSource(TimeSpan.FromMinutes(2));
            await process.WaitForExitAsync(cts.Token);
            var lines = await File.ReadAllLinesAsync(output);

            Assert.Contains("diagnostics-arrived true", lines);
            Assert.Contains(lines, l => l.StartsWith("diagnostic 18:10 M101 wire 14 AWG carries 15 A here", StringComparison.Ordinal));
            Assert.Contains(lines, l => l.StartsWith("diagnostic 19:37 M102 ", StringComparison.Ordinal));
            var hover = Assert.Single(lines, l => l.StartsWith("hover ", StringComparison.Ordinal));
            Assert.Contains("SAW-1", hover);
            Assert.Contains("NEC 430.22", hover);
            Assert.Contains("14 AWG carries only 15 A", hover);
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    private static string? FindOnPath(string name) =>
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':').Select(d => Path.Combine(d, name)).FirstOrDefault(File.Exists);
}
