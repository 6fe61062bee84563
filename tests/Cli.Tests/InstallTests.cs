using System.Text.Json.Nodes;
using System.Xml.Linq;

namespace MotorLang.Cli.Tests;

/// <summary>
/// What installing relies on, checked on the build: the runtime config lets a newer .NET major run
/// the tool, and the project is a tool package named motorlang. (.ci/run packs it, installs it from
/// a folder feed and runs it, and runs the self-contained executable with no dotnet on PATH.)
/// </summary>
public sealed class InstallTests
{
    [Fact]
    public void TheRuntimeConfigRollsForwardToNewerMajors()
    {
        // A machine with only .NET 11 would otherwise refuse to start a .NET 10 tool.
        var config = JsonNode.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "motorlang.runtimeconfig.json")))!;
        Assert.Equal("Major", (string?)config["runtimeOptions"]!["rollForward"]);
        Assert.Equal("Microsoft.NETCore.App", (string?)config["runtimeOptions"]!["framework"]!["name"]);
    }

    [Fact]
    public void TheCliIsAToolPackageWhoseCommandIsMotorlang()
    {
        var project = XDocument.Load(Path.Combine(Executable.RepoRoot, "src", "Cli", "MotorLang.Cli.csproj"));
        string? Property(string name) => project.Descendants(name).SingleOrDefault()?.Value;
        Assert.Equal("true", Property("PackAsTool"));
        Assert.Equal("motorlang", Property("ToolCommandName"));
        Assert.Equal("Major", Property("RollForward"));
        // No translated resources: every message is English, and a package or .vsix should not carry unused files.
        Assert.Equal("en", Property("SatelliteResourceLanguages"));
        var deps = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "motorlang.deps.json"));
        Assert.Contains("System.CommandLine", deps);
        Assert.DoesNotContain("\"locale\"", deps);
    }
}
