using System.Diagnostics;

namespace MotorLang.Server.Tests;

/// <summary>
/// A second, independent client: Neovim's built-in LSP client, headless, against the real server.
/// .ci/run installs Neovim; on a machine without it the test is reported as skipped (never in CI,
/// where a missing Neovim fails it).
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public class NeovimTests
{
    [SkippableFact]
    public async Task NeovimSeesTheDiagnosticsAndTheHover()
    {
        var nvim = EditorClients.Require("nvim", "neovim");

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

    [SkippableFact]
    public async Task TheReadmeSnippetSetsUpMotorListsAndStartsOneServerPerFolder()
    {
        var nvim = EditorClients.Require("nvim", "neovim");

        var dir = Directory.CreateTempSubdirectory("motorlang-nvim-readme-").FullName;
        try
        {
            var lists = Directory.CreateDirectory(Path.Combine(dir, "lists")).FullName;
            var file = Path.Combine(lists, "shop.motors");
            File.Copy(Path.Combine(Fixture.Root, "examples", "cabinet-shop.motors"), file);
            var second = Path.Combine(lists, "shop-2.motors");
            File.Copy(Path.Combine(Fixture.Root, "examples", "cabinet-shop.motors"), second);
            var snippet = Path.Combine(dir, "motorlang.lua");
            File.WriteAllText(snippet, EditorClients.ReadmeSnippet("**Neovim**", "```lua"));
            var output = Path.Combine(dir, "out.txt");
            var info = new ProcessStartInfo(nvim!, ["--headless", "--noplugin", "-u", "NONE", "-c", $"luafile {Path.Combine(AppContext.BaseDirectory, "Neovim", "readme.lua")}"])
            {
                RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false,
            };
            info.Environment["PATH"] = EditorClients.PathWithMotorlang(dir);
            info.Environment["MOTORLANG_SNIPPET"] = snippet;
            info.Environment["MOTORLANG_FILE"] = file;
            info.Environment["MOTORLANG_SECOND"] = second;
            info.Environment["MOTORLANG_OUT"] = output;
            using var process = Process.Start(info)!;
            using var cts = new CancellationTokenSource(TimeSpan.FromMinutes(3));
            await process.WaitForExitAsync(cts.Token);
            var lines = await File.ReadAllLinesAsync(output);

            Assert.Contains("snippet-loaded true", lines);
            Assert.Contains("filetype motorlang", lines);
            Assert.Contains("indent expandtab=true shiftwidth=2 softtabstop=2", lines);
            Assert.Contains("diagnostics-arrived true", lines);
            Assert.Contains(lines, l => l.StartsWith("diagnostic 18:10 M101 wire 14 AWG carries 15 A here", StringComparison.Ordinal));
            Assert.Contains("clients 1", lines);
            Assert.DoesNotContain("second-diagnostics 0", lines);
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
