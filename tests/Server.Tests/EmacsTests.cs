using System.Diagnostics;

namespace MotorLang.Server.Tests;

/// <summary>
/// A third client: Emacs's eglot, in a batch Emacs, running the README's snippet as written against
/// the real server. .ci/run installs Debian's emacs-nox and elpa-eglot; on a machine without Emacs the
/// test is reported as skipped (never in CI, where a missing Emacs fails it).
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public class EmacsTests
{
    [SkippableFact]
    public async Task TheReadmeSnippetStartsEglotWithDiagnosticsAndHover()
    {
        var emacs = EditorClients.Require("emacs", "emacs-nox elpa-eglot");

        var dir = Directory.CreateTempSubdirectory("motorlang-emacs-").FullName;
        try
        {
            var lists = Directory.CreateDirectory(Path.Combine(dir, "lists")).FullName;
            var file = Path.Combine(lists, "shop.motors");
            File.Copy(Path.Combine(Fixture.Root, "examples", "cabinet-shop.motors"), file);
            var snippet = Path.Combine(dir, "motorlang.el");
            File.WriteAllText(snippet, EditorClients.ReadmeSnippet("**Emacs**", "```elisp"));
            var output = Path.Combine(dir, "out.txt");
            var info = new ProcessStartInfo(emacs!, ["--batch", "-Q", "-l", Path.Combine(AppContext.BaseDirectory, "Emacs", "readme.el")])
            {
                RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false,
                WorkingDirectory = dir,
            };
            info.Environment["PATH"] = EditorClients.PathWithMotorlang(dir);
            info.Environment["HOME"] = dir; // no user init or package state leaks in
            info.Environment["MOTORLANG_SNIPPET"] = snippet;
            info.Environment["MOTORLANG_FILE"] = file;
            info.Environment["MOTORLANG_OUT"] = output;
            using var process = Process.Start(info)!;
            var stderr = process.StandardError.ReadToEndAsync();
            using var cts = new CancellationTokenSource(TimeSpan.FromMinutes(3));
            await process.WaitForExitAsync(cts.Token);
            Assert.True(File.Exists(output), "Emacs wrote nothing: " + await stderr);
            var lines = await File.ReadAllLinesAsync(output);

            Assert.Contains("snippet-loaded t", lines);
            Assert.Contains("mode motorlang-mode", lines);
            Assert.Contains("indent-tabs-mode nil tab-width 2", lines);
            Assert.Contains("eglot-managed t", lines);
            // The same findings the Neovim test sees, at the same 1-based line:column.
            Assert.Contains(lines, l => l.StartsWith("diagnostic 18:10 ", StringComparison.Ordinal) && l.Contains("[M101]: wire 14 AWG carries 15 A here", StringComparison.Ordinal));
            Assert.Contains(lines, l => l.StartsWith("diagnostic 19:37 ", StringComparison.Ordinal) && l.Contains("[M102]", StringComparison.Ordinal));
            var hover = Assert.Single(lines, l => l.StartsWith("hover ", StringComparison.Ordinal));
            Assert.Contains("SAW-1", hover);
            Assert.Contains("NEC 430.22", hover);
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
