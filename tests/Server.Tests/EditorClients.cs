namespace MotorLang.Server.Tests;

/// <summary>What the tests of real editors (Neovim, Emacs) share: the README's snippet as written, and `motorlang` on PATH.</summary>
internal static class EditorClients
{
    /// <summary>The first <paramref name="fence"/> block (e.g. "```lua") after <paramref name="marker"/> in README.md, exactly as written.</summary>
    public static string ReadmeSnippet(string marker, string fence)
    {
        var readme = File.ReadAllText(Path.Combine(Fixture.Root, "README.md"));
        var at = readme.IndexOf(marker, StringComparison.Ordinal);
        Assert.True(at >= 0, $"README has no {marker} set-up");
        var start = readme.IndexOf(fence + "\n", at, StringComparison.Ordinal) + fence.Length + 1;
        return readme[start..readme.IndexOf("```", start, StringComparison.Ordinal)];
    }

    /// <summary>
    /// A folder holding a `motorlang` that runs the built server, as the README's Install puts it on
    /// PATH; returns the PATH to give the editor.
    /// </summary>
    [System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
    public static string PathWithMotorlang(string dir)
    {
        var bin = Directory.CreateDirectory(Path.Combine(dir, "bin")).FullName;
        var wrapper = Path.Combine(bin, "motorlang");
        File.WriteAllText(wrapper, $"#!/bin/sh\nexec dotnet exec '{Path.Combine(AppContext.BaseDirectory, "motorlang.dll")}' \"$@\"\n");
        File.SetUnixFileMode(wrapper, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        return bin + ":" + Environment.GetEnvironmentVariable("PATH");
    }

    /// <summary>
    /// The editor's executable; on a machine without it the test is skipped, but in CI (where
    /// .ci/run installs <paramref name="package"/>) a missing editor fails it.
    /// </summary>
    public static string Require(string name, string package)
    {
        var found = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':').Select(d => Path.Combine(d, name)).FirstOrDefault(File.Exists);
        var inCi = Environment.GetEnvironmentVariable("CI") == "true";
        Skip.If(found is null && !inCi, $"{name} is not installed (apt-get install {package}); .ci/run installs it");
        Assert.True(found is not null, $"CI must have {name}: .ci/run installs it");
        return found!;
    }
}
